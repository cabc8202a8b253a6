// Issue 8's remaining journeys, each from the freshly seeded database: a contributor answers a moderator's
// request, a moderator resolves a reader flag, a shopper downloads a filtered CSV, a journalist downloads a
// chart as PNG and SVG, and two keyboard-only walks (the packs table, the first steps of /submit).
import { readFile } from "node:fs/promises";
import { expect, test, type Page } from "@playwright/test";
import { rows, settled } from "./packs-table-helpers";
import { choosePublicName, signIn } from "./sign-in-helpers";

/** RFC 4180 records (quoted fields may hold commas, doubled quotes and line breaks); every line ends in CRLF. */
function parseCsv(text: string): string[][] {
  const records: string[][] = [];
  let field = "";
  let record: string[] = [];
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const c = text[i];
    if (quoted) {
      if (c === '"' && text[i + 1] === '"') {
        field += '"';
        i++;
      } else if (c === '"') quoted = false;
      else field += c;
    } else if (c === '"' && field === "") quoted = true;
    else if (c === ",") {
      record.push(field);
      field = "";
    } else if (c === "\r" && text[i + 1] === "\n") {
      record.push(field);
      records.push(record);
      record = [];
      field = "";
      i++;
    } else if (c === "\n") throw new Error(`bare LF at offset ${i}: RFC 4180 lines end in CRLF`);
    else field += c;
  }
  if (field !== "" || record.length > 0) throw new Error("the last record does not end in CRLF");
  return records;
}

/** The element that has focus, described for assertions. */
const focused = (page: Page) =>
  page.evaluate(() => {
    const el = document.activeElement as HTMLElement | null;
    if (!el) return { tag: "", id: "", text: "", role: "", label: "", href: "", type: "", name: "", form: "" };
    const labelled = el.id ? (document.querySelector(`label[for="${el.id}"]`)?.textContent ?? "") : "";
    return {
      tag: el.tagName.toLowerCase(),
      id: el.id,
      text: (el.textContent ?? "").trim(),
      role: el.getAttribute("role") ?? "",
      label: (el.getAttribute("aria-label") ?? labelled).trim(),
      href: el.getAttribute("href") ?? "",
      type: el.getAttribute("type") ?? "",
      name: el.getAttribute("name") ?? "",
      form: el.closest("form")?.getAttribute("aria-label") ?? "",
    };
  });

/** Presses Tab (or Shift+Tab) until the focused element matches, at most `max` times; fails with what had focus. */
async function tabTo(
  page: Page,
  match: (f: Awaited<ReturnType<typeof focused>>) => boolean,
  { max = 40, back = false } = {},
) {
  const seen: string[] = [];
  for (let i = 0; i < max; i++) {
    await page.keyboard.press(back ? "Shift+Tab" : "Tab");
    const f = await focused(page);
    if (match(f)) return f;
    seen.push(`${f.tag}#${f.id}[${f.label || f.text.slice(0, 30)}]`);
  }
  throw new Error(`never reached the wanted control; focus went through: ${seen.join(" → ")}`);
}

/** The focused element draws a visible focus indicator (an outline or a ring box-shadow). */
async function expectVisibleFocus(page: Page) {
  const style = await page.evaluate(() => {
    let el = document.activeElement as HTMLElement;
    // A visually hidden control (such as a styled radio) shows its focus on its label.
    if (el.getBoundingClientRect().width <= 1) el = el.closest("label") ?? el;
    const s = getComputedStyle(el);
    return { outline: s.outlineStyle !== "none" && parseFloat(s.outlineWidth) > 0, ring: s.boxShadow !== "none" };
  });
  expect(style.outline || style.ring, "the focused control shows a focus indicator").toBe(true);
}

