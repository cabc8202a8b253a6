// Automated accessibility scan of the main pages with axe-core (WCAG 2.1 A/AA rules): zero serious or
// critical violations. (A scan finds a subset of problems; the keyboard walks in other specs cover more.)
import AxeBuilder from "@axe-core/playwright";
import { expect, test } from "@playwright/test";
import { seriousViolations, settled } from "./axe-helpers";
import { signIn } from "./sign-in-helpers";

const pages = ["/", "/packs", "/compare", "/methods", "/sign-in", "/analyse", "/data", "/charts"];

for (const path of pages) {
  test(`no serious accessibility violations on ${path}`, async ({ page }) => {
    const response = await page.goto(path);
    expect(response?.status(), `${path} should load`).toBeLessThan(400);
    await settled(page);
    const results = await new AxeBuilder({ page }).withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"]).analyze();
    const serious = results.violations.filter((v) => v.impact === "serious" || v.impact === "critical");
    expect(
      serious.map(
        (v) =>
          `${v.id}: ${v.help} (${v.nodes
            .map((n) => n.target.join(" "))
            .slice(0, 3)
            .join(", ")})`,
      ),
    ).toEqual([]);
  });
}

test("no serious accessibility violations on a pack page", async ({ page }) => {
  await page.goto("/packs");
  const href = await page.locator('a[href^="/packs/"]').first().getAttribute("href");
  expect(href).toBeTruthy();
  await page.goto(href ?? "/");
  const results = await new AxeBuilder({ page }).withTags(["wcag2a", "wcag2aa"]).analyze();
  const serious = results.violations.filter((v) => v.impact === "serious" || v.impact === "critical");
  expect(serious.map((v) => `${v.id}: ${v.help}`)).toEqual([]);
});

// An embed in the reader's dark scheme: its own colours (links, text, focus) must hold there too.
for (const scheme of ["light", "dark"] as const) {
  test(`no serious accessibility violations in an embed, ${scheme} scheme`, async ({ page, request }) => {
    const charts = (await (await request.get("/api/v1/charts")).json()) as { data: { links: { embed: string } }[] };
    const embeds = charts.data.map((c) => c.links.embed);
    expect(embeds.length).toBeGreaterThan(0);
    await page.emulateMedia({ colorScheme: scheme });
    const found: string[] = [];
    for (const embed of embeds) {
      await page.goto(embed);
      found.push(...(await seriousViolations(page, embed)));
    }
    expect(found).toEqual([]);
  });
}

// The signed-in areas too, as a moderator (the admin pages are scanned in admin-roles.spec.ts, where an
// admin is already signed in: sign-in links are rate-limited per address).
test("no serious accessibility violations in the signed-in areas (account, submit, review)", async ({ page }) => {
  // A sign-in and six full scans (the review page's chart among them) on a shared 2-core machine.
  test.setTimeout(150_000);
  await signIn(page, "moderator2@sagline.localhost");
  await page.goto("/review");
  const first = await page.locator("[data-queue-link]").first().getAttribute("href");
  const found: string[] = [];
  for (const path of [
    "/account",
    "/account/public-name",
    "/account/bench-profiles",
    "/submit",
    "/review",
    ...(first ? [first] : []),
    "/review/flags",
  ]) {
    const response = await page.goto(path);
    expect(response?.status(), `${path} should load`).toBeLessThan(400);
    await settled(page);
    found.push(...(await seriousViolations(page, path)));
  }
  expect(found).toEqual([]);
});
