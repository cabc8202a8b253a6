// npm run bench:load — load figures for the production build on loopback (a script, not a test).
// Starts `next start` on BENCH_PORT against the local database (npm start must have built and seeded
// it), then for each route: 50 connections for BENCH_DURATION_S (default 60) s, and 10 connections for
// BENCH_LATENCY_S (default 20) s. Prints requests/s, p50/p99 latency, errors and each route's
// throughput as a ratio of a static file served by the same server.
import autocannon from "autocannon";
import { spawn } from "node:child_process";
import fs from "node:fs";
import net from "node:net";
import path from "node:path";

const root = path.resolve(path.dirname(new URL(import.meta.url).pathname), "..");
const port = Number(process.env.BENCH_PORT ?? 3200);
const duration = Number(process.env.BENCH_DURATION_S ?? 60);
const latencyDuration = Number(process.env.BENCH_LATENCY_S ?? 20);
const base = `http://127.0.0.1:${port}`;

function fail(msg) {
  console.error(`bench:load: ${msg}`);
  process.exit(1);
}
if (!fs.existsSync(path.join(root, ".next/BUILD_ID"))) fail("no production build; run npm start (or npm run build) first");

const portOpen = (p) =>
  new Promise((resolve) => {
    const s = net.connect(p, "127.0.0.1");
    s.on("connect", () => (s.destroy(), resolve(true)));
    s.on("error", () => resolve(false));
  });
if (await portOpen(port)) fail(`port ${port} is taken; set BENCH_PORT`);

const server = spawn(path.join(root, "node_modules/.bin/next"), ["start", "-H", "127.0.0.1", "-p", String(port)], {
  cwd: root,
  env: { ...process.env, NEXT_TELEMETRY_DISABLED: "1", SAGLINE_RATE_LIMITS: "off" },
  stdio: ["ignore", "ignore", "inherit"],
});
const stop = () => server.kill("SIGTERM");
process.on("exit", stop);
for (let i = 0; i < 300 && !(await portOpen(port)); i++) await new Promise((r) => setTimeout(r, 100));
if (!(await portOpen(port))) fail("the app did not start");

async function firstPackPath() {
  const res = await fetch(`${base}/api/v1/packs?pageSize=1`);
  if (res.ok) {
    const body = await res.json();
    const slug = body?.data?.[0]?.slug ?? body?.packs?.[0]?.slug ?? body?.items?.[0]?.slug;
    if (slug) return `/packs/${slug}`;
  }
  const html = await (await fetch(`${base}/`)).text();
  const m = html.match(/href="(\/packs\/[a-z0-9-]+)"/);
  if (!m) fail("could not find a pack page to load");
  return m[1];
}

const routes = [
  { name: "static file (reference)", path: "/icon.svg" },
  { name: "home page", path: "/" },
  { name: "pack page", path: await firstPackPath() },
  { name: "packs table", path: "/packs" },
  { name: "API: packs", path: "/api/v1/packs" },
  { name: "API: makers", path: "/api/v1/makers" },
];

function run(url, connections, seconds) {
  return new Promise((resolve, reject) => {
    autocannon({ url, connections, duration: seconds, pipelining: 1 }, (err, result) => (err ? reject(err) : resolve(result)));
  });
}

const pad = (s, n) => String(s).padEnd(n);
const num = (x, d = 0) => (Number.isFinite(x) ? x.toFixed(d) : "—");
for (const r of routes) {
  const res = await fetch(base + r.path);
  if (!res.ok) console.log(`note: ${r.path} answered ${res.status} before the run`);
}

console.log(`\nSagline load benchmark — ${new Date().toISOString()} — ${base}\n`);
for (const [connections, seconds, label] of [[50, duration, "throughput"], [10, latencyDuration, "latency"]]) {
  console.log(`${label}: ${connections} connections, ${seconds} s per route`);
  console.log(`${pad("route", 26)}${pad("req/s", 10)}${pad("p50 ms", 9)}${pad("p99 ms", 9)}${pad("errors", 8)}ratio to static`);
  let staticRps = NaN;
  for (const r of routes) {
    const out = await run(base + r.path, connections, seconds);
    const errors = out.errors + out.timeouts + out.non2xx;
    const rps = out.requests.average;
    if (r.path === "/icon.svg") staticRps = rps;
    console.log(`${pad(r.name, 26)}${pad(num(rps), 10)}${pad(num(out.latency.p50, 1), 9)}${pad(num(out.latency.p99, 1), 9)}${pad(errors, 8)}${num(rps / staticRps, 2)}×`);
  }
  console.log("");
}
console.log("targets: 0 errors; cached pages ≥ 0.5× the static file's req/s; p99 ≤ 50 ms at 10 connections");
stop();
process.exit(0);