test("a contributor answers a moderator's request and the result is back in the queue with its history", async ({
  page,
}) => {
  await signIn(page, "slipway@sagline.localhost");
  await page.goto("/account");
  const item = page
    .getByTestId("my-results")
    .getByRole("listitem")
    .filter({ hasText: "Waiting for your answer" })
    .filter({ has: page.getByRole("link", { name: "Answer the moderator" }) })
    .first();
  const testId = (await item.getAttribute("data-testid")) ?? "";
  const resultId = testId.replace("my-result-", "");
  expect(resultId).toMatch(/^\d+$/);

  await item.getByRole("link", { name: "Answer the moderator" }).click();
  await expect(page).toHaveURL(new RegExp(`/submit/${resultId}$`));
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Answer the moderator");
  await expect(page.getByTestId("moderator-request")).toBeVisible();

  // The method card arrives as stored; say where the probe sat and correct the ambient.
  await expect(page.getByLabel(/^Equipment/)).not.toHaveValue("");
  await page.getByLabel(/^Ambient temperature/).fill("22");
  await page.getByLabel("Notes (optional)").fill("Probe taped to the middle of the widest face, under the wrap.");
  // The answer is required.
  await page.getByLabel(/I declare that these are honest measurements/).check();
  await page.getByRole("button", { name: "Send my answer" }).click();
  await expect(page.getByText("Say what you changed, for the moderator.")).toBeVisible();
  await page.getByLabel("Your answer to the moderator").fill("Added where the probe sat; ambient corrected to 22 °C.");
  await page.getByRole("button", { name: "Send my answer" }).click();

  await expect(page).toHaveURL(new RegExp(`/account/results/${resultId}\\?sent=answer$`));
  await expect(page.getByTestId("answer-sent")).toContainText(`result #${resultId}`);
  await page.goto("/account");
  const mine = page.getByTestId(`my-result-${resultId}`);
  await expect(mine).toContainText("Waiting for review");
  await expect(mine).toContainText("ambient 22 °C");
  await expect(mine.getByRole("link", { name: "Answer the moderator" })).toHaveCount(0);
  await mine.getByText(/^Review history/).click();
  const history = mine.getByRole("listitem");
  await expect(history.last()).toContainText("Waiting for your answer → Waiting for review");
  await expect(history.nth(-2)).toContainText("Waiting for review → Waiting for your answer");

  // It can no longer be edited: it waits for a moderator again.
  await page.goto(`/submit/${resultId}`);
  await expect(page.getByText(/only a result waiting for your answer can be edited/)).toBeVisible();
});

