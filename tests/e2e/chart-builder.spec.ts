// The chart builder (issue 15): groups named in words, only makers and pack sizes with data offered, and no
// empty chart published.
import { expect, test } from "@playwright/test";

test("the builder offers only what has data and will not publish an empty chart", async ({ page, request }) => {
  await page.goto("/charts/new");
  const group = page.getByRole("combobox", { name: "Like-for-like group" });
  // Wait for the builder to show its groups (and sizes) before reading every option at once.
  await expect(group.locator("option").first()).toBeAttached();
  await expect(page.getByRole("combobox", { name: "Cells (S)" }).locator("option").nth(1)).toBeAttached();
  const options = await group.locator("option").allTextContents();
  expect(options.length).toBeGreaterThan(0);
  // In words ("DC step · 15–25 °C · …"), never a raw key ("dc-step_a15-25_…").
  for (const o of options) expect(o).not.toMatch(/[a-z]+_[a-z0-9.-]+_/);
  // Every pack size offered has approved results in the chosen group.
  const key = await group.inputValue();
  const packs = (await (await request.get(`/api/v1/packs?group=${encodeURIComponent(key)}&size=100`)).json()) as {
    data: { cellsInSeries: number; resultCount: number }[];
  };
  const withData = new Set(packs.data.map((p) => `${p.cellsInSeries}S`));
  const offered = (await page.getByRole("combobox", { name: "Cells (S)" }).locator("option").allTextContents()).filter(
    (o) => o !== "Any",
  );
  expect(offered.length).toBeGreaterThan(0);
  for (const o of offered) expect(withData.has(o), `${o} has data`).toBe(true);
  await expect(page.getByTestId("chart-count")).toHaveText(/\d+ approved results? match/);
  const publish = page.getByRole("button", { name: "Publish and get the permalink" });
  await expect(publish).toBeEnabled();

  // A maker and a size that have data separately but not together: nothing to draw, nothing published.
  const makers = await page
    .getByRole("combobox", { name: "Maker" })
    .locator("option")
    .evaluateAll((os) => os.map((o) => (o as HTMLOptionElement).value).filter(Boolean));
  let emptyFound = false;
  for (const maker of makers) {
    await page.getByRole("combobox", { name: "Maker" }).selectOption(maker);
    const sizes = await page.getByRole("combobox", { name: "Cells (S)" }).locator("option").allTextContents();
    // Sizes follow the maker: only that maker's sizes in this group.
    const makerPacks = (await (
      await request.get(`/api/v1/packs?group=${encodeURIComponent(key)}&maker=${maker}&size=100`)
    ).json()) as { data: { cellsInSeries: number }[] };
    const makerSizes = new Set(makerPacks.data.map((p) => `${p.cellsInSeries}S`));
    for (const s of sizes.filter((o) => o !== "Any")) expect(makerSizes.has(s), `${maker} ${s}`).toBe(true);
    if (offered.some((o) => !makerSizes.has(o))) emptyFound = true;
  }
  expect(emptyFound, "the demo has a maker without every size").toBe(true);

  // The maker ranking needs label ratios; the curves need results; the count says what the chart would draw.
  await page.getByRole("combobox", { name: "Maker" }).selectOption("");
  await page.getByLabel("Discharge curves overlay").check();
  await expect(page.getByTestId("chart-count")).toHaveText(/\d+ approved results? match/);
  await expect(publish).toBeEnabled();
});

test("an empty combination says so and cannot be published", async ({ page }) => {
  await page.goto("/charts/new");
  // The builder reopened from a chart whose maker has no results in the group (an old link, or a typed one).
  const state = Buffer.from(
    JSON.stringify({
      v: 1,
      kind: "label-check",
      group: "dc-step_a15-25_co3.3_r5-10_new",
      maker: "no-such-maker",
      title: "Empty",
    }),
  ).toString("base64url");
  await page.goto(`/charts/new?from=${state}`);
  await expect(page.getByRole("alert").filter({ hasText: "empty chart" })).toContainText(
    "An empty chart cannot be published",
  );
  await expect(page.getByRole("button", { name: "Publish and get the permalink" })).toBeDisabled();
});
