// Screenshots of public pages for checking by eye: node scripts/screenshots.mjs BASE_URL OUT_DIR path...
// Each path is taken at 1280 and 390 px wide, light and dark. Uses Debian's chromium (never a download).
import { chromium } from "playwright-core";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";

const [base = "http://localhost:3012", out = ".run/shots", ...paths] = process.argv.slice(2);
fs.mkdirSync(out, { recursive: true });
const dir = fs.mkdtempSync(path.join(os.tmpdir(), "sagline-shots-"));
const ctx = await chromium.launchPersistentContext(dir, {
  executablePath: "/usr/bin/chromium",
  headless: true,
  args: [
    "--no-sandbox",
    "--disable-gpu",
    "--disable-quic",
    "--no-first-run",
    "--disable-background-networking",
    "--disable-component-update",
    "--disable-sync",
  ],
});
try {
  const page = ctx.pages()[0] ?? (await ctx.newPage());
  for (const p of paths.length ? paths : ["/"]) {
    for (const width of [1280, 390]) {
      for (const scheme of ["light", "dark"]) {
        await page.emulateMedia({ colorScheme: scheme });
        await page.setViewportSize({ width, height: 900 });
        // Not "networkidle": link prefetches of routes other branches own can stay open.
        await page.goto(base + p, { waitUntil: "load", timeout: 120_000 });
        await page.waitForTimeout(1500);
        const name = `${p.replace(/[^a-z0-9]+/gi, "_").replace(/^_|_$/g, "") || "home"}-${width}-${scheme}.png`;
        // Narrow pages are long: save them in 1400 px slices so each stays readable at full size.
        const total = await page.evaluate(() => document.documentElement.scrollHeight);
        const slice = width < 600 ? 1400 : total;
        for (let top = 0, k = 0; top < total; top += slice, k++) {
          const file = path.join(out, slice === total ? name : name.replace(".png", `-${k}.png`));
          await page.screenshot({
            path: file,
            fullPage: true,
            clip: { x: 0, y: top, width, height: Math.min(slice, total - top) },
          });
          console.log(file);
        }
      }
    }
  }
} finally {
  await ctx.close();
  fs.rmSync(dir, { recursive: true, force: true });
}
