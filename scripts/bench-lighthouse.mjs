// npm run bench:lighthouse — Lighthouse 12.2.3 (the last release that runs on Node 20), mobile profile (simulated
// slow 4G, 4× CPU slowdown), Debian's chromium, on the production build (npm start must have built and seeded it):
// `/`, `/packs`, the most tested pack's page, `/compare` with 4 packs and a chart embed, BENCH_RUNS (default 3) runs
// each, median of each figure. Also the first-load JS (gzip, as transferred) and the HTML size (bytes decoded) per
// page. Prints a table, the targets of issue 15 and, last, one line `lighthouse: …`. A script, not a test: the machine
// is shared, so read the figures with the time of day.
import { spawn } from "node:child_process";
import fs from "node:fs";
import net from "node:net";
import os from "node:os";
import path from "node:path";
import * as chromeLauncher from "chrome-launcher";
import lighthouse from "lighthouse";

const root = path.resolve(path.dirname(new URL(import.meta.url).pathname), "..");
const fail = (msg) => {
  console.error(`bench:lighthouse: ${msg}`);
  process.exit(1);
};
function envInt(name, fallback, min, max) {
  const raw = process.env[name];
  if (raw === undefined || raw === "") return fallback;
  const n = Number(raw);
  if (!Number.isInteger(n) || n < min || n > max)
    fail(`${name} must be a whole number from ${min} to ${max}, got "${raw}"`);
  return n;
}
const port = envInt("BENCH_PORT", 3210, 1024, 65534);
const runs = envInt("BENCH_RUNS", 3, 1, 15);
const base = `http://localhost:${port}`;
const distDir = process.env.NEXT_DIST_DIR || ".next";
if (!fs.existsSync(path.join(root, distDir, "BUILD_ID")))
  fail(`no production build in ${distDir}/; run npm start first`);
if (!fs.existsSync("/usr/bin/chromium")) fail("Debian's chromium is missing (apt-get install chromium)");

const portOpen = (p) =>
  new Promise((resolve) => {
    const s = net.connect(p, "127.0.0.1");
    s.on("connect", () => (s.destroy(), resolve(true)));
    s.on("error", () => resolve(false));
  });
if (await portOpen(port)) fail(`port ${port} is taken; set BENCH_PORT`);
const server = spawn(process.execPath, [path.join(root, "scripts/serve.mjs"), "-H", "127.0.0.1", "-p", String(port)], {
  cwd: root,
  env: { ...process.env, NEXT_TELEMETRY_DISABLED: "1", SAGLINE_RATE_LIMITS: "off", APP_URL: base },
  stdio: ["ignore", "ignore", "inherit"],
});
process.on("exit", () => server.kill("SIGTERM"));
for (let i = 0; i < 300 && !(await portOpen(port)); i++) await new Promise((r) => setTimeout(r, 100));
if (!(await portOpen(port))) fail("the app did not start");

const getJson = async (p) => {
  const res = await fetch(`http://127.0.0.1:${port}${p}`);
  if (!res.ok) fail(`${p} answered ${res.status}`);
  return res.json();
};
// The most tested group's packs: the pack page of its first pack, and four of them side by side.
const groups = await getJson("/api/v1/groups");
const group = (groups.data ?? [])
  .slice()
  .sort((a, b) => (b.results ?? b.resultCount ?? 0) - (a.results ?? a.resultCount ?? 0))[0];
const packs = await getJson(`/api/v1/packs?size=10${group ? `&group=${encodeURIComponent(group.key)}` : ""}`);
const slugs = (packs.data ?? []).map((p) => p.slug).filter(Boolean);
if (slugs.length < 4) fail("the database needs at least 4 packs (run npm start to seed the demo)");
const charts = await getJson("/api/v1/charts");
const embed = charts.data?.[0]?.links?.embed;
if (!embed) fail("the database has no saved chart to embed (run npm start to seed the demo)");
const pages = [
  { name: "home", path: "/" },
  { name: "packs", path: "/packs" },
  { name: "pack page", path: `/packs/${slugs[0]}` },
  {
    name: "compare (4 packs)",
    path: `/compare?packs=${slugs.slice(0, 4).join(",")}${group ? `&group=${encodeURIComponent(group.key)}` : ""}`,
  },
  { name: "embed", path: new URL(embed, base).pathname },
  // The framework's floor: a page with no client code of Sagline's own beyond the header's small islands. What
  // it loads is what Next.js and React themselves need on every App Router page.
  { name: "floor (/methods)", path: "/methods" },
];

// Warm every page once (ISR pages render on first request).
for (const p of pages) await (await fetch(`http://127.0.0.1:${port}${p.path}`)).arrayBuffer();

