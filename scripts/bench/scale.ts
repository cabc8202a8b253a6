// npm run bench:scale (issue 18) — run by scripts/bench-scale.sh on a throwaway database (DATABASE_URL) and two
// copies of the production build (.next-scale-a, .next-scale-b). Grows the data (scale-grow.ts), starts two app
// instances on it, and measures, single client:
//   - each public route, cold (every request a URL no cache has seen; the process itself warmed up first on routes
//     that share no data with them) and warm (the same URLs again): p50/p95 ms;
//   - the home page's HTML size; the first instance's resident memory (peak, VmHWM) after the run;
//   - cross-instance freshness: a moderator approves a result on instance A (through the review page, in Debian's
//     chromium), and the time until instance B's pack page shows it (given up after FRESH_WAIT_MS).
// Prints a table and, last, `scale: worst p95 <ms> (<route>), home html <KB>, rss <MB>, cross-instance fresh <ms>`.
// A benchmark that prints figures; it asserts nothing. Targets (issue 18, at 20,000 packs / 1,000,000 results):
// every public route p95 ≤ 100 ms (/api/v1/packs?q ≤ 50 ms), home HTML ≤ 60 KB, RSS ≤ 400 MB, fresh ≤ 2 s.
import { spawn, type ChildProcess } from "node:child_process";
import { randomBytes } from "node:crypto";
import fs from "node:fs";
import net from "node:net";
import os from "node:os";
import path from "node:path";
import { performance } from "node:perf_hooks";
import { chromium } from "@playwright/test";
import { sql } from "drizzle-orm";
import { closeDb, db } from "@/db";
import { grow } from "./scale-grow";

const root = path.resolve(path.dirname(new URL(import.meta.url).pathname), "../..");
const log = (s: string) => console.error(s);
function envInt(name: string, fallback: number, min: number, max: number): number {
  const raw = process.env[name];
  if (raw === undefined || raw === "") return fallback;
  const n = Number(raw);
  if (!Number.isInteger(n) || n < min || n > max) {
    console.error(`bench:scale: ${name} must be a whole number from ${min} to ${max}, got "${raw}"`);
    process.exit(1);
  }
  return n;
}
const PACKS = envInt("SCALE_PACKS", 20_000, 50, 200_000);
const RESULTS = envInt("SCALE_RESULTS", 1_000_000, 200, 5_000_000);
const SAMPLES = envInt("SCALE_SAMPLES", 20, 3, 200);
const PORT_A = envInt("BENCH_PORT", 3220, 1024, 65000);
const PORT_B = PORT_A + 1;
const FRESH_WAIT_MS = 10_000;

const portOpen = (p: number) =>
  new Promise<boolean>((resolve) => {
    const s = net.connect(p, "127.0.0.1");
    s.on("connect", () => (s.destroy(), resolve(true)));
    s.on("error", () => resolve(false));
  });

async function startInstance(distDir: string, port: number): Promise<ChildProcess> {
  if (await portOpen(port)) throw new Error(`port ${port} is taken; set BENCH_PORT`);
  const child = spawn(process.execPath, [path.join(root, "scripts/serve.mjs"), "-H", "127.0.0.1", "-p", String(port)], {
    cwd: root,
    env: {
      ...process.env,
      NEXT_DIST_DIR: distDir,
      NEXT_TELEMETRY_DISABLED: "1",
      SAGLINE_RATE_LIMITS: "off",
      APP_URL: `http://localhost:${port}`,
      AUTH_URL: `http://localhost:${port}`,
    },
    stdio: ["ignore", "ignore", "inherit"],
  });
  for (let i = 0; i < 600 && !(await portOpen(port)); i++) await new Promise((r) => setTimeout(r, 100));
  if (!(await portOpen(port))) throw new Error(`the app on port ${port} did not start`);
  return child;
}

