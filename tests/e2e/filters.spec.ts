// Filters that never lose input (issue 15): the URL is the one source of truth, and each change merges into
// it as it is at that moment. A reader typing at 30 ms a key from box to box — faster than any box's own
// delay — and picking a select straight after the search keeps every value.
import { expect, test } from "@playwright/test";
import { rows, settled } from "./packs-table-helpers";

test("values typed at 30 ms a key across five boxes, then a select, all reach the URL", async ({ page }) => {
  await page.setViewportSize({ width: 1280, height: 900 });
  await page.goto("/packs");
  await settled(page);
  const type = async (name: string | RegExp, text: string) => {
    const box = page.getByRole(name === "Search maker and model" ? "searchbox" : "spinbutton", { name });
    await box.click();
    await box.pressSequentially(text, { delay: 30 });
  };
  await type("Search maker and model", "vector");
  await type("Rated capacity from (mAh)", "1000");
  await type("Rated capacity to (mAh)", "4000");
  await type("Labelled continuous C from", "20");
  await type("Labelled continuous C to", "150");
  // Within the search box's own delay: the select must not undo the search, nor the search the select.
  await page.getByRole("combobox", { name: "Cells in series" }).selectOption("2");
  for (const part of ["q=vector", "minMah=1000", "maxMah=4000", "minC=20", "maxC=150", "cells=2"])
    await expect(page).toHaveURL(new RegExp(`[?&]${part}(&|$)`));
  await settled(page);
  // The boxes still show what was typed, and the table obeys all of it.
  await expect(page.getByRole("searchbox", { name: "Search maker and model" })).toHaveValue("vector");
  await expect(page.getByRole("spinbutton", { name: "Rated capacity to (mAh)" })).toHaveValue("4000");
  const cells = await rows(page).locator("td.c-cells").allTextContents();
  expect(cells.length).toBeGreaterThan(0);
  expect(new Set(cells.map((t) => t.trim()))).toEqual(new Set(["2S"]));
  // Back walks through the filters one change at a time (the last to commit was the last box typed in, a moment
  // after the select), and the boxes follow the URL.
  await page.goBack();
  await expect(page).not.toHaveURL(/maxC=150/);
  await expect(page).toHaveURL(/cells=2/);
  await expect(page.getByRole("spinbutton", { name: "Labelled continuous C to" })).toHaveValue("");
});
