// Issue 14's journeys, end to end in the browser with the real mail worker: a contributor proposes a new pack
// (with label photos), a moderator checks the evidence — photos shown, the log downloaded, the curve with
// current and temperature — and approves, and the new pack is live at once on its page, in /packs and in the
// API; a moderator sends a result back, the e-mail's link opens the contributor's own view with the request,
// and the answer is confirmed with the result's number, on the page and by e-mail.
import { readFile } from "node:fs/promises";
import { expect, test, type Browser, type Page } from "@playwright/test";
import sharp from "sharp";
import { demoUsers } from "../../scripts/seed/scenario";
import { sampleLog } from "../helpers/logs";
import { caughtFor, firstLink } from "../helpers/mail";
import { seriousViolations } from "./axe-helpers";
import { choosePublicName, linkFromCatcher, requestLink, signIn } from "./sign-in-helpers";

function log4s(): Buffer {
  return Buffer.from(sampleLog({ seed: 1414 }).csv);
}

/** A label photo as a phone would send it: a JPEG carrying EXIF (a name and a GPS position). */
const labelPhoto = (colour: string) =>
  sharp({ create: { width: 64, height: 40, channels: 3, background: colour } })
    .jpeg()
    .withExif({ IFD0: { Artist: "E2E Phone Owner" }, IFD3: { GPSLatitudeRef: "N", GPSLatitude: "51/1 30/1 0/1" } })
    .toBuffer();

/** The newest caught message to an address whose subject matches, once the mail worker has sent it. */
async function mailTo(address: string, subject: RegExp): Promise<{ subject: string; text: string }> {
  let found: { subject: string; text: string } | undefined;
  await expect
    .poll(() => (found = caughtFor(address).find((m) => subject.test(m.subject))) !== undefined, { timeout: 20_000 })
    .toBe(true);
  if (!found) throw new Error("no mail");
  return found;
}

/** Every label photo on the page has loaded as a picture (not a broken image). */
async function photosLoaded(page: Page, testId: string, n: number) {
  const imgs = page.getByTestId(testId).getByRole("img");
  await expect(imgs).toHaveCount(n);
  for (let i = 0; i < n; i++) {
    // The photos load lazily: bring each into view as a reader scrolling down would.
    await imgs.nth(i).scrollIntoViewIfNeeded();
    await expect.poll(() => imgs.nth(i).evaluate((el) => (el as HTMLImageElement).naturalWidth)).toBeGreaterThan(0);
  }
}

async function asModerator(browser: Browser): Promise<Page> {
  const page = await (await browser.newContext({ acceptDownloads: true })).newPage();
  await signIn(page, "moderator@sagline.localhost");
  return page;
}

