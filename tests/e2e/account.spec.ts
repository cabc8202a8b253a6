import { expect, test } from "@playwright/test";
import { choosePublicName, linkFromCatcher, requestLink } from "./sign-in-helpers";

// A new contributor signs in with the link from the caught mail, chooses how published results name them
// (explicitly: an empty name is not "anonymous"), keeps a bench profile, and signs out.
test("sign in through the caught mail, create and edit a bench profile, sign out", async ({ page }) => {
  const email = `e2e-bench-${Date.now()}@sagline.localhost`;

  // A signed-out visitor is sent to sign in, and the link brings them back.
  await page.goto("/account/bench-profiles");
  await expect(page).toHaveURL(/\/sign-in\?callbackUrl=%2Faccount%2Fbench-profiles$/);
  await page.getByLabel("E-mail address").fill("not an address");
  await page.getByRole("button", { name: "E-mail me a sign-in link" }).click();
  await expect(page.getByText("Enter an e-mail address like name@example.com.")).toBeVisible();
  const since = await requestLink(page, email, "/sign-in?callbackUrl=%2Faccount%2Fbench-profiles");
  // The mail worker sends the link a moment after the answer: wait until the catcher holds it.
  await linkFromCatcher(email, since);

  // Open the message on the caught-mail page and click its link.
  await page.getByRole("link", { name: "the caught mail" }).click();
  await page
    .getByTestId("caught-mail")
    .getByRole("link", { name: new RegExp(email) })
    .first()
    .click();
  await expect(page.getByRole("heading", { name: "Your Sagline sign-in link" })).toBeVisible();
  await page.getByTestId("mail-body").getByRole("link").first().click();

  // A first sign-in asks for the public name before going on; saving without a choice explains itself.
  await expect(page).toHaveURL(/\/account\/public-name\?callbackUrl=/);
  await page.getByRole("button", { name: "Save and continue" }).click();
  await expect(page.getByText("Choose how your published results name you.")).toBeVisible();
  await choosePublicName(page, "Shed Tester");
  await expect(page).toHaveURL(/\/account\/bench-profiles$/);
  await expect(page.getByRole("heading", { name: "Bench profiles", level: 1 })).toBeVisible();
  await expect(page.getByTestId("account-menu")).toContainText("Account");

  // Name shown on results.
  await page.getByRole("navigation", { name: "Account" }).getByRole("link", { name: "Overview" }).click();
  await expect(page.getByText(`Signed in as ${email}`)).toBeVisible();
  await expect(page.getByLabel("Display name")).toHaveValue("Shed Tester");
  await page.getByLabel("Display name").fill("Heron Test Bench");
  await page.getByRole("button", { name: "Save", exact: true }).click();
  await expect(page.getByText("Saved: your published results now name you as chosen.")).toBeVisible();

  // A bench profile: the form explains what is missing, then saves.
  await page.getByRole("link", { name: "New bench profile" }).click();
  await page.getByRole("button", { name: "Create bench profile" }).click();
  await expect(page.getByText("Enter the profile name.")).toBeVisible();
  await expect(page.getByText("Choose how you measure resistance.")).toBeVisible();
  await page.getByLabel("Profile name").fill("Cold shed bench");
  await page.getByLabel("Load equipment").fill("300 W electronic load");
  await page.getByLabel("Resistance method").selectOption("iec-61960-two-level");
  await page.getByLabel("Stop temperature (°C)").fill("95");
  await page.getByLabel("Cut-off voltage (V per cell)").click();
  await expect(page.getByText("Stop temperature must be at most 80 °C.")).toBeVisible();
  await page.getByLabel("Stop temperature (°C)").fill("60");
  await page.getByLabel("Ambient temperature (°C)").fill("-5");
  await page.getByLabel("Cut-off voltage (V per cell)").fill("3.3");
  await page.getByLabel("Sample rate (Hz)").fill("10");
  await page.getByRole("button", { name: "Create bench profile" }).click();

  await expect(page).toHaveURL(/\/account\/bench-profiles$/);
  const list = page.getByTestId("bench-profile-list");
  await expect(list.getByRole("heading", { name: "Cold shed bench" })).toBeVisible();
  await expect(list).toContainText("IEC 61960-3 two-level DC");
  await expect(list).toContainText("ambient -5 °C");
  await expect(list).toContainText("cut-off 3.30 V/cell");

  // Edit it.
  await list.getByRole("link", { name: "Edit" }).click();
  await expect(page.getByLabel("Profile name")).toHaveValue("Cold shed bench");
  await page.getByLabel("Profile name").fill("Warm shed bench");
  await page.getByRole("button", { name: "Save changes" }).click();
  await expect(page).toHaveURL(/\/account\/bench-profiles$/);
  await expect(list.getByRole("heading", { name: "Warm shed bench" })).toBeVisible();

  // Sign out: the session is gone, so the account area asks to sign in again.
  await page.getByRole("navigation", { name: "Account" }).getByRole("link", { name: "Overview" }).click();
  await page.getByRole("button", { name: "Sign out" }).click();
  await expect(page).toHaveURL(/\/$/);
  await expect(page.getByTestId("account-menu")).toHaveText("Sign in");
  await page.goto("/account");
  await expect(page).toHaveURL(/\/sign-in\?callbackUrl=%2Faccount$/);
});