const median = (xs) => {
  const s = xs.slice().sort((a, b) => a - b);
  const m = Math.floor(s.length / 2);
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
};
const userDataDir = fs.mkdtempSync(path.join(os.tmpdir(), "sagline-lh-"));
const chrome = await chromeLauncher.launch({
  chromePath: "/usr/bin/chromium",
  userDataDir,
  chromeFlags: [
    "--headless=new",
    "--no-sandbox",
    "--disable-gpu",
    "--disable-quic",
    "--no-first-run",
    "--disable-background-networking",
    "--disable-component-update",
    "--disable-sync",
  ],
});
const rows = [];
const failedA11y = new Map();
try {
  for (const p of pages) {
    const samples = [];
    for (let i = 0; i < runs; i++) {
      // Lighthouse now and then loses a trace on a loaded machine (NO_NAVSTART): such a run is repeated, at most
      // twice, and said; a page that keeps failing stops the bench.
      let lhr;
      for (let attempt = 1; attempt <= 3; attempt++) {
        const result = await lighthouse(base + p.path, {
          port: chrome.port,
          output: "json",
          logLevel: "error",
          onlyCategories: ["performance", "accessibility"],
        });
        lhr = result?.lhr;
        if (!lhr) fail(`no Lighthouse result for ${p.path}`);
        if (!lhr.runtimeError) break;
        if (attempt === 3) fail(`${p.path}: ${lhr.runtimeError.message}`);
        console.error(`bench:lighthouse: ${p.path}: ${lhr.runtimeError.code}, run repeated`);
      }
      const items = lhr.audits["network-requests"]?.details?.items ?? [];
      const scriptKb =
        items.filter((r) => r.resourceType === "Script").reduce((sum, r) => sum + (r.transferSize ?? 0), 0) / 1024;
      const scriptFiles = items.filter((r) => r.resourceType === "Script").length;
      // Name what costs accessibility points, so a score below 100 says where to look.
      for (const id of lhr.categories.accessibility.auditRefs.map((a) => a.id)) {
        const audit = lhr.audits[id];
        if (audit && audit.score !== null && audit.score < 1 && !failedA11y.has(`${p.name}: ${id}`))
          failedA11y.set(`${p.name}: ${id}`, audit.title);
      }
      samples.push({
        performance: Math.round((lhr.categories.performance.score ?? 0) * 100),
        accessibility: Math.round((lhr.categories.accessibility.score ?? 0) * 100),
        tbtMs: lhr.audits["total-blocking-time"].numericValue,
        lcpS: lhr.audits["largest-contentful-paint"].numericValue / 1000,
        cls: lhr.audits["cumulative-layout-shift"].numericValue,
        scriptKb,
        scriptFiles,
      });
    }
    const html = await (
      await fetch(`http://127.0.0.1:${port}${p.path}`, { headers: { "accept-encoding": "identity" } })
    ).text();
    const m = (k) => median(samples.map((s) => s[k]));
    rows.push({
      page: p.name,
      path: p.path,
      performance: m("performance"),
      accessibility: m("accessibility"),
      tbtMs: Math.round(m("tbtMs")),
      lcpS: Number(m("lcpS").toFixed(2)),
      cls: Number(m("cls").toFixed(3)),
      jsKbGzip: Number(m("scriptKb").toFixed(1)),
      jsFiles: m("scriptFiles"),
      htmlKb: Number((Buffer.byteLength(html) / 1024).toFixed(1)),
      performanceRuns: samples.map((s) => s.performance).join("/"),
    });
    console.error(`bench:lighthouse: ${p.name} done`);
  }
} finally {
  await chrome.kill();
  fs.rmSync(userDataDir, { recursive: true, force: true });
}

console.log(
  `Lighthouse 12.2.3, mobile profile, Debian chromium, median of ${runs} — ${new Date().toISOString()} (load ${os
    .loadavg()
    .map((l) => l.toFixed(1))
    .join(" ")})`,
);
console.table(rows.map(({ path: _p, ...r }) => r));
for (const [where, title] of failedA11y) console.log(`accessibility audit failed — ${where}: ${title}`);
console.log(
  "targets: performance ≥ 95, TBT ≤ 200 ms, LCP ≤ 2.0 s, CLS ≤ 0.05, accessibility 100; JS ≤ 120 KB gzip on /packs, ≤ 20 KB on an embed; HTML ≤ 60 KB on / and a pack page",
);
const worst = rows.reduce((a, b) => (b.performance < a.performance ? b : a));
const worstTbt = rows.reduce((a, b) => (b.tbtMs > a.tbtMs ? b : a));
const worstLcp = rows.reduce((a, b) => (b.lcpS > a.lcpS ? b : a));
const byName = Object.fromEntries(rows.map((r) => [r.page, r]));
console.log(
  `lighthouse: worst performance ${worst.performance} (${worst.page}), worst TBT ${worstTbt.tbtMs} ms (${worstTbt.page}), ` +
    `worst LCP ${worstLcp.lcpS} s (${worstLcp.page}), max CLS ${Math.max(...rows.map((r) => r.cls))}, ` +
    `min accessibility ${Math.min(...rows.map((r) => r.accessibility))}, JS /packs ${byName.packs.jsKbGzip} KB, embed ${byName.embed.jsKbGzip} KB, ` +
    `HTML / ${byName.home.htmlKb} KB, pack page ${byName["pack page"].htmlKb} KB`,
);
process.exit(0);