test("a proposed pack goes live when its first result is approved, after the moderator saw the photos and the log", async ({
  page,
  browser,
}) => {
  test.setTimeout(180_000);
  const email = `e2e-proposer-${Date.now()}@sagline.localhost`;
  const csv = log4s();
  await page.goto("/submit");
  await expect(page).toHaveURL(/\/sign-in\?callbackUrl=%2Fsubmit$/);
  await page.goto(await linkFromCatcher(email, await requestLink(page, email, page.url())));
  await choosePublicName(page, "Kestrel Shed Bench");
  await expect(page).toHaveURL(/\/submit$/);
  await page.evaluate(() => localStorage.clear());
  await page.reload();

  // Step 1: propose a new pack. A first "Next" with nothing filled in says what is missing…
  await page.getByText("Propose a new pack").click();
  await page.getByRole("button", { name: "Next: Method card" }).click();
  await expect(page.getByText("Some values on “Pack” need a look")).toBeVisible();
  await expect(page.getByText("Enter the connector (e.g. XT60).")).toBeVisible();
  await page.getByLabel("New maker's name").fill("Kestrelmoor Cells");
  await page.getByLabel("Model, as printed on the label").fill("Skua 1300 4S 75C");
  await page.getByLabel("Cells in series").fill("4");
  await page.getByLabel("Rated capacity").fill("1300");
  await page.getByLabel("Labelled continuous C").fill("75");
  await page.getByLabel("Connector").fill("XT60");
  // …and once it is filled in, one "Next" moves on (the focused field's message goes away on the way).
  await page.getByRole("button", { name: "Next: Method card" }).click();
  await expect(page.getByRole("group", { name: "Step 2 of 4: Method card" })).toBeVisible();

  // Step 2: the method card.
  await page.getByLabel(/^Ambient temperature/).fill("22");
  await page.getByLabel(/^Load current/).fill("13");
  await page.getByLabel(/^Cut-off voltage/).fill("3.3");
  await page.getByLabel(/^Stop temperature/).fill("60");
  await page.getByLabel("Resistance method").selectOption("dc-step");
  await page.getByLabel(/^Equipment/).fill("300 W electronic load, thermocouple on the pack face");
  await page.getByRole("button", { name: "Next: Log" }).click();

  // Step 3: the log.
  await page.getByTestId("log-file").setInputFiles({ name: "skua-run.csv", mimeType: "text/csv", buffer: csv });
  await expect(page.getByTestId("log-figures")).toContainText("Delivered capacity");
  await page.getByRole("button", { name: "Next: Photos and submit" }).click();

  // Step 4: what is about to be sent, two label photos, the declaration.
  const summary = page.getByTestId("submit-summary");
  await expect(summary).toContainText("Kestrelmoor Cells Skua 1300 4S 75C");
  await expect(summary).toContainText("(new: you propose it)");
  await expect(summary).toContainText("skua-run.csv");
  for (const [i, colour] of ["#e08a12", "#146d63"].entries()) {
    await page.getByTestId("photo-file").setInputFiles({
      name: `label-${i + 1}.jpg`,
      mimeType: "image/jpeg",
      buffer: await labelPhoto(colour),
    });
    await expect(page.getByTestId("photo-list").getByRole("listitem")).toHaveCount(i + 1);
  }
  await expect(summary).toContainText(/Label photos\s*2/);
  await page.getByLabel(/I declare that these are honest measurements/).check();
  await page.getByRole("button", { name: "Submit the result" }).click();
  const done = page.getByTestId("submit-done");
  await expect(done).toContainText(/result #\d+ is waiting for review/);
  const resultId = /result #(\d+)/.exec((await done.textContent()) ?? "")?.[1] ?? "";
  const receipt = await mailTo(email, new RegExp(`^Result #${resultId} received: Kestrelmoor Cells Skua`));
  expect(firstLink(receipt.text)).toMatch(new RegExp(`/account/results/${resultId}$`));

  // The moderator: the photos, the log as uploaded, the curve with voltage, current and temperature.
  const mod = await asModerator(browser);
  await mod.goto(`/review/${resultId}`);
  await expect(mod.getByTestId("proposed-entry")).toBeVisible();
  expect(await seriousViolations(mod, "/review/[id] with a proposal")).toEqual([]);
  await photosLoaded(mod, "label-photos", 2);
  const [download] = await Promise.all([mod.waitForEvent("download"), mod.getByTestId("log-download").click()]);
  expect(download.suggestedFilename()).toBe(`result-${resultId}-skua-run.csv`);
  expect(await readFile((await download.path()) ?? "")).toEqual(csv);
  const curve = mod.getByRole("img", { name: /^Log: Voltage.*; Current, A.*; Pack temperature.*, against time/ });
  await expect(curve).toBeVisible();
  // Stacked panels on one time axis (issue 15): the temperature has its own panel, in °C by default.
  await expect(curve.locator("[data-panel=t] text").first()).toHaveText(/^Pack temperature, °C/);
  await expect(mod.getByLabel("This pack is")).toHaveValue("");
  await mod.getByRole("button", { name: "Approve and publish" }).click();
  await expect(mod.getByTestId("decision-done")).toContainText(/approved/i);
  await expect(mod.getByTestId("result-status")).toHaveText("Approved");
  const packHref = (await mod.getByTestId("live-pack-link").getAttribute("href")) ?? "";
  expect(packHref).toBe("/packs/kestrelmoor-cells-skua-1300-4s-75c");

  // Live at once, for everyone: the pack page, /packs, the API, and the result with its photos.
  const reader = await (await browser.newContext()).newPage();
  const res = await reader.goto(packHref);
  expect(res?.status()).toBe(200);
  await expect(reader.getByRole("heading", { level: 1 })).toContainText("Kestrelmoor Cells Skua 1300 4S 75C");
  await expect(
    reader.getByTestId("pack-results").getByRole("link", { name: `Result #${resultId}`, exact: true }),
  ).toBeVisible();
  await reader.goto("/packs?maker=kestrelmoor-cells");
  await expect(reader.getByRole("link", { name: /Skua 1300 4S 75C/ }).first()).toBeVisible();
  const api = await reader.request.get(`/api/v1${packHref}`);
  expect(api.status()).toBe(200);
  expect(((await api.json()) as { data: { slug: string } }).data.slug).toBe("kestrelmoor-cells-skua-1300-4s-75c");
  await reader.goto(`/results/${resultId}`);
  await photosLoaded(reader, "result-photos", 2);
  await expect(reader.getByTestId("contributor")).toHaveText("Kestrel Shed Bench");
});

test("a result sent back: the e-mail's link opens the contributor's view with the request; the answer is confirmed with its number", async ({
  page,
  browser,
}) => {
  test.setTimeout(150_000);
  const mod = await asModerator(browser);
  await mod.goto("/review");
  const contributors = new Map(
    demoUsers.filter((u) => u.role === "contributor" && !u.anonymous).map((u) => [u.displayName, u.email]),
  );
  const rows = mod.getByTestId("queue-row");
  let resultId = "";
  let email = "";
  for (let i = 0; i < (await rows.count()) && !email; i++) {
    const text = (await rows.nth(i).textContent()) ?? "";
    const name = [...contributors.keys()].find((n) => text.includes(` · ${n} · `));
    if (name) {
      resultId = (await rows.nth(i).getAttribute("data-result-id")) ?? "";
      email = contributors.get(name) ?? "";
    }
  }
  expect(resultId).toMatch(/^\d+$/);
  const question = "Where was the thermocouple? The temperature rise looks low for 10C.";
  await mod.goto(`/review/${resultId}`);
  await mod.getByLabel("What the contributor should answer or change").fill(question);
  await mod.getByRole("button", { name: "Send back for an answer" }).click();
  await expect(mod.getByTestId("decision-done")).toContainText(/waiting for the contributor’s answer/i);
  await expect(mod.getByTestId("result-status")).toHaveText("Waiting for the contributor’s answer");

  // The e-mail's link leads to the contributor's own view (after signing in), with the request.
  const asked = await mailTo(email, new RegExp(`^Waiting for your answer: result #${resultId}, `));
  expect(asked.text).toContain(question);
  const link = firstLink(asked.text);
  expect(link).toMatch(new RegExp(`/account/results/${resultId}$`));
  await page.goto(link);
  await expect(page).toHaveURL(/\/sign-in\?callbackUrl=/);
  await page.goto(await linkFromCatcher(email, await requestLink(page, email, page.url())));
  await expect(page).toHaveURL(new RegExp(`/account/results/${resultId}$`));
  await expect(page.getByTestId("own-status")).toHaveText("Waiting for your answer");
  await expect(page.getByTestId("moderator-request")).toContainText(question);
  expect(await seriousViolations(page, "/account/results/[id]")).toEqual([]);

  // The answer form shows the request beside it; the answer is confirmed with the result's number.
  await page.getByRole("link", { name: "Answer the moderator" }).click();
  await expect(page).toHaveURL(new RegExp(`/submit/${resultId}$`));
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Answer the moderator");
  await expect(page.getByTestId("moderator-request")).toContainText(question);
  expect(await seriousViolations(page, "/submit/[id]")).toEqual([]);
  await page.getByLabel("Your answer to the moderator").fill("Taped to the middle of the widest face, under the wrap.");
  await page.getByLabel(/I declare that these are honest measurements/).check();
  await page.getByRole("button", { name: "Send my answer" }).click();
  await expect(page).toHaveURL(new RegExp(`/account/results/${resultId}\\?sent=answer$`));
  await expect(page.getByTestId("answer-sent")).toContainText(`Your answer on result #${resultId} was sent`);
  await expect(page.getByTestId("own-status")).toHaveText("Waiting for review");
  await expect(page.getByTestId("review-history")).toContainText("Waiting for your answer → Waiting for review");
  const confirmed = await mailTo(email, new RegExp(`^Answer received: result #${resultId}, `));
  expect(firstLink(confirmed.text)).toMatch(new RegExp(`/account/results/${resultId}$`));
});