test("the same sign-in link cannot be used twice", async ({ page, browser }) => {
  const email = `e2e-once-${Date.now()}@sagline.localhost`;
  const { linkFromCatcher } = await import("./sign-in-helpers");
  const since = await requestLink(page, email);
  const link = await linkFromCatcher(email, since);
  await page.goto(link);
  await expect(page).toHaveURL(/\/account\/public-name\?callbackUrl=.*%2Faccount$/);
  const other = await browser.newContext();
  const second = await other.newPage();
  await second.goto(link);
  await expect(second).toHaveURL(/\/sign-in\?error=Verification/);
  await expect(second.getByText("That sign-in link has expired or was already used.")).toBeVisible();
  await other.close();
});

// A shopper asks for e-mails about new results on a pack from its (static) page: signed out the control asks
// them to sign in and brings them back; signed in it is a real toggle saying what they will be told about, and
// the request shows on the account page, where it can be stopped.
test("ask for a pack's new-result e-mails after signing in, see it on the account page, and stop it there", async ({
  page,
}) => {
  const email = `e2e-packmail-${Date.now()}@sagline.localhost`;
  const packPath = "/packs/ashcombe-cells-ridge-1800-5s-130c";
  await page.goto(packPath);
  const title = (await page.getByRole("heading", { level: 1 }).textContent())?.trim() ?? "";
  await page.getByRole("link", { name: /^E-mail me new results for .*sign in first/ }).click();
  await expect(page).toHaveURL(/\/sign-in\?callbackUrl=%2Fpacks%2Fashcombe-cells-ridge-1800-5s-130c$/);
  await page.goto(await linkFromCatcher(email, await requestLink(page, email, page.url())));
  await choosePublicName(page, null);
  await expect(page).toHaveURL(new RegExp(`${packPath}$`));

  const off = page.getByRole("button", { name: "E-mail me new results for this pack" });
  await expect(off).toHaveAttribute("aria-pressed", "false");
  await off.click();
  const on = page.getByRole("button", { name: "E-mails on: new results for this pack · stop" });
  await expect(on).toHaveAttribute("aria-pressed", "true");
  // The state is the server's, not the button's: a reload still says on.
  await page.reload();
  await expect(on).toBeVisible();

  await page.goto("/account");
  const list = page.getByTestId("pack-emails-list");
  await expect(list.getByRole("link", { name: title })).toBeVisible();
  await list.getByRole("button", { name: `Stop e-mails about ${title}` }).click();
  await expect(page.getByText("No e-mails about packs.")).toBeVisible();
  await page.goto(packPath);
  await expect(page.getByRole("button", { name: "E-mail me new results for this pack" })).toBeVisible();
});
