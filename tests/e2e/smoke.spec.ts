import { expect, test } from "@playwright/test";

test("home page shows seeded packs that link to their pages", async ({ page }) => {
  await page.goto("/");
  await expect(page.getByRole("link", { name: "Sagline home" })).toBeVisible();
  // The label check of the most populated group: one point per seeded pack, each a link to its pack page.
  const points = page.locator("#home-lc .chart-svg a");
  expect(await points.count()).toBeGreaterThanOrEqual(40);
  expect(await points.first().getAttribute("href")).toMatch(/^\/packs\/[a-z0-9-]+$/);
  const first = page.getByTestId("newest-results").getByRole("link").first();
  const name = (await first.textContent())?.trim() ?? "";
  const href = await first.getAttribute("href");
  expect(href).toMatch(/^\/packs\/[a-z0-9-]+$/);
  await first.click();
  await expect(page).toHaveURL(new RegExp(`${href}$`));
  await expect(page.getByRole("heading", { level: 1 })).toHaveText(name);
  // The data licence is stated on every page.
  await expect(page.getByRole("contentinfo")).toContainText("CC BY 4.0");
});

test("an unknown pack is a 404 page, not an error", async ({ page }) => {
  const response = await page.goto("/packs/no-such-pack");
  expect(response?.status()).toBe(404);
  // Sagline's own 404 view, with a way on: not the framework's bare default.
  await expect(page.getByTestId("not-found")).toContainText("Nothing is published at this address");
  await expect(page.getByRole("link", { name: "Search the packs" })).toHaveAttribute("href", "/packs");
});

test("robots.txt and sitemap.xml let search engines find the packs and keep them out of signed-in areas", async ({
  request,
}) => {
  const robots = await request.get("/robots.txt");
  expect(robots.status()).toBe(200);
  const text = await robots.text();
  expect(text).toContain("Disallow: /account");
  expect(text).toContain("Disallow: /api/");
  expect(text).toMatch(/Sitemap: https?:\/\/[^\s]+\/sitemap\.xml/);
  const sitemap = await request.get("/sitemap.xml");
  expect(sitemap.status()).toBe(200);
  expect(sitemap.headers()["content-type"]).toContain("xml");
  const xml = await sitemap.text();
  expect(xml).toContain("<urlset");
  expect(xml).toMatch(/<loc>[^<]+\/packs\/ashcombe-cells-ridge-1800-5s-130c<\/loc>/);
  expect(xml).toMatch(/<loc>[^<]+\/results\/\d+<\/loc>/);
  expect(xml).not.toMatch(/<loc>[^<]+\/(account|review|admin)/);
});
