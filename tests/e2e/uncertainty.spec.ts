// Issue 16 in the browser, on the invented demo data (scripts/seed/benches.ts): figures carry their ± with plain
// words, /compare says "not distinguishable" where the 95 % median intervals overlap instead of naming a best, and
// the bench whose current sensor reads 4 % high shows on its bench page (ISO 13528 Algorithm A, z) with a shunt
// suggestion, reached from its tester's own bench profiles.
import { expect, test } from "@playwright/test";
import { signIn } from "./sign-in-helpers";

const GROUP = "dc-step_a15-25_co3.3_r5-10_new";
// Two demo packs tested by the five agreement benches: the high bench widens both capacity ratio intervals.
const PACKS = ["nettlefield-sting-4000-3s-130c", "nettlefield-sting-850-4s-130c"];

test("/compare of two packs whose intervals overlap says so instead of naming a best", async ({ page }) => {
  await page.goto(`/compare?packs=${PACKS.join(",")}&group=${GROUP}`);
  const row = page.getByTestId("compare-table").getByRole("row").filter({ hasText: "Capacity ratio" });
  await expect(row.getByTestId("not-distinguishable")).toHaveText(
    "Not distinguishable: the 95 % intervals of the medians overlap.",
  );
  await expect(row).not.toContainText("★ best");
  await expect(row).not.toContainText("behind");
});

test("a result page shows each figure with its ± in plain words and the accuracy it rests on", async ({ page }) => {
  await page.goto(`/packs/${PACKS[0]}`);
  await page.locator('a[href^="/results/"]').first().click();
  await expect(page).toHaveURL(/\/results\/\d+$/);
  const pm = page.getByTestId("plus-minus").first();
  await expect(pm).toHaveText(/^\d[\d.]* ± \d[\d.]* mAh$/);
  expect(await pm.getAttribute("title")).toMatch(/expanded uncertainty \(k = 2\).*not a measurement/);
  await expect(page.getByTestId("plus-minus-note").getByRole("link", { name: "What the ± means" })).toHaveAttribute(
    "href",
    "/methods#uncertainty",
  );
  await expect(page.getByTestId("accuracy")).toContainText("Voltage ±(");
});

test("the bench that reads capacity high shows on its bench page, reached from its tester's own view", async ({
  page,
}) => {
  await signIn(page, "copperleat@sagline.localhost");
  await page.goto("/account/bench-profiles");
  const own = page.getByTestId("own-agreement");
  await expect(own.getByTestId("agreement-suggestions")).toContainText("current shunt");
  await own.getByRole("link", { name: "Public bench page" }).click();
  await expect(page).toHaveURL(/\/benches\/\d+$/);
  await expect(page.getByRole("heading", { level: 1 })).toHaveText(/^Bench #\d+$/);
  await expect(page.getByTestId("bench-figure-capacityMah")).toContainText("reads high");
  await expect(page.getByTestId("bench-far-share")).not.toHaveText("0 %");
  await expect(page.getByTestId("bench-suggestions")).toContainText("Check the current shunt");
  await expect(page.getByTestId("bench-agreement")).toContainText("ISO 13528:2015 Algorithm A");
  // Its stated accuracy leaves the temperature out: the page names that value as assumed.
  await expect(page.getByTestId("accuracy-assumptions")).toContainText("Temperature offset");
});
