// One axe-core scan as the accessibility specs run it (WCAG 2.1 A/AA rules), returning the serious and
// critical violations as readable lines (an empty list passes).
import AxeBuilder from "@axe-core/playwright";
import { expect, type Page } from "@playwright/test";

/** The page has hydrated: the header's account slot has asked /api/v1/me and shows its answer (a condition, not a
 * fixed wait, so a loaded machine only makes it slower). */
export async function settled(page: Page): Promise<void> {
  await expect(page.getByTestId("account-menu")).toBeVisible({ timeout: 30_000 });
}

export async function seriousViolations(page: Page, label = page.url()): Promise<string[]> {
  const results = await new AxeBuilder({ page }).withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"]).analyze();
  return results.violations
    .filter((v) => v.impact === "serious" || v.impact === "critical")
    .map(
      (v) =>
        `${label} ${v.id}: ${v.help} (${v.nodes
          .map((n) => n.target.join(" "))
          .slice(0, 3)
          .join(", ")})`,
    );
}
