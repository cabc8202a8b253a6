// Issue 18: two app instances of one build share the page and data cache in Redis (REDIS_URL; scripts/test.sh
// starts the second instance on E2E_BASE_URL_B). A reader of instance B has the pack page, the /data counts and the
// pack's API record cached; a moderator approves a result on instance A; instance B shows it at once — not after
// the hourly safety net. How fast (issue 18: ≤ 2 s) is measured by npm run bench:scale, not here.
import { expect, test, type Page } from "@playwright/test";
import { signIn } from "./sign-in-helpers";

// The second demo moderator: the first signs in often across the browser tests, and sign-in links are limited per
// address (5 per 15 minutes).
const MODERATOR = "moderator2@sagline.localhost";
const B = process.env.E2E_BASE_URL_B ?? "";

/** Approved results as instance B's /data counts them: the sum of its like-for-like groups' "(n results)". */
async function approvedOnData(page: Page): Promise<number> {
  await page.goto(`${B}/data`);
  const options = await page.getByLabel("Like-for-like group (results only)").locator("option").allTextContents();
  return options.reduce((sum, text) => sum + Number(/\((\d+) results\)$/.exec(text)?.[1] ?? 0), 0);
}

test("a decision on one instance is fresh on the other at once", async ({ page, browser }) => {
  expect(B, "E2E_BASE_URL_B names the second instance; npm test starts it (scripts/test.sh)").not.toBe("");
  await signIn(page, MODERATOR, "/sign-in?callbackUrl=%2Freview");
  await expect(page.getByRole("heading", { level: 1, name: "Review queue" })).toBeVisible();
  // A result nobody else's test decides on: the last one in the queue without plausibility flags.
  const rows = page.getByTestId("queue-row").filter({ hasNot: page.getByRole("list", { name: "Plausibility flags" }) });
  expect(await rows.count()).toBeGreaterThan(0);
  const id = await rows.last().getAttribute("data-result-id");
  await page.goto(`/review/${id}`);
  const packHref = (await page.getByTestId("pack-link").getAttribute("href")) ?? "";
  expect(packHref).toMatch(/^\/packs\//);
  const slug = packHref.replace(/^\/packs\//, "");

  // A reader on instance B, whose pages and data are now cached there.
  const reader = await (await browser.newContext()).newPage();
  const resultLink = reader.getByTestId("pack-results").getByRole("link", { name: `Result #${id}`, exact: true });
  await reader.goto(`${B}${packHref}`);
  await expect(reader.getByRole("heading", { level: 1 })).toBeVisible();
  await expect(resultLink).toHaveCount(0);
  const countBefore = await approvedOnData(reader);
  const recordBefore = (await (await reader.request.get(`${B}/api/v1/packs/${slug}`)).json()) as {
    data: { resultCount: number };
  };

  // The decision, on instance A.
  await page.getByRole("button", { name: "Approve and publish" }).click();
  await expect(page.getByTestId("result-status")).toHaveText("Approved");

  // Instance B: the pack page, /data and the API record all show it (a page render on this shared machine can
  // take seconds; without the shared cache B would show its copy for an hour).
  await expect
    .poll(
      async () => {
        await reader.goto(`${B}${packHref}`);
        return resultLink.count();
      },
      { timeout: 15_000, intervals: [100, 250, 500] },
    )
    .toBe(1);
  expect(await approvedOnData(reader)).toBe(countBefore + 1);
  const record = (await (await reader.request.get(`${B}/api/v1/packs/${slug}`)).json()) as {
    data: { resultCount: number };
  };
  expect(record.data.resultCount).toBe(recordBefore.data.resultCount + 1);
});
