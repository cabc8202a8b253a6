// npm run bench:load — load figures for the production build on loopback (a script, not a test).
// Starts the production server (scripts/serve.mjs) on BENCH_PORT against the local database (npm start must have built and seeded
// it), then for each route: 50 connections for BENCH_DURATION_S (default 60) s, and 10 connections for
// BENCH_LATENCY_S (default 20) s. Prints requests/s, p50/p99 latency, errors and each route's
// throughput as a ratio of a static file served by the same server. Then, for context, each route's exact
// bytes served by a bare node:http server (BENCH_PORT + 1, BENCH_REF_S s each) and the home page with gzip.
import autocannon from "autocannon";
import { spawn } from "node:child_process";
import fs from "node:fs";
import net from "node:net";
import path from "node:path";

const root = path.resolve(path.dirname(new URL(import.meta.url).pathname), "..");
function fail(msg) {
  console.error(`bench:load: ${msg}`);
  process.exit(1);
}
/** A whole number from the environment within [min, max], or the default; anything else stops the run. */
function envInt(name, fallback, min, max) {
  const raw = process.env[name];
  if (raw === undefined || raw === "") return fallback;
  const n = Number(raw);
  if (!Number.isInteger(n) || n < min || n > max)
    fail(`${name} must be a whole number from ${min} to ${max}, got "${raw}"`);
  return n;
}
const port = envInt("BENCH_PORT", 3200, 1024, 65534);
const duration = envInt("BENCH_DURATION_S", 60, 1, 3600);
const latencyDuration = envInt("BENCH_LATENCY_S", 20, 1, 3600);
const base = `http://127.0.0.1:${port}`;
if (!fs.existsSync(path.join(root, ".next/BUILD_ID")))
  fail("no production build; run npm start (or npm run build) first");

const portOpen = (p) =>
  new Promise((resolve) => {
    const s = net.connect(p, "127.0.0.1");
    s.on("connect", () => (s.destroy(), resolve(true)));
    s.on("error", () => resolve(false));
  });
if (await portOpen(port)) fail(`port ${port} is taken; set BENCH_PORT`);

const server = spawn(process.execPath, [path.join(root, "scripts/serve.mjs"), "-H", "127.0.0.1", "-p", String(port)], {
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
    autocannon({ url, connections, duration: seconds, pipelining: 1 }, (err, result) =>
      err ? reject(err) : resolve(result),
    );
  });
}

const pad = (s, n) => String(s).padEnd(n);
const num = (x, d = 0) => (Number.isFinite(x) ? x.toFixed(d) : "—");
for (const r of routes) {
  const res = await fetch(base + r.path);
  if (!res.ok) console.log(`note: ${r.path} answered ${res.status} before the run`);
}

console.log(`\nSagline load benchmark — ${new Date().toISOString()} — ${base}\n`);
for (const [connections, seconds, label] of [
  [50, duration, "throughput"],
  [10, latencyDuration, "latency"],
]) {
  console.log(`${label}: ${connections} connections, ${seconds} s per route`);
  console.log(
    `${pad("route", 26)}${pad("req/s", 10)}${pad("p50 ms", 9)}${pad("p99 ms", 9)}${pad("errors", 8)}ratio to static`,
  );
  let staticRps = NaN;
  for (const r of routes) {
    const out = await run(base + r.path, connections, seconds);
    const errors = out.errors + out.timeouts + out.non2xx;
    const rps = out.requests.average;
    if (r.path === "/icon.svg") staticRps = rps;
    console.log(
      `${pad(r.name, 26)}${pad(num(rps), 10)}${pad(num(out.latency.p50, 1), 9)}${pad(num(out.latency.p99, 1), 9)}${pad(errors, 8)}${num(rps / staticRps, 2)}×`,
    );
  }
  console.log("");
}
// Context for the ratios (not targets): what the bytes alone cost, and what a browser's request costs.
// 1. A bare node:http server in its own process answers each route with the very body and headers Next sent,
//    as a string (as Next writes a cached page), so the run shows the ceiling any server in Node reaches for
//    pages of that size on this machine, before a framework does anything.
// 2. The home page requested with Accept-Encoding: gzip, as every browser does: Next compresses per request.
const refSeconds = envInt("BENCH_REF_S", 15, 1, 3600);
const captured = [];
for (const r of routes) {
  const res = await fetch(base + r.path);
  const headers = {};
  res.headers.forEach((v, k) => {
    if (!["content-length", "date", "connection", "keep-alive", "transfer-encoding"].includes(k)) headers[k] = v;
  });
  captured.push({ ...r, body: await res.text(), headers });
}
const bareFile = path.join(root, ".bench", "bare-server-bodies.json");
fs.mkdirSync(path.dirname(bareFile), { recursive: true });
fs.writeFileSync(bareFile, JSON.stringify(captured.map((c) => ({ headers: c.headers, body: c.body }))));
const barePort = port + 1;
if (await portOpen(barePort)) fail(`port ${barePort} is taken; set BENCH_PORT`);
const bareSource = `
const http = require("node:http");
const bodies = JSON.parse(require("node:fs").readFileSync(${JSON.stringify(bareFile)}, "utf8"));
http.createServer((req, res) => {
  const b = bodies[Number(req.url.slice(1))];
  if (!b) { res.statusCode = 404; return res.end(); }
  for (const [k, v] of Object.entries(b.headers)) res.setHeader(k, v);
  res.end(b.body);
}).listen(${barePort}, "127.0.0.1");`;
const bare = spawn(process.execPath, ["-e", bareSource], { stdio: ["ignore", "ignore", "inherit"] });
process.on("exit", () => bare.kill("SIGTERM"));
for (let i = 0; i < 100 && !(await portOpen(barePort)); i++) await new Promise((r) => setTimeout(r, 50));
console.log(`reference (context, not targets): 50 connections, ${refSeconds} s each`);
console.log(`${pad("route", 26)}${pad("KB", 7)}${pad("Next req/s", 12)}${pad("bare node:http, same bytes", 28)}`);
for (const [index, c] of captured.entries()) {
  const ours = (await run(base + c.path, 50, refSeconds)).requests.average;
  const ceiling = (await run(`http://127.0.0.1:${barePort}/${index}`, 50, refSeconds)).requests.average;
  console.log(
    `${pad(c.name, 26)}${pad(num(Buffer.byteLength(c.body) / 1024, 1), 7)}${pad(num(ours), 12)}${pad(`${num(ceiling)} (Next at ${num(ours / ceiling, 2)}× of it)`, 28)}`,
  );
}
const gz = await new Promise((resolve, reject) => {
  autocannon(
    { url: `${base}/`, connections: 50, duration: refSeconds, headers: { "accept-encoding": "gzip" } },
    (err, result) => (err ? reject(err) : resolve(result)),
  );
});
console.log(
  `home page with Accept-Encoding: gzip (as browsers send; Next compresses each response): ${num(gz.requests.average)} req/s, p99 ${num(gz.latency.p99, 1)} ms, ${num(gz.throughput.average / gz.requests.average / 1024, 1)} KB per response`,
);
bare.kill("SIGTERM");
console.log("");
console.log("targets: 0 errors; cached pages ≥ 0.5× the static file's req/s; p99 ≤ 50 ms at 10 connections");
stop();
process.exit(0);
