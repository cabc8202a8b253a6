// /packs search on the demo catalogue (issue 15 item 5): every word must match the maker or the model of the
// same pack, a typo is forgiven within a word; and the first HTML of /packs opened with filters in the URL is
// already that page (read here with scripts off, so nothing but the server's HTML is seen).
import { expect, test, type Page } from "@playwright/test";
import { rows, settled } from "./packs-table-helpers";

/** "Maker Model" of each row, in the table's order. */
const names = async (page: Page) =>
  (await rows(page).locator("th.pack").allInnerTexts()).map((t) => t.replace(/\s+/g, " ").trim());

async function search(page: Page, text: string) {
  const box = page.getByRole("searchbox", { name: "Search maker and model" });
  // Typing before the table has hydrated is lost on a busy machine: retry until the URL follows.
  await expect(async () => {
    await box.fill("");
    await box.fill(text);
    await expect(page).toHaveURL(new RegExp(`q=${encodeURIComponent(text).replace(/%20/g, "(\\+|%20)")}`), {
      timeout: 2000,
    });
  }).toPass({ timeout: 20_000 });
  await expect(page.getByTestId("pack-count")).not.toHaveText(/Loading/);
}

test("every word must match the same pack: numbers as typed, typos within a word", async ({ page }) => {
  await page.setViewportSize({ width: 1280, height: 900 });
  await page.goto("/packs");
  await settled(page);
  // The example: no other maker's packs, no other capacity.
  await search(page, "spark 1300");
  await expect.poll(() => names(page)).toEqual(["Glimwatt Spark 1300 6S 75C"]);
  // A letter missing within the maker's name; the model word decides between its packs.
  await search(page, "glimwat spark");
  await expect
    .poll(async () => new Set((await names(page)).map((n) => n.split(" ")[0])))
    .toEqual(new Set(["Glimwatt"]));
  expect((await names(page)).every((n) => n.includes(" Spark "))).toBe(true);
  // Words split across maker and model.
  await search(page, "corvane 3300");
  await expect.poll(() => names(page)).toEqual(["Corvane Vector 3300 2S 60C"]);
  // Words that each match a pack, but never the same one: nothing.
  await search(page, "vector 1300");
  await expect(page.getByTestId("packs-empty")).toBeVisible();
  await expect(page.getByTestId("pack-count")).toHaveText("0 packs");
});

test.describe("first HTML, scripts off", () => {
  test.use({ javaScriptEnabled: false });

  test("/packs opened with filters, search and sort is already that page", async ({ page }) => {
    await page.goto("/packs?cells=2&sort=capacity&dir=desc");
    const caps = (await rows(page).locator("td.c-capacity").allInnerTexts()).map((t) => Number(t.replace(/\D/g, "")));
    const cells = await rows(page).locator("td.c-cells").allInnerTexts();
    expect(caps.length).toBeGreaterThan(1);
    expect(new Set(cells.map((t) => t.trim()))).toEqual(new Set(["2S"]));
    expect(caps).toEqual([...caps].sort((a, b) => b - a));
    await expect(page.getByTestId("pack-count")).toHaveText(`${caps.length} packs`);
    await expect(page.getByRole("columnheader", { name: /Rated mAh/ })).toHaveAttribute("aria-sort", "descending");
    await expect(page.getByRole("combobox", { name: "Cells in series" })).toHaveValue("2");

    await page.goto("/packs?q=spark+1300");
    expect(await names(page)).toEqual(["Glimwatt Spark 1300 6S 75C"]);
    await expect(page.getByRole("searchbox", { name: "Search maker and model" })).toHaveValue("spark 1300");
  });

  test("/packs alone stays a static page; with a table parameter it renders per request", async ({ request }) => {
    expect((await request.get("/packs")).headers()["cache-control"]).toContain("s-maxage=3600");
    const filtered = await request.get("/packs?cells=2");
    expect(filtered.headers()["cache-control"]).toContain("no-store");
    expect(await filtered.text()).toMatch(/data-testid="pack-count"[^>]*>\d+ packs?</);
  });

  test("a page past the last says so in the first HTML", async ({ page }) => {
    await page.goto("/packs?cells=2&page=40");
    await expect(page.getByRole("alert")).toContainText("There is no page 40 of these packs");
    await expect(rows(page)).toHaveCount(0);
  });
});
