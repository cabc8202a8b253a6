import { expect, test, type Page } from "@playwright/test";
import { seriousViolations } from "./axe-helpers";
import { signIn } from "./sign-in-helpers";

async function setRole(admin: Page, email: string, role: "Contributor" | "Moderator" | "Admin") {
  const row = admin.locator(`[data-testid="user-row"][data-email="${email}"]`);
  await row.getByLabel(`Role for ${email}`).selectOption({ label: role });
  await row.getByRole("button", { name: "Change role" }).click();
  await expect(row.getByText(`Now ${role.toLowerCase()}.`)).toBeVisible();
}

// An admin changes a contributor's role; the contributor's access follows on their very next request,
// without signing in again.
test("an admin changes roles, and a contributor sees the admin area only while they are admin", async ({
  page,
  browser,
}) => {
  const contributor = "ridgeline@sagline.localhost";
  await signIn(page, contributor);
  const denied = await page.goto("/admin/users");
  expect(denied?.status()).toBe(403);
  await expect(page.getByTestId("forbidden")).toContainText("This page is not open to your role");

  const adminContext = await browser.newContext();
  const admin = await adminContext.newPage();
  await signIn(admin, "admin@sagline.localhost");
  await admin.goto("/admin/users");
  await expect(admin.getByRole("heading", { name: "Users and roles" })).toBeVisible();

  await setRole(admin, contributor, "Moderator");
  expect((await page.goto("/admin/users"))?.status()).toBe(403); // moderators do not manage roles

  await setRole(admin, contributor, "Admin");
  expect((await page.goto("/admin/users"))?.status()).toBe(200);
  await expect(page.getByRole("heading", { name: "Users and roles" })).toBeVisible();

  await setRole(admin, contributor, "Contributor");
  expect((await page.goto("/admin/users"))?.status()).toBe(403);

  // The role shown after a reload is the stored one.
  await admin.reload();
  await expect(admin.getByLabel(`Role for ${contributor}`)).toHaveValue("contributor");
  await adminContext.close();
});

test("the last admin cannot demote themselves", async ({ page }) => {
  await signIn(page, "admin@sagline.localhost");
  await page.goto("/admin/users");
  const row = page.locator('[data-testid="user-row"][data-email="admin@sagline.localhost"]');
  await row.getByLabel("Role for admin@sagline.localhost").selectOption({ label: "Moderator" });
  await row.getByRole("button", { name: "Change role" }).click();
  await expect(row.getByText("This is the last admin. Make someone else an admin first.")).toBeVisible();
  await page.reload();
  await expect(row.getByLabel("Role for admin@sagline.localhost")).toHaveValue("admin");
});

// An admin puts a notice on every page and pauses submissions; static public pages show the notice at once
// (tag revalidation), the submit page explains the pause, and both are undone.
test("an admin sets a site notice and pauses submissions; pages show both at once, then the admin undoes them", async ({
  page,
}) => {
  await signIn(page, "admin@sagline.localhost");
  // The admin pages pass the accessibility scan (see accessibility.spec.ts for the rest of the site).
  const found: string[] = [];
  for (const path of ["/admin/users", "/admin/catalogue", "/admin/mail", "/admin/settings"]) {
    await page.goto(path);
    found.push(...(await seriousViolations(page, path)));
  }
  expect(found).toEqual([]);
  await expect(page.getByRole("heading", { name: "Site settings", level: 1 })).toBeVisible();
  const notice = `Planned maintenance ${Date.now()}: the site may be slow for an hour.`;
  await page.getByLabel("Notice on every page").fill(notice);
  await page.getByLabel(/Pause new submissions/).check();
  // A pause without a reason is refused with a message at the field, and what was typed stays.
  await page.getByRole("button", { name: "Save settings" }).click();
  await expect(page.getByText("Say why submissions are paused")).toBeVisible();
  await expect(page.getByLabel("Notice on every page")).toHaveValue(notice);
  await page.getByLabel(/Why \(contributors see this/).fill("the review queue is catching up");
  await page.getByRole("button", { name: "Save settings" }).click();
  await expect(page.getByText("Saved. Every page shows the change now.")).toBeVisible();

  await page.goto("/");
  await expect(page.getByTestId("site-notice")).toHaveText(notice);
  await page.goto("/packs");
  await expect(page.getByTestId("site-notice")).toHaveText(notice);
  await page.goto("/submit");
  await expect(page.getByTestId("submissions-paused")).toContainText("the review queue is catching up");

  await page.goto("/admin/settings");
  await page.getByLabel("Notice on every page").fill("");
  await page.getByLabel(/Pause new submissions/).uncheck();
  await page.getByRole("button", { name: "Save settings" }).click();
  await expect(page.getByText("Saved. Every page shows the change now.")).toBeVisible();
  await page.goto("/");
  await expect(page.getByTestId("site-notice")).toHaveCount(0);
  await page.goto("/submit");
  await expect(page.getByTestId("submissions-paused")).toHaveCount(0);
});