async function timed(url: string): Promise<{ ms: number; status: number; bytes: number }> {
  const t = performance.now();
  const res = await fetch(url, { headers: { "accept-encoding": "identity" } });
  const body = await res.arrayBuffer();
  return { ms: performance.now() - t, status: res.status, bytes: body.byteLength };
}
/** A page's HTML cut at each <section> (and its scripts), with the KB of each part. */
async function sectionSizes(url: string): Promise<{ name: string; kb: number }[]> {
  const html = await (await fetch(url)).text();
  const scripts = [...html.matchAll(/<script[^>]*>[\s\S]*?<\/script>/g)].reduce((n, m) => n + m[0].length, 0);
  const body = html.replace(/<script[^>]*>[\s\S]*?<\/script>/g, "");
  const parts = body.split(/(?=<section)/);
  return [
    ...parts.map((part, i) => ({
      name:
        i === 0
          ? "head and header"
          : (/<h2[^>]*>([\s\S]*?)<\/h2>/.exec(part)?.[1] ?? "section").replace(/<[^>]+>/g, ""),
      kb: part.length / 1024,
    })),
    { name: "scripts", kb: scripts / 1024 },
  ];
}

const pct = (xs: number[], p: number) => {
  const s = xs.slice().sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.ceil((p / 100) * s.length) - 1)] ?? NaN;
};

type Route = { name: string; urls: string[] };
async function routes(): Promise<Route[]> {
  const q = async <T>(query: ReturnType<typeof sql>) => (await db.execute(query)).rows as T[];
  const words = await q<{ w: string }>(sql`
    select distinct split_part(lower(name), ' ', 1) as w from makers where slug like 'scale-%' limit ${SAMPLES}`);
  const groups = await q<{ g: string }>(sql`
    select group_key as g from results where status = 'approved' group by group_key order by count(*) desc
    limit ${SAMPLES}`);
  const slugs = await q<{ s: string }>(sql`
    select slug as s from packs where status = 'active' order by md5(slug) limit ${SAMPLES * 4}`);
  const ids = await q<{ id: number }>(sql`
    select id from results where status = 'approved' order by md5(id::text) limit ${SAMPLES}`);
  const n = (i: number) => i % Math.max(1, words.length);
  const range = Array.from({ length: SAMPLES }, (_, i) => i);
  const s = (i: number) => slugs[i % slugs.length]?.s ?? "";
  return [
    { name: "/", urls: range.slice(0, 1).map(() => "/") },
    { name: "/packs", urls: range.map((i) => `/packs?page=${i + 1}`) },
    { name: "/packs?q", urls: range.map((i) => `/packs?q=${words[n(i)]?.w ?? "ridge"}+${1000 + (i % 9) * 500}`) },
    { name: "/api/v1/packs?q", urls: range.map((i) => `/api/v1/packs?q=${words[n(i)]?.w ?? "ridge"}`) },
    {
      name: "/api/v1/packs?group&sort",
      urls: range.map(
        (i) => `/api/v1/packs?group=${encodeURIComponent(groups[i % groups.length]?.g ?? "")}&sort=measuredC`,
      ),
    },
    // Far pages read by key (numbered pages stop at 20): after a random published id.
    {
      name: "/api/v1/results?after=<id>",
      urls: range.map((i) => `/api/v1/results?after=${ids[(i + SAMPLES) % ids.length]?.id ?? 1}`),
    },
    { name: "/api/v1/packs/<slug>", urls: range.map((i) => `/api/v1/packs/${s(i)}`) },
    { name: "/packs/<slug>", urls: range.map((i) => `/packs/${s(i + SAMPLES)}`) },
    { name: "/results/<id>", urls: range.map((i) => `/results/${ids[i % ids.length]?.id ?? 1}`) },
    {
      name: "/compare (4 packs)",
      urls: range.map((i) => `/compare?packs=${[0, 1, 2, 3].map((k) => s(SAMPLES * 2 + i * 4 + k)).join(",")}`),
    },
  ];
}

/** A moderator's session row, as Auth.js's database strategy keeps it; its token is the session cookie. */
async function moderatorSession(): Promise<string> {
  const [mod] = (await db.execute<{ id: string }>(sql`select id from users where role = 'moderator' limit 1`)).rows;
  if (!mod) throw new Error("the demo scenario has no moderator");
  const token = randomBytes(24).toString("hex");
  await db.execute(sql`insert into sessions (session_token, user_id, expires)
    values (${token}, ${mod.id}, now() + interval '1 hour')`);
  return token;
}