test("a moderator dismisses a reader's flag: the result stayed published throughout and its open check goes", async ({
  page,
}) => {
  await signIn(page, "moderator@sagline.localhost");
  await page.goto("/review/flags");
  await expect(page.getByRole("heading", { level: 1, name: "Reader flags" })).toBeVisible();
  const flag = page
    .getByTestId("flag-queue")
    .getByRole("listitem")
    .filter({ hasText: "Capacity looks high for this pack." })
    .filter({ hasText: "Approved" })
    .first();
  const resultHref = (await flag.getByRole("link", { name: /^result #\d+$/ }).getAttribute("href")) ?? "";
  const resultId = resultHref.replace("/review/", "");
  expect(resultId).toMatch(/^\d+$/);

  // The public page shows the open check before (and so holds a cached copy that the resolution must expire);
  // the result is published and counted meanwhile.
  await page.goto(`/results/${resultId}`);
  await expect(page.getByTestId("open-case")).toContainText("the figures may be wrong — it still counts");
  expect((await page.request.get(`/api/v1/results/${resultId}`)).status()).toBe(200);

  await page.goto("/review/flags");
  const row = page
    .getByTestId("flag-queue")
    .getByRole("listitem")
    .filter({ has: page.getByRole("link", { name: `result #${resultId}`, exact: true }) });
  await row
    .getByLabel("Note (required for “keep, with a note” and for taking the result out)")
    .fill("Capacity checked against the log; it matches.");
  const flagId = ((await row.getByRole("form").getAttribute("aria-label")) ?? "").replace("Resolve flag ", "");
  expect(flagId).toMatch(/^\d+$/);
  await row.getByRole("button", { name: "Keep the result" }).click();
  // The action refreshes the queue: the resolved flag leaves it (and its form with it)…
  await expect(page.getByRole("link", { name: `result #${resultId}`, exact: true })).toHaveCount(0);
  // …while the confirmation, outside the list, stays: it names the flag, the result and the outcome, and
  // holds the focus that the removed button had.
  const done = page.getByRole("status").filter({ hasText: `Flag #${flagId} on result #${resultId}` });
  await expect(done).toBeVisible();
  await expect(done).toContainText(
    "resolved: result kept. It stays published and counted, and no longer shows an open check.",
  );
  await expect(done).toBeFocused();
  await expect(page.getByTestId("flag-queue").getByText(`Flag #${flagId} on`)).toHaveCount(0);
  await page.goto("/review/flags");
  await expect(page.getByRole("link", { name: `result #${resultId}`, exact: true })).toHaveCount(0);

  await page.goto(`/results/${resultId}`);
  await expect(page.getByTestId("open-case")).toHaveCount(0);
  // A flag never changed the status, so the public history has no step for it.
  await expect(page.getByTestId("review-history")).not.toContainText("disputed");
});

test("a shopper downloads a filtered packs CSV from /data: strict RFC 4180, the licence in the README beside it", async ({
  page,
}) => {
  await page.goto("/data");
  await page.getByLabel("Cells in series (S)").fill("4");
  await page.getByLabel("Connector").fill("XT60");
  const [download] = await Promise.all([
    page.waitForEvent("download"),
    page.getByRole("button", { name: "Download packs.csv" }).click(),
  ]);
  expect(download.suggestedFilename()).toMatch(/^sagline-packs-\d{4}-\d{2}-\d{2}-v\d+\.\d+\.\d+\.csv$/);
  expect(download.url()).toMatch(/cells=4/);
  expect(download.url()).toMatch(/connector=XT60/);
  const text = await readFile((await download.path()) ?? "", "utf8");

  // Nothing but a header and records: no comment lines for a CSV reader to mistake for the header.
  const [header, ...body] = parseCsv(text);
  expect(header).toEqual([
    "id",
    "slug",
    "makerId",
    "makerSlug",
    "makerName",
    "model",
    "cellsInSeries",
    "ratedCapacityMah",
    "labelledContinuousC",
    "labelledBurstC",
    "weightG",
    "connector",
    "resultCount",
  ]);
  // The licence and the credit are in the README the page links, beside the files.
  const readme = await page.request.get(
    (await page
      .getByRole("link", { name: /README/ })
      .first()
      .getAttribute("href")) ?? "",
  );
  const notes = await readme.text();
  expect(notes).toContain("CC BY 4.0");
  expect(notes).toContain("https://creativecommons.org/licenses/by/4.0/");
  expect(body.length).toBeGreaterThan(0);
  for (const r of body) {
    expect(r).toHaveLength(header?.length ?? 0);
    expect(r[6]).toBe("4");
    expect(r[11]).toBe("XT60");
    expect(Number(r[7])).toBeGreaterThan(0);
  }
  // The same filter through the public API gives the same packs.
  const api = (await (await page.request.get("/api/v1/packs?cells=4&connector=XT60&size=100")).json()) as {
    data: { slug: string }[];
  };
  expect(body.map((r) => r[1]).sort()).toEqual(api.data.map((p) => p.slug).sort());
});

test("a journalist opens a chart from /charts and downloads it as PNG and SVG", async ({ page }) => {
  await page.goto("/charts");
  const first = page.getByTestId("chart-list").getByRole("listitem").first();
  const title = ((await first.getByRole("heading").textContent()) ?? "").trim();
  await first.getByRole("heading").getByRole("link").click();
  await expect(page).toHaveURL(/\/charts\/view\/[A-Za-z0-9_-]+(\/[A-Za-z0-9_-]+)*$/);
  await expect(page.getByRole("heading", { level: 1 })).toHaveText(title);

  const [png] = await Promise.all([
    page.waitForEvent("download"),
    page.getByRole("link", { name: /PNG image/ }).click(),
  ]);
  expect(png.suggestedFilename()).toMatch(/^sagline-.+\.png$/);
  const bytes = await readFile((await png.path()) ?? "");
  expect([...bytes.subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
  // IHDR width and height (big-endian at bytes 16–23): the link promises 1600 × 1000.
  expect(bytes.readUInt32BE(16)).toBe(1600);
  expect(bytes.readUInt32BE(20)).toBe(1000);
  expect(bytes.length).toBeGreaterThan(10_000);
  expect(bytes.length).toBeLessThan(5_000_000);

  const [svg] = await Promise.all([
    page.waitForEvent("download"),
    page.getByRole("link", { name: "SVG image" }).click(),
  ]);
  expect(svg.suggestedFilename()).toMatch(/^sagline-.+\.svg$/);
  const text = await readFile((await svg.path()) ?? "", "utf8");
  expect(text).toMatch(/^(<\?xml[^>]*>\s*)?<svg[\s>]/);
  expect(text).toContain("Source: Sagline");
  expect(text).toContain("CC BY 4.0");
  expect(text).toContain(title.replace(/&/g, "&amp;"));
});

test("keyboard only: search the packs table, sort by a header, and open a pack", async ({ page }) => {
  await page.goto("/packs");
  await settled(page);
  // From the top of the page: Tab to the search box (past the skip link, header and filters).
  await page.locator("body").focus();
  await tabTo(page, (f) => f.form === "Filter packs" && f.name === "q");
  await expect(page.getByRole("searchbox", { name: "Search maker and model" })).toBeFocused();
  await expectVisibleFocus(page);
  await page.keyboard.type("brakwater");
  await expect(page).toHaveURL(/q=brakwater/);
  await settled(page);
  await expect
    .poll(async () => [...new Set((await rows(page).locator("th span").allTextContents()).map((t) => t.trim()))])
    .toEqual(["Brackwater Power"]);

  // On to the "Rated mAh" header button; Enter sorts, highest first.
  await tabTo(page, (f) => f.tag === "button" && f.text.startsWith("Rated mAh"));
  await expectVisibleFocus(page);
  await page.keyboard.press("Enter");
  await expect(page).toHaveURL(/sort=capacity&dir=desc/);
  await expect(page.getByRole("columnheader", { name: /Rated mAh/ })).toHaveAttribute("aria-sort", "descending");
  await settled(page);
  const model = ((await rows(page).first().locator("th a").textContent()) ?? "").trim();
  const href = (await rows(page).first().locator("th a").getAttribute("href")) ?? "";
  expect(href).toMatch(/^\/packs\//);

  // On to the first pack link in the table; Enter opens it.
  await tabTo(page, (f) => f.tag === "a" && f.href === href);
  await expectVisibleFocus(page);
  await page.keyboard.press("Enter");
  await expect(page).toHaveURL(new RegExp(`${href}$`));
  await expect(page.getByRole("heading", { level: 1 })).toContainText(model);
});

test("keyboard only: the first steps of /submit, from the pack search to the log upload", async ({ page }) => {
  await signIn(page, `e2e-keys-${Date.now()}@sagline.localhost`);
  await choosePublicName(page, "Keyboard Bench");
  await page.goto("/submit");
  await page.evaluate(() => localStorage.clear());
  await page.reload();
  await expect(page.getByRole("group", { name: "Step 1 of 4: Pack" })).toBeEnabled();

  // Step 1: Tab to the pack choice (the catalogue is chosen); arrow keys move between the two choices.
  await page.locator("body").focus();
  await tabTo(page, (f) => f.tag === "input" && f.type === "radio");
  await expect(page.getByRole("radio", { name: "Choose from the catalogue" })).toBeFocused();
  await expectVisibleFocus(page);
  await page.keyboard.press("ArrowRight");
  await expect(page.getByRole("radio", { name: "Propose a new pack" })).toBeChecked();
  await expect(page.getByLabel("Model, as printed on the label")).toBeVisible();
  await page.keyboard.press("ArrowLeft");
  await expect(page.getByRole("radio", { name: "Choose from the catalogue" })).toBeChecked();

  // The fuzzy search, a typo on purpose; Tab to the first hit and choose it with Enter.
  await page.keyboard.press("Tab");
  await expect(page.getByLabel("Search packs")).toBeFocused();
  await expectVisibleFocus(page);
  await page.keyboard.type("1300 4S Fellrunerr");
  const firstHit = page.getByTestId("pack-hits").getByRole("button").first();
  await expect(firstHit).toBeVisible();
  await page.keyboard.press("Tab");
  await expect(firstHit).toBeFocused();
  await expectVisibleFocus(page);
  await page.keyboard.press("Enter");
  await expect(firstHit).toHaveAttribute("aria-pressed", "true");
  await expect(page.getByTestId("chosen-pack")).toContainText("4S 1,300 mAh");

  // On to "Next: Method card" (Back is disabled on the first step, so Tab skips it); Enter moves on.
  await tabTo(page, (f) => f.tag === "button" && f.text === "Next: Method card");
  await expectVisibleFocus(page);
  await page.keyboard.press("Enter");
  await expect(page.getByRole("group", { name: "Step 2 of 4: Method card" })).toBeVisible();
  // Focus moves to the new step's first control, the bench profile (none yet for a new contributor).
  await expect(page.getByLabel("Bench profile")).toBeFocused();
  await expectVisibleFocus(page);

  // Step 2: the method card, field by field with Tab; Shift+Tab goes back.
  await page.keyboard.press("Tab");
  await expect(page.getByLabel(/^Ambient temperature/)).toBeFocused();
  await page.keyboard.type("21");
  await page.keyboard.press("Shift+Tab");
  await expect(page.getByLabel("Bench profile")).toBeFocused();
  await page.keyboard.press("Tab");
  await page.keyboard.press("Tab");
  await expect(page.getByLabel(/^Pack temperature at the start/)).toBeFocused();
  await page.keyboard.type("20");
  await page.keyboard.press("Tab");
  await expect(page.getByLabel(/^Load current/)).toBeFocused();
  await page.keyboard.type("13");
  await page.keyboard.press("Tab");
  await expect(page.getByLabel(/^Cut-off voltage/)).toBeFocused();
  await page.keyboard.type("3.3");
  await page.keyboard.press("Tab");
  await expect(page.getByLabel(/^Stop temperature/)).toBeFocused();
  await page.keyboard.type("60");
  await page.keyboard.press("Tab");
  await expect(page.getByLabel(/^Sample rate/)).toBeFocused();
  await page.keyboard.type("1");
  await page.keyboard.press("Tab");
  await expect(page.getByLabel(/^Cycles before this test/)).toBeFocused();
  await expect(page.getByLabel(/^Cycles before this test/)).toHaveValue("0");
  // Load mode starts at constant current; arrow keys change a closed select.
  await page.keyboard.press("Tab");
  await expect(page.getByLabel("Load mode")).toBeFocused();
  await expect(page.getByLabel("Load mode")).toHaveValue("constant-current");
  await page.keyboard.press("Tab");
  await expect(page.getByLabel("Resistance method")).toBeFocused();
  await expectVisibleFocus(page);
  await page.keyboard.press("ArrowDown");
  await page.keyboard.press("ArrowDown");
  await expect(page.getByLabel("Resistance method")).toHaveValue("dc-step");
  // Past the date (its day, month and year parts are tab stops of their own) to the equipment.
  await tabTo(page, (f) => f.id === "method-equipment", { max: 6 });
  await page.keyboard.type("300 W electronic load, probe on the widest face");
  await page.keyboard.press("Tab");
  await expect(page.getByLabel("Notes (optional)")).toBeFocused();
  await page.keyboard.type("Walked with the keyboard only.");
  await page.keyboard.press("Tab");
  await expect(page.getByRole("button", { name: "Back" })).toBeFocused();
  await page.keyboard.press("Tab");
  await expect(page.getByRole("button", { name: "Next: Log" })).toBeFocused();
  await expectVisibleFocus(page);
  await page.keyboard.press("Enter");

  // Step 3: the upload step; focus lands on its file chooser, which shows its focus.
  await expect(page.getByRole("group", { name: "Step 3 of 4: Log" })).toBeVisible();
  await expect(page.getByTestId("log-file")).toBeFocused();
  await expectVisibleFocus(page);
  // What was typed is in the draft: going back shows the method card as entered.
  await tabTo(page, (f) => f.tag === "button" && f.text === "Back");
  await page.keyboard.press("Space");
  await expect(page.getByRole("group", { name: "Step 2 of 4: Method card" })).toBeVisible();
  await expect(page.getByLabel("Bench profile")).toBeFocused();
  await expect(page.getByLabel(/^Ambient temperature/)).toHaveValue("21");
  await expect(page.getByLabel(/^Load current/)).toHaveValue("13");
  await expect(page.getByLabel("Resistance method")).toHaveValue("dc-step");
  await expect(page.getByLabel(/^Equipment/)).toHaveValue("300 W electronic load, probe on the widest face");
});
