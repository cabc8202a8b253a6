// Anyone can check a log on /analyse without signing in; nothing is stored.
import { expect, test } from "@playwright/test";
import { generateLog, toCsv } from "../../lib/synthetic/equivalent-circuit";

test("a visitor checks a log written with semicolons, decimal commas and mV/mA, and reads it as a table too", async ({
  page,
}) => {
  const { rows } = generateLog({
    seed: 7,
    cells: 4,
    capacityMah: 1300,
    loadCurrentA: 13,
    cutoffVPerCell: 3.3,
    sampleIntervalS: 0.5,
    initialRestS: 5,
    finalRestS: 5,
    iecPrelude: true,
  });
  const csv = toCsv(rows, { delimiter: ";", decimalComma: true, voltageUnit: "mV", currentUnit: "mA", timeUnit: "ms" });
  expect(csv.split("\n")[0]).toContain(";");

  await page.goto("/analyse");
  await page.getByLabel("Cells in series (S)").fill("4");
  await page.getByLabel("Rated capacity (mAh)").fill("1300");
  await page
    .getByTestId("analyse-file")
    .setInputFiles({ name: "bench-semicolon.csv", mimeType: "text/csv", buffer: Buffer.from(csv) });
  const figures = page.getByTestId("log-figures");
  await expect(figures).toContainText("Delivered capacity");
  await expect(figures).toContainText(/1,2\d\d mAh/);
  await expect(figures).toContainText("IEC 61960-3 two-level");
  await expect(page.getByRole("link", { name: "Delivered capacity" })).toHaveAttribute(
    "href",
    "/methods#delivered-capacity",
  );
  // Stacked panels sharing one time axis, each with its own unit (issue 15), and the same readings as a table.
  await expect(page.getByRole("img", { name: /^Log: Voltage.*; Current, A.*, against time/ })).toBeVisible();
  await page.getByRole("button", { name: "Show as table" }).click();
  await expect(page.getByRole("table").getByRole("columnheader", { name: /^Voltage/ })).toBeVisible();
  await expect(page.getByRole("table").getByRole("columnheader", { name: "Current, A" })).toBeVisible();

  // A file that is not a log gets a clear message on the file field.
  await page
    .getByTestId("analyse-file")
    .setInputFiles({ name: "label.pdf", mimeType: "text/csv", buffer: Buffer.from("%PDF-1.7 nothing here") });
  await expect(page.getByText(/This file is not a CSV text log/)).toBeVisible();
});
