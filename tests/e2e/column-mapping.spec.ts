// A tester with a logger that writes no header row: on /submit the first rows are shown with a picker above each
// column; once the columns are named, the log is uploaded with that mapping and its four discharges are listed,
// with the headline figures of one of them (never their sum). The log is invented (lib/synthetic: four cycles of
// an equivalent-circuit pack, no header row).
import { expect, test } from "@playwright/test";
import { sampleLog } from "../helpers/logs";
import { choosePublicName, signIn } from "./sign-in-helpers";

function fourCycles(): Buffer {
  return Buffer.from(
    sampleLog(
      { seed: 4343, cycles: 4, chargeCurrentA: 2.6, chargeRestS: 30 },
      { header: false, columns: ["time", "current", "voltage", "temperature"] },
    ).csv,
  );
}

test("a tester maps the columns of a header-less log on /submit and sees its four discharges and one headline", async ({
  page,
}) => {
  await signIn(page, `e2e-map-${Date.now()}@test.sagline.localhost`, "/sign-in?callbackUrl=%2Fsubmit");
  await choosePublicName(page, null);
  await expect(page).toHaveURL(/\/submit$/);
  await page.evaluate(() => localStorage.clear());
  await page.reload();

  await page.getByLabel("Search packs").fill("1300 4S Fellrunner");
  await page.getByTestId("pack-hits").getByRole("button").first().click();
  await expect(page.getByTestId("chosen-pack")).toContainText("4S 1,300 mAh");
  await page.getByRole("button", { name: "Next: Method card" }).click();

  await page.getByLabel(/^Ambient temperature/).fill("22");
  await page.getByLabel(/^Load current/).fill("13");
  await page.getByLabel(/^Cut-off voltage/).fill("3.3");
  await page.getByLabel(/^Stop temperature/).fill("60");
  await page.getByLabel("Resistance method").selectOption("dc-step");
  await page.getByLabel(/^Equipment/).fill("Cycler with its own logger at 1 Hz (no header row)");
  await page.getByRole("button", { name: "Next: Log" }).click();

  await page
    .getByTestId("log-file")
    .setInputFiles({ name: "cycler-4.csv", mimeType: "text/csv", buffer: fourCycles() });
  // Nothing is uploaded until the columns are named: the picker is open, with the first rows under it.
  const picker = page.getByTestId("column-mapping");
  await expect(picker).toBeVisible();
  await expect(picker).toContainText("could not name the columns");
  await expect(picker.getByLabel("The log has a header row naming its columns")).not.toBeChecked();
  await expect(page.getByTestId("stored-log")).toHaveCount(0);
  // A mapping missing a column is refused in words before anything is sent.
  await picker.getByRole("button", { name: "Upload with these columns" }).click();
  await expect(picker.getByRole("alert")).toContainText("Choose the time column.");
  // Name each column, from the keyboard as much as by pointer.
  await page.getByTestId("column-role-0").selectOption("time");
  await page.getByTestId("column-role-1").selectOption("current");
  await page.getByTestId("column-role-2").focus();
  await page.getByTestId("column-role-2").selectOption("voltage");
  await page.getByLabel(/^Column 4/).selectOption({ label: "pack temperature" });
  await picker.getByRole("button", { name: "Upload with these columns" }).click();

  await expect(page.getByTestId("stored-log")).toContainText("cycler-4.csv");
  const rows = page.getByTestId("discharge-row");
  await expect(rows).toHaveCount(4);
  await expect(page.getByTestId("headline-discharge")).toContainText(
    "The log holds 4 discharges. The headline figures describe discharge 1",
  );
  await expect(rows.first()).toHaveAttribute("data-headline", "true");
  await expect(rows.first()).toContainText("reached");
  // The headline figures are the first discharge's: its capacity, not the four together.
  const first = (await rows.first().locator("td").nth(2).textContent()) ?? "";
  await expect(page.getByTestId("log-figures")).toContainText(first.trim());
  await expect(page.getByTestId("log-warnings")).toContainText(/discharge/i);
  await expect(page.getByTestId("rating-measured")).toContainText("C");

  // The server re-analyses the stored log with the same mapping when the result is submitted.
  await page.getByRole("button", { name: "Next: Photos and submit" }).click();
  await page.getByLabel(/I declare that these are honest measurements/).check();
  await page.getByRole("button", { name: "Submit the result" }).click();
  await expect(page.getByTestId("submit-done")).toContainText("waiting for review");
});
