// Issue 13 in the browser: a reader asks moderators to check a result (signed out: asked to sign in first and
// brought back), the result stays published and counted with the open check shown; a moderator features a
// saved chart and it appears on /charts.
import { expect, test } from "@playwright/test";
import { choosePublicName, signIn } from "./sign-in-helpers";

test("a signed-out reader is asked to sign in first, comes back, flags the result; it stays counted, marked", async ({
  page,
}) => {
  // A newest result without an open check yet (the demo has a few with one).
  await page.goto("/");
  const hrefs = await page
    .locator('main a[href^="/results/"]')
    .evaluateAll((as) => as.map((a) => a.getAttribute("href")));
  let href = "";
  for (const h of hrefs.slice(0, 6)) {
    await page.goto(h ?? "/");
    if ((await page.getByTestId("open-case").count()) === 0) {
      href = h ?? "";
      break;
    }
  }
  expect(href).toMatch(/^\/results\/\d+$/);
  const id = Number(href.replace("/results/", ""));
  const inApi = async () => (await page.request.get(`/api/v1/results/${id}`)).status();
  expect(await inApi()).toBe(200);
  await page.getByRole("button", { name: "Ask moderators to check this result" }).click();
  const prompt = page.getByText("To ask moderators to check this result");
  await expect(prompt).toBeVisible();
  const signInHref = (await prompt.getByRole("link", { name: "sign in" }).getAttribute("href")) ?? "";
  expect(new URL(signInHref, "http://x").searchParams.get("callbackUrl")).toBe(href);

  await signIn(page, `flagging-reader-${Date.now().toString(36)}@sagline.test`, signInHref);
  // A first sign-in asks for the public name, then goes on to the result.
  await choosePublicName(page, null);
  await expect(page).toHaveURL(new RegExp(`${href}$`));
  await page.getByRole("button", { name: "Ask moderators to check this result" }).click();
  await page.getByLabel("What should they check?").selectOption("wrong-figures");
  await page.getByLabel("Note for the moderators (optional)").fill("The capacity is above the label.");
  await page.getByRole("button", { name: "Send to moderators" }).click();
  await expect(page.getByText("Thank you. Moderators will look at it")).toBeVisible();

  await page.reload();
  await expect(page.getByTestId("open-case")).toHaveText(
    "A reader asked moderators to check this result: the figures may be wrong — it still counts until they decide.",
  );
  // The reader's own note is for the moderators only.
  await expect(page.getByText("The capacity is above the label.")).toHaveCount(0);
  expect(await inApi()).toBe(200);

  // A second request from the same reader waits for the first.
  await page.getByRole("button", { name: "Ask moderators to check this result" }).click();
  await page.getByLabel("What should they check?").selectOption("other");
  await page.getByRole("button", { name: "Send to moderators" }).click();
  await expect(page.getByText("You already asked moderators to check this result")).toBeVisible();
});

test("a moderator features a saved chart and it appears on /charts; taking it off removes it", async ({ page }) => {
  const title = "My packs against their labels";
  await page.goto("/charts");
  await expect(page.getByTestId("chart-list").getByRole("link", { name: title, exact: true })).toHaveCount(0);

  await signIn(page, "moderator@sagline.localhost");
  await page.goto("/review/charts");
  await expect(page.getByRole("heading", { level: 1, name: "Saved charts" })).toBeVisible();
  const row = page.getByTestId("saved-charts").getByRole("listitem").filter({ hasText: title });
  await expect(row).toContainText("not featured");
  await row.getByRole("button", { name: `Feature on /charts: ${title}` }).click();
  await expect(row.getByText("Featured: listed on /charts.")).toBeVisible();

  await page.goto("/charts");
  const listed = page.getByTestId("chart-list").getByRole("link", { name: title, exact: true });
  await expect(listed).toBeVisible();
  await listed.click();
  await expect(page.getByRole("heading", { level: 1, name: title })).toBeVisible();

  await page.goto("/review/charts");
  await page
    .getByTestId("saved-charts")
    .getByRole("listitem")
    .filter({ hasText: title })
    .getByRole("button", { name: `Take off /charts: ${title}` })
    .click();
  await expect(page.getByText("Taken off /charts.")).toBeVisible();
  await page.goto("/charts");
  await expect(page.getByTestId("chart-list").getByRole("link", { name: title, exact: true })).toHaveCount(0);
});
