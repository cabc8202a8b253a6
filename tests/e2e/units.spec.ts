// The reader's units (issue 15): one control, kept in the URL and remembered, applied to pages, charts, the
// packs table and its weight filter, embeds (in the chart's state) and CSV downloads; the API stays SI.
// Factors: NIST SP 811 (2008), Appendix B.8 — 1 oz = 28.349 523 125 g; t/°F = 1.8 t/°C + 32.
import { expect, test } from "@playwright/test";
import Papa from "papaparse";
import { settled } from "./packs-table-helpers";

test("units from the URL convert a pack page and are remembered on the next page", async ({ page }) => {
  await page.goto("/packs/ashcombe-cells-ridge-1800-5s-130c");
  const weight = page.locator("header [data-u=mass]");
  const grams = Number((await weight.textContent())?.replace(/[^\d.]/g, ""));
  expect(grams).toBeGreaterThan(0);
  await page.goto("/packs/ashcombe-cells-ridge-1800-5s-130c?units=F,oz,pack");
  await expect(weight).toHaveText(new RegExp(`^${(grams / 28.349523125).toFixed(1)} oz$`));
  // Hold voltage of a 5S pack per pack: five times the per-cell figure, in V.
  const hold = page.getByTestId("group-figures").locator("[data-u=v][data-sym]").first();
  const perCell = Number(await hold.getAttribute("data-v"));
  await expect(hold).toHaveText(new RegExp(`^${(perCell * 5).toFixed(2)} V$`));
  // Remembered: /packs, without the parameter, shows weights in ounces, and its filter asks in ounces.
  await page.goto("/packs");
  await settled(page);
  await expect(page.locator("table.packs thead").getByText("Weight, oz")).toBeVisible();
  await page.setViewportSize({ width: 1280, height: 900 });
  await page.getByRole("spinbutton", { name: "Weight to (oz)" }).fill("8");
  // The URL (and the API behind the table) stays in grams.
  await expect(page).toHaveURL(/maxG=226\.8/);
});

test("the control changes the units, the URL and the charts of a result", async ({ page }) => {
  await page.setViewportSize({ width: 1280, height: 900 });
  await page.goto("/results/1");
  const title = page.locator("#log-chart [data-panel=t] text").first();
  await expect(title).toContainText("°C");
  const control = page.getByTestId("units-control").first();
  await control.getByText("Units").click();
  await control.getByLabel("°F").check();
  await expect(page).toHaveURL(/units=F/);
  await expect(title).toContainText("°F");
  const tick = page.locator("#log-chart [data-panel=t] [data-u=temp]").first();
  const celsius = Number(await tick.getAttribute("data-v"));
  await expect(tick).toHaveText(String(Math.round(celsius * 1.8 + 32)));
  await control.getByLabel("°C").check();
  await expect(page).not.toHaveURL(/units=/);
  await expect(tick).toHaveText(String(celsius));
});

test("CSV downloads take the units and name each converted column by its unit; the API stays SI", async ({
  request,
}) => {
  const si = await (await request.get("/data/download/results.csv")).text();
  const csv = await (await request.get("/data/download/results.csv?units=F,oz")).text();
  // Strict RFC 4180 files: read with a CSV parser, the first record of each.
  const first = (text: string) => Papa.parse<Record<string, string>>(text, { header: true }).data[0] ?? {};
  const [a, b] = [first(si), first(csv)];
  expect(Object.keys(a)).toContain("ambientTemperatureC");
  expect(Object.keys(b)).toContain("ambientTemperatureF");
  expect(Object.keys(b)).not.toContain("ambientTemperatureC");
  const c = Number(a.ambientTemperatureC);
  const f = Number(b.ambientTemperatureF);
  expect(Number.isFinite(c)).toBe(true);
  expect(f).toBeCloseTo(c * 1.8 + 32, 2);
  expect((await request.get("/data/download/results.csv?units=kelvin")).status()).toBe(422);
  const api = await (await request.get("/api/v1/packs?size=10")).json();
  expect(JSON.stringify(api)).toContain("weightG");
});
