import { expect, test, type Page } from "@playwright/test";
import { firstLink, newestMailFor } from "../helpers/mail";
import { rows, settled } from "./packs-table-helpers";

// A moderator signs in with an e-mail link, approves one flagged result and rejects another, and the
// approved result appears on the public pack page and in /data's counts (revalidated by tag, no rebuild).
const MODERATOR = "moderator@sagline.localhost";

/** Approved results as /data counts them: the sum of the "(n results)" of its like-for-like groups. */
async function approvedOnDataPage(page: Page): Promise<number> {
  await page.goto("/data");
  const options = await page.getByLabel("Like-for-like group (results only)").locator("option").allTextContents();
  return options.reduce((sum, text) => sum + Number(/\((\d+) results\)$/.exec(text)?.[1] ?? 0), 0);
}

/** Approved results as the API counts them, straight from the database (the API is never statically cached). */
async function approvedInApi(page: Page): Promise<number> {
  const res = await page.request.get("/api/v1/results?size=10");
  expect(res.status()).toBe(200);
  return Number(res.headers()["x-total-count"]);
}

/** The pack's published results as the /packs table shows them ("3 in 2 groups"; 0 for a dash). */
async function resultsOnPacksTable(page: Page, packHref: string): Promise<number> {
  const slug = packHref.replace(/^\/packs\//, "");
  const api = await page.request.get(`/api/v1/packs/${slug}`);
  const makerSlug = ((await api.json()) as { data: { makerSlug: string } }).data.makerSlug;
  await page.goto(`/packs?maker=${makerSlug}&size=100`);
  await settled(page);
  const cell = rows(page)
    .filter({ has: page.locator(`a[href="${packHref}"]`) })
    .locator("td.c-results");
  return Number(/^(\d+) in /.exec(await cell.innerText())?.[1] ?? 0);
}

async function signIn(page: Page, email: string) {
  await page.goto("/sign-in?callbackUrl=%2Freview");
  const before = Date.now();
  await page.getByLabel("E-mail address").fill(email);
  await page.getByRole("button", { name: /sign-in link|send/i }).click();
  await expect(page).toHaveURL(/check-email/);
  let link = "";
  await expect
    .poll(
      async () => {
        const m = await newestMailFor(email, 10_000);
        if (new Date(m.receivedAt).getTime() < before - 1000) return "";
        link = firstLink(m.text);
        return link;
      },
      { timeout: 15_000 },
    )
    .not.toBe("");
  await page.goto(link);
  await expect(page).toHaveURL(/\/review$/);
}

test("a moderator approves one flagged result, rejects another, and the approved one is published", async ({
  page,
}) => {
  await signIn(page, MODERATOR);
  await expect(page.getByRole("heading", { level: 1, name: "Review queue" })).toBeVisible();

  const flagged = page.getByTestId("queue-row").filter({ has: page.getByRole("list", { name: "Plausibility flags" }) });
  expect(await flagged.count()).toBeGreaterThanOrEqual(2);
  const approveId = await flagged.nth(0).getAttribute("data-result-id");
  const rejectId = await flagged.nth(1).getAttribute("data-result-id");

  // /data agrees with the database before the decision (and now holds a cached copy the decision must expire).
  const approvedBefore = await approvedOnDataPage(page);
  expect(approvedBefore).toBeGreaterThan(0);
  expect(approvedBefore).toBe(await approvedInApi(page));

  // Approve the first flagged result, having looked at its pack page first (so a cached copy exists).
  await page.goto(`/review/${approveId}`);
  await expect(page.getByTestId("flag-list")).toBeVisible();
  const packHref = await page.getByTestId("pack-link").getAttribute("href");
  expect(packHref).toMatch(/^\/packs\//);
  await page.goto(packHref ?? "/");
  await expect(page.getByRole("link", { name: `Result #${approveId}`, exact: true })).toHaveCount(0);
  // The home page's newest list and the /packs table, cached before the decision too.
  await page.goto("/");
  await expect(page.getByTestId("newest-results").getByRole("link", { name: `Result #${approveId}` })).toHaveCount(0);
  const onTableBefore = await resultsOnPacksTable(page, packHref ?? "");
  await page.goto(`/review/${approveId}`);
  await page.getByLabel("Note (optional, sent to the contributor)").fill("Checked against the log.");
  await page.getByRole("button", { name: "Approve and publish" }).click();
  await expect(page.getByTestId("decision-done")).toContainText(/approved/i);
  await expect(page.getByTestId("result-status")).toHaveText("Approved");

  // /data counts it at once: its tagged reads were expired by the decision, not left for the hourly timer.
  expect(await approvedOnDataPage(page)).toBe(approvedBefore + 1);
  expect(await approvedInApi(page)).toBe(approvedBefore + 1);

  // Do not accept the second, with a reason from the list.
  await page.goto(`/review/${rejectId}`);
  await page.getByLabel("Reason").selectOption("wrong-data");
  await page.getByLabel("Note (required for “other”)").fill("The current channel reads twice the load.");
  await page.getByRole("button", { name: "Do not accept" }).click();
  await expect(page.getByTestId("decision-done")).toContainText(/not accepted/i);
  await expect(page.getByTestId("result-status")).toHaveText("Not accepted");
  await expect(page.getByTestId("review-history")).toContainText("Wrong data");

  // Both have left the queue.
  await page.goto("/review");
  await expect(page.locator(`[data-result-id="${approveId}"]`)).toHaveCount(0);
  await expect(page.locator(`[data-result-id="${rejectId}"]`)).toHaveCount(0);

  // Not accepting publishes nothing: /data still counts one more than before, not two.
  expect(await approvedOnDataPage(page)).toBe(approvedBefore + 1);

  // The approved result is on the public pack page, the home page's newest list and the /packs table's count:
  // the decision's scoped tags (its pack, newest, catalogue) reached every page that shows it.
  await page.goto(packHref ?? "/");
  await expect(
    page.getByTestId("pack-results").getByRole("link", { name: `Result #${approveId}`, exact: true }),
  ).toBeVisible();
  await page.goto("/");
  await expect(
    page.getByTestId("newest-results").getByRole("link", { name: `Result #${approveId}`, exact: true }),
  ).toBeVisible();
  expect(await resultsOnPacksTable(page, packHref ?? "")).toBe(onTableBefore + 1);
});

test("a contributor opening the review queue gets the 403 page", async ({ page }) => {
  await signIn(page, "ridgeline@sagline.localhost");
  const res = await page.goto("/review");
  expect(res?.status()).toBe(403);
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("This page is not open to your role");
});
