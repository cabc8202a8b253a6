// A contributor's journey: sign in through the mailed link (read from the local mail catcher), choose a public
// name, keep a bench profile, submit a result with a log upload, and follow it by its number.
import { expect, test, type Page } from "@playwright/test";
import { sampleLog } from "../helpers/logs";
import { choosePublicName, linkFromCatcher, requestLink } from "./sign-in-helpers";

function log4s(): Buffer {
  return Buffer.from(sampleLog({ seed: 4242 }).csv);
}

// The sign-in mail leaves through the outbox after the response (issue 14), so the caught mail is polled for
// rather than read once from /dev/mail.
async function signInByMail(page: Page, email: string, from: string) {
  await page.goto(from);
  await expect(page).toHaveURL(/\/sign-in\?callbackUrl=/);
  const since = await requestLink(page, email, page.url());
  await page.goto(await linkFromCatcher(email, since));
}

test("a new contributor signs in by e-mail, picks a bench profile, submits a result with a log, and sees it pending", async ({
  page,
}) => {
  const email = `e2e-${Date.now()}@test.sagline.localhost`;
  await signInByMail(page, email, "/submit");
  await choosePublicName(page, "Shed Bench Nine");
  await expect(page).toHaveURL(/\/submit$/);

  // A bench profile first, so the method card can be filled from it.
  await page.goto("/account/bench-profiles/new");
  await page.getByLabel("Profile name").fill("Shed bench");
  await page.getByLabel("Load equipment").fill("300 W electronic load");
  await page.getByLabel("Resistance method").selectOption("dc-step");
  await page.getByLabel("Ambient temperature (°C)").fill("21");
  await page.getByLabel("Cut-off voltage (V per cell)").fill("3.3");
  await page.getByLabel("Stop temperature (°C)").fill("60");
  await page.getByRole("button", { name: "Create bench profile" }).click();
  await expect(page).toHaveURL(/\/account\/bench-profiles$/);

  await page.goto("/submit");
  await page.evaluate(() => localStorage.clear());
  await page.reload();
  // Step 1: the pack, by fuzzy search (a typo on purpose).
  await page.getByLabel("Search packs").fill("1300 4S Fellrunerr");
  await page.getByTestId("pack-hits").getByRole("button").first().click();
  await expect(page.getByTestId("chosen-pack")).toContainText("4S 1,300 mAh");
  await page.getByRole("button", { name: "Next: Method card" }).click();

  // Step 2: the method card from the bench profile, then what differed.
  await page.getByLabel("Bench profile").selectOption({ label: "Shed bench" });
  await expect(page.getByLabel(/^Ambient temperature/)).toHaveValue("21");
  await expect(page.getByLabel(/^Equipment/)).toHaveValue("300 W electronic load");
  await page.getByLabel(/^Load current/).fill("13");
  await page.getByLabel(/^Stop temperature/).fill("90");
  await page.getByRole("button", { name: "Next: Log" }).click();
  await expect(page.getByText("Stop temperature must be at most 80 °C.")).toBeVisible();
  await page.getByLabel(/^Stop temperature/).fill("60");
  await page.getByRole("button", { name: "Next: Log" }).click();

  // Step 3: the log, uploaded with progress and analysed.
  await page.getByTestId("log-file").setInputFiles({ name: "shed-run-1.csv", mimeType: "text/csv", buffer: log4s() });
  await expect(page.getByTestId("log-figures")).toContainText("Delivered capacity");
  await expect(page.getByTestId("log-figures")).toContainText("mAh");
  await expect(page.getByRole("img", { name: /^Log: Voltage.*; Current, A.*, against time/ })).toBeVisible();
  // A reload keeps the draft and the stored log.
  await page.reload();
  await expect(page.getByTestId("stored-log")).toContainText("shed-run-1.csv");
  await expect(page.getByTestId("log-figures")).toContainText("Delivered capacity");
  await page.getByRole("button", { name: "Next: Photos and submit" }).click();

  // Step 4: declaration and submit (a double click still makes one result).
  await page.getByLabel(/I declare that these are honest measurements/).check();
  await expect(page.getByTestId("submit-summary")).toContainText("shed-run-1.csv");
  await page.getByRole("button", { name: "Submit the result" }).dblclick();
  const done = page.getByTestId("submit-done");
  await expect(done).toContainText(/result #\d+ is waiting for review/);
  const resultId = /result #(\d+)/.exec((await done.textContent()) ?? "")?.[1] ?? "";

  await page.getByRole("link", { name: `Follow result #${resultId}` }).click();
  await expect(page).toHaveURL(new RegExp(`/account/results/${resultId}$`));
  await expect(page.getByTestId("own-status")).toHaveText("Waiting for review");
  await page.goto("/account");
  const mine = page.getByTestId("my-results").getByRole("listitem").filter({ hasText: "Waiting for review" });
  await expect(mine).toHaveCount(1);
  await expect(mine.getByRole("link", { name: new RegExp(`^Result #${resultId} `) })).toHaveAttribute(
    "href",
    `/account/results/${resultId}`,
  );

  // The receipt went through the mail worker to the mail catcher, with the result's number.
  await expect(async () => {
    await page.goto("/dev/mail");
    await expect(
      page
        .getByTestId("caught-mail")
        .getByRole("link", { name: new RegExp(`${email.replace(/[.@+]/g, "\\$&")}.*Result #${resultId} received`) }),
    ).toBeVisible({ timeout: 1000 });
  }).toPass({ timeout: 15_000 });
});