async function crossInstanceFresh(): Promise<{ ms: number | null; note: string }> {
  const [pending] = (
    await db.execute<{ id: number; slug: string }>(sql`
      select r.id, p.slug from results r join packs p on p.id = r.pack_id
      where r.status = 'pending' and p.status = 'active' order by r.id limit 1`)
  ).rows;
  if (!pending) return { ms: null, note: "no pending result in the demo queue" };
  // What a reader of instance B sees of the result: the pack page, the pack's record (its result count) and the
  // result's own record. B has rendered (and cached) each before the decision; fresh = every view shows it.
  const onB = `http://127.0.0.1:${PORT_B}`;
  const countOnB = async () =>
    ((await (await fetch(`${onB}/api/v1/packs/${pending.slug}`)).json()) as { data?: { resultCount?: number } }).data
      ?.resultCount ?? -1;
  const countBefore = await countOnB();
  const views = {
    "pack page": async () =>
      (await (await fetch(`${onB}/packs/${pending.slug}`)).text()).match(
        new RegExp(`/results/${pending.id}(?![0-9])`),
      ) !== null,
    "pack record": async () => (await countOnB()) > countBefore,
    "result record": async () => (await fetch(`${onB}/api/v1/results/${pending.id}`)).status === 200,
  };
  const fresh = new Map<string, number>();
  const shows = async (t0: number) => {
    for (const [name, view] of Object.entries(views))
      if (!fresh.has(name) && (await view())) fresh.set(name, Math.round(performance.now() - t0));
    return fresh.size === Object.keys(views).length;
  };
  for (const [name, view] of Object.entries(views))
    if (await view()) return { ms: null, note: `instance B's ${name} showed the result before the decision` };
  const token = await moderatorSession();
  const browser = await chromium.launch({ executablePath: "/usr/bin/chromium", args: ["--no-sandbox"] });
  try {
    const context = await browser.newContext();
    await context.addCookies([{ name: "authjs.session-token", value: token, url: `http://localhost:${PORT_A}` }]);
    const page = await context.newPage();
    await page.goto(`http://localhost:${PORT_A}/review/${pending.id}`);
    await page.getByRole("button", { name: "Approve and publish" }).click();
    await page.getByTestId("result-status").filter({ hasText: "Approved" }).waitFor({ timeout: 30_000 });
    const t0 = performance.now();
    while (performance.now() - t0 < FRESH_WAIT_MS) {
      if (await shows(t0)) return { ms: Math.max(...fresh.values()), note: "" };
      await new Promise((r) => setTimeout(r, 100));
    }
    const stale = Object.keys(views).filter((v) => !fresh.has(v));
    return { ms: null, note: `instance B still stale after ${FRESH_WAIT_MS / 1000} s: ${stale.join(", ")}` };
  } finally {
    await browser.close();
  }
}

const rssMb = (pid: number | undefined) => {
  const status = pid ? fs.readFileSync(`/proc/${pid}/status`, "utf8") : "";
  const kb = /VmHWM:\s+(\d+)/.exec(status)?.[1];
  return kb ? Math.round(Number(kb) / 1024) : NaN;
};

