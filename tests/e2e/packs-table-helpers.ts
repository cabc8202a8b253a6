// The packs table as browser tests see it.
import { expect, type Page } from "@playwright/test";

export const rows = (page: Page) => page.getByTestId("packs-table").locator("tbody tr");

/** Waits until the table stops changing: the server-rendered rows are replaced once the client has hydrated. */
export async function settled(page: Page) {
  await expect(page.getByTestId("pack-count")).not.toHaveText(/Loading/);
  let prev = "";
  await expect
    .poll(
      async () => {
        const now = (await rows(page).allTextContents()).join("|");
        const same = now === prev && now !== "";
        prev = now;
        return same;
      },
      { intervals: [700], timeout: 20_000 },
    )
    .toBe(true);
}
