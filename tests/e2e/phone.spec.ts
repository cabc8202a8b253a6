// The shopper's phone (issue 15): no page scrolls sideways at 390 px, the packs table keeps the pack's name in
// view beside its measured columns, the header's menu lists every link, a skip link passes each chart, and
// the focus ring and links are at least 3:1 against the page in both schemes (measured in the browser, WCAG 2.2
// relative luminance).
import { expect, test, type Page } from "@playwright/test";
import { settled } from "./packs-table-helpers";

test.use({ viewport: { width: 390, height: 844 } });

const GROUP = "dc-step_a15-25_co3.3_r5-10_new";

async function noSidewaysScroll(page: Page) {
  const { scroll, client } = await page.evaluate(() => ({
    scroll: document.documentElement.scrollWidth,
    client: document.documentElement.clientWidth,
  }));
  expect(scroll, `page is ${scroll} px wide in a ${client} px window`).toBeLessThanOrEqual(client);
}

test("no page scrolls sideways at 390 px", async ({ page }) => {
  await page.goto("/packs");
  const pack = (await page.locator("table.packs tbody th a").first().getAttribute("href")) ?? "/";
  const slugs = await page
    .locator("table.packs tbody th a")
    .evaluateAll((as) => as.slice(0, 3).map((a) => a.getAttribute("href")?.slice(7)));
  for (const path of [
    "/",
    "/packs",
    pack,
    `/compare?packs=${slugs.join(",")}`,
    "/charts/new",
    "/analyse",
    "/data",
    "/methods",
  ]) {
    await page.goto(path);
    await noSidewaysScroll(page);
  }
});

test("the packs table keeps the pack's name in view while its measured columns scroll into view", async ({ page }) => {
  await page.goto(`/packs?group=${GROUP}&sort=labelRatio&dir=desc`);
  await settled(page);
  const row = page.locator("table.packs tbody tr").first();
  // Scroll the table (not the page) until the measured columns sit right beside the pack's name.
  await row.locator("td.c-measuredC").evaluate((cell) => {
    const region = cell.closest("[role=region]");
    const name = cell.parentElement?.querySelector("th");
    if (region instanceof HTMLElement && cell instanceof HTMLElement && name)
      region.scrollLeft = cell.offsetLeft - name.offsetWidth;
  });
  const name = await row.locator("th").boundingBox();
  const measured = await row.locator("td.c-measuredC").boundingBox();
  const ratio = await row.locator("td.c-labelRatio").boundingBox();
  for (const [what, box] of [
    ["pack name", name],
    ["sag-limited C", measured],
    ["label ratio", ratio],
  ] as const) {
    expect(box, what).not.toBeNull();
    expect(box?.x ?? -1, `${what} starts in the window`).toBeGreaterThanOrEqual(0);
    expect((box?.x ?? 0) + (box?.width ?? 0), `${what} ends in the window`).toBeLessThanOrEqual(390);
  }
  // And the name is not covered by the figures sliding under it.
  expect((name?.x ?? 0) + (name?.width ?? 0)).toBeLessThanOrEqual(measured?.x ?? 0);
  await noSidewaysScroll(page);
});

test("the header's menu shows every link at 390 px", async ({ page }) => {
  await page.goto("/");
  await expect(page.getByRole("navigation", { name: "Main", exact: true })).toBeHidden();
  await page.getByTestId("site-menu").getByText("Menu").click();
  const menu = page.getByRole("navigation", { name: "Main menu" });
  for (const name of ["Packs", "Compare", "Charts", "Analyse a log", "Methods", "Data"]) {
    const link = menu.getByRole("link", { name, exact: true });
    await expect(link).toBeVisible();
    const box = await link.boundingBox();
    expect((box?.x ?? -1) >= 0 && (box?.x ?? 0) + (box?.width ?? 0) <= 390, `${name} fits the window`).toBe(true);
  }
});

test("a skip link passes a chart and its points", async ({ page }) => {
  await page.goto("/");
  const skip = page.locator("#lc").getByRole("link", { name: "Skip past the chart" });
  await skip.focus();
  await expect(skip).toBeVisible();
  await page.keyboard.press("Enter");
  await expect(page.locator("#lc-end")).toBeFocused();
  await page.keyboard.press("Tab");
  const inChart = await page.evaluate(() => document.activeElement?.closest(".chart-svg") !== null);
  expect(inChart).toBe(false);
});

async function ringContrast(page: Page): Promise<number> {
  return page.evaluate(() => {
    const rgb = (c: string) => (c.match(/[\d.]+/g) ?? []).slice(0, 3).map(Number);
    const lum = (c: string) => {
      const [r = 0, g = 0, b = 0] = rgb(c).map((v) => {
        const s = v / 255;
        return s <= 0.04045 ? s / 12.92 : ((s + 0.055) / 1.055) ** 2.4;
      });
      return 0.2126 * r + 0.7152 * g + 0.0722 * b;
    };
    const el = document.activeElement as HTMLElement;
    // The background the ring is drawn on: the nearest ancestor with a solid one.
    let bgEl: HTMLElement | null = el.parentElement;
    let bg = "rgb(255, 255, 255)";
    while (bgEl) {
      const c = getComputedStyle(bgEl).backgroundColor;
      if (c !== "rgba(0, 0, 0, 0)" && !c.startsWith("rgba")) {
        bg = c;
        break;
      }
      bgEl = bgEl.parentElement;
    }
    const [a, b] = [lum(getComputedStyle(el).outlineColor), lum(bg)].sort((x, y) => y - x) as [number, number];
    return (a + 0.05) / (b + 0.05);
  });
}

for (const scheme of ["light", "dark"] as const) {
  test(`the focus ring is at least 3:1 against the page in the ${scheme} scheme, in the site and in an embed`, async ({
    page,
    request,
  }) => {
    await page.emulateMedia({ colorScheme: scheme });
    await page.goto("/packs");
    await page.getByRole("searchbox", { name: "Search maker and model" }).focus();
    await page.keyboard.press("Shift+Tab");
    await page.keyboard.press("Tab");
    expect(await ringContrast(page)).toBeGreaterThanOrEqual(3);
    const charts = (await (await request.get("/api/v1/charts")).json()) as { data: { links: { embed: string } }[] };
    await page.goto(charts.data[0]?.links.embed ?? "/");
    await page.keyboard.press("Tab");
    expect(await ringContrast(page)).toBeGreaterThanOrEqual(3);
  });
}
