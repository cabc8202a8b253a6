// Every link to /methods#… on the built site's pages lands on an element with that id: the crawl visits the
// pages that link to definitions (home, packs, a pack, a result, a comparison, /analyse after a log, data and
// chart pages) and checks each anchor on /methods itself. tests/unit/server/methods-anchors.test.ts checks the
// same from the source.
import { expect, test, type Page } from "@playwright/test";
import { generateLog, toCsv } from "../../lib/synthetic/equivalent-circuit";

async function methodLinks(page: Page): Promise<string[]> {
  return page
    .locator('a[href*="/methods#"]')
    .evaluateAll((as) => as.map((a) => new URL((a as HTMLAnchorElement).href).hash.slice(1)));
}

test("every /methods# link on the site's pages lands on its definition", async ({ page }) => {
  const found = new Map<string, string>();
  const visit = async (path: string) => {
    await page.goto(path);
    for (const id of await methodLinks(page)) if (!found.has(id)) found.set(id, path);
  };
  await visit("/");
  const packHref = await page.getByTestId("newest-results").getByRole("link").first().getAttribute("href");
  for (const p of ["/packs", "/data", "/data/api", "/charts", "/charts/new", "/compare", "/methods"]) await visit(p);
  await visit(packHref ?? "/packs");
  const resultHref = await page.getByTestId("pack-results").getByRole("link").first().getAttribute("href");
  await visit(resultHref ?? "/");
  await page.goto("/compare");
  const suggestion = await page.getByTestId("compare-suggestions").getByRole("link").first().getAttribute("href");
  if (suggestion) await visit(suggestion);
  // /analyse links every figure to its definition once a log is analysed.
  await page.goto("/analyse");
  const { rows } = generateLog({ seed: 9, cells: 4, capacityMah: 1300, loadCurrentA: 13, initialRestS: 5 });
  await page
    .getByTestId("analyse-file")
    .setInputFiles({ name: "log.csv", mimeType: "text/csv", buffer: Buffer.from(toCsv(rows)) });
  await expect(page.getByTestId("log-figures")).toBeVisible();
  for (const id of await methodLinks(page)) if (!found.has(id)) found.set(id, "/analyse");

  expect(found.size).toBeGreaterThan(10);
  for (const must of ["sag-limited-c", "sustained-c", "figures", "discharges", "delivered-capacity"])
    expect([...found.keys()], must).toContain(must);
  await page.goto("/methods");
  const missing: string[] = [];
  for (const [id, from] of found)
    if ((await page.locator(`[id="${id}"]`).count()) !== 1) missing.push(`#${id} (linked from ${from})`);
  expect(missing).toEqual([]);
});