async function main() {
  const started = Date.now();
  await grow(PACKS, RESULTS, log);
  const size = (await db.execute<{ s: string }>(sql`select pg_size_pretty(pg_database_size(current_database())) as s`))
    .rows[0]?.s;
  const grownS = (Date.now() - started) / 1000;
  const a = await startInstance(".next-scale-a", PORT_A);
  const b = await startInstance(".next-scale-b", PORT_B);
  const stop = () => {
    a.kill("SIGTERM");
    b.kill("SIGTERM");
  };
  process.on("exit", stop);
  // A new process's first requests load the framework, the shared layout and the database and Redis connections.
  // That start-up cost does not grow with the data, so it is paid here on routes whose data no measured route reads
  // (the methods page, the makers list): "cold" below means the data caches are cold, not the process.
  for (const port of [PORT_A, PORT_B])
    for (const u of ["/methods", "/api/v1/makers"]) {
      const x = await timed(`http://127.0.0.1:${port}${u}`);
      log(`bench:scale: warm-up ${u} on :${port} ${Math.round(x.ms)} ms (process start, not counted)`);
    }
  try {
    const rows: Record<string, string | number>[] = [];
    let worst = { p95: 0, name: "" };
    let homeKb = NaN;
    let packPageKb = 0;
    let packPageUrl = "";
    for (const r of await routes()) {
      const cold: number[] = [];
      const warm: number[] = [];
      for (const u of r.urls) {
        const x = await timed(`http://127.0.0.1:${PORT_A}${u}`);
        if (x.status >= 400) log(`bench:scale: ${u} answered ${x.status}`);
        cold.push(x.ms);
        if (r.name === "/") homeKb = x.bytes / 1024;
        if (r.name === "/packs/<slug>" && x.bytes / 1024 > packPageKb) {
          packPageKb = x.bytes / 1024;
          packPageUrl = u;
        }
      }
      for (const u of r.urls) warm.push((await timed(`http://127.0.0.1:${PORT_A}${u}`)).ms);
      const p95 = pct(cold, 95);
      if (p95 > worst.p95) worst = { p95, name: r.name };
      rows.push({
        route: r.name,
        requests: cold.length,
        "cold p50 ms": Math.round(pct(cold, 50)),
        "cold p95 ms": Math.round(p95),
        "warm p50 ms": Math.round(pct(warm, 50)),
        "warm p95 ms": Math.round(pct(warm, 95)),
      });
      log(`bench:scale: ${r.name} measured`);
    }
    // Where the largest pack page's bytes are: each section's share (headings as written on the page).
    const sections = packPageUrl ? await sectionSizes(`http://127.0.0.1:${PORT_A}${packPageUrl}`) : [];
    const fresh = await crossInstanceFresh();
    const rss = rssMb(a.pid);
    console.log(
      `bench:scale — ${new Date().toISOString()}, ${PACKS} packs / ${RESULTS} approved results, database ${size}, ` +
        `grown in ${grownS.toFixed(0)} s; ` +
        `cache ${process.env.REDIS_URL ? "shared (Redis)" : "per instance"}; load ${os
          .loadavg()
          .map((l) => l.toFixed(1))
          .join(" ")}; single client`,
    );
    console.table(rows);
    if (fresh.note) console.log(`cross-instance: ${fresh.note}`);
    console.log(
      `largest pack page measured: ${packPageKb.toFixed(1)} KB of HTML (issue 15: ≤ 60 KB), ${packPageUrl}: ` +
        `${sections.map((x) => `${x.name} ${x.kb.toFixed(1)}`).join(", ")} KB\n` +
        "targets: every public route p95 ≤ 100 ms (/api/v1/packs?q ≤ 50 ms), home HTML ≤ 60 KB, RSS ≤ 400 MB, " +
        `cross-instance fresh ≤ 2 s, whole bench ≤ 12 min (this run: ${((Date.now() - started) / 60_000).toFixed(1)} min)`,
    );
    console.log(
      `scale: worst p95 ${Math.round(worst.p95)} ms (${worst.name}), home html ${homeKb.toFixed(1)} KB, rss ${rss} MB, ` +
        `cross-instance fresh ${fresh.ms !== null ? `${fresh.ms} ms` : fresh.note.includes("stale") ? `> ${FRESH_WAIT_MS} ms (stale)` : "not measured"}`,
    );
  } finally {
    stop();
    await closeDb();
  }
}

main().catch((err: unknown) => {
  const cause = err instanceof Error && err.cause instanceof Error ? ` (${err.cause.message})` : "";
  console.error(`bench:scale: ${err instanceof Error ? err.message.split("\n")[0] : String(err)}${cause}`);
  process.exit(1);
});
