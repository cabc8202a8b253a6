// Sign in as a person would: ask for a link on /sign-in, then open the link the local mail catcher caught
// (read from MAIL_CATCHER_DIR, relative to the repo root).
import { expect, type Page } from "@playwright/test";
import { SIGN_IN_SUBJECT } from "../../server/mail/templates";
import { caughtFor, firstLink } from "../helpers/mail";

export async function requestLink(page: Page, email: string, from = "/sign-in"): Promise<number> {
  await page.goto(from);
  await expect(page).toHaveURL(/\/sign-in/);
  const since = Date.now() - 1000;
  await page.getByLabel("E-mail address").fill(email);
  await page.getByRole("button", { name: "E-mail me a sign-in link" }).click();
  await expect(page).toHaveURL(/\/sign-in\/check-email$/);
  await expect(page.getByRole("heading", { name: "Check your e-mail" })).toBeVisible();
  return since;
}

export async function linkFromCatcher(email: string, since: number): Promise<string> {
  let link = "";
  await expect
    .poll(() => {
      // Only a sign-in message: other mail to the same address (a decision's e-mail) may arrive in the same moment.
      const m = caughtFor(email).find((x) => Date.parse(x.receivedAt) >= since && x.subject === SIGN_IN_SUBJECT);
      link = m ? firstLink(m.text) : "";
      return link;
    })
    .not.toBe("");
  return link;
}

export async function signIn(page: Page, email: string, from = "/sign-in"): Promise<void> {
  const since = await requestLink(page, email, from);
  await page.goto(await linkFromCatcher(email, since));
  await expect(page.getByTestId("account-menu")).toContainText("Account");
}

/**
 * A first sign-in lands on the choice of public name (with the page the person was heading to behind it):
 * choose a display name (or anonymity when `name` is null) and go on.
 */
export async function choosePublicName(page: Page, name: string | null): Promise<void> {
  await expect(page).toHaveURL(/\/account\/public-name\?callbackUrl=/);
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("How should your results name you?");
  if (name === null) await page.getByLabel(/^Anonymously/).check();
  else {
    await page.getByLabel("With a name I choose, shown beside each published result").check();
    await page.getByLabel("Display name").fill(name);
  }
  await page.getByRole("button", { name: "Save and continue" }).click();
  await expect(page).not.toHaveURL(/\/account\/public-name/);
}
