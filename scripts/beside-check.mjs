// The "beside" check of npm test (scripts/test.sh starts it in the background before the suites): a live app —
// this checkout's own `npm start` if one runs, otherwise one started here (on a spare port when 3000 is taken) —
// must answer its pages, its own script files and a whole e-mail sign-in while every suite runs, and afterwards.
// It proves the test world (own cluster, build folder, ports; scripts/lib.sh) never touches the app world.
// Stops when $RUN_DIR/beside.stop appears; writes $RUN_DIR/results-beside.json (read by test-summary.mjs).
import { spawn, execFileSync } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import { setTimeout as sleep } from "node:timers/promises";

const root = path.resolve(path.dirname(new URL(import.meta.url).pathname), "..");
const runDir = process.env.RUN_DIR ?? path.join(root, ".run/test");
const stopFile = path.join(runDir, "beside.stop");
const log = (...a) => console.log(new Date().toISOString().slice(11, 19), ...a);

// The app world's environment: the test world's settings removed, so scripts/lib.sh reads .env.local afresh.
const TEST_KEYS = [
  "SAGLINE_MODE",
  "TEST_PORT_BASE",
  "PG_PORT",
  "SMTP_PORT",
  "S3_PORT",
  "PORT",
  "E2E_PORT",
  "RUN_DIR",
  "NEXT_DIST_DIR",
  "MAIL_CATCHER_DIR",
  "S3_DATA_DIR",
  "DATABASE_URL",
  "SMTP_URL",
  "S3_ENDPOINT",
  "APP_URL",
  "SAGLINE_PG_FAST",
  "SAGLINE_DEV_TOOLS",
  "E2E_BASE_URL",
  "AUTH_SECRET",
  "SAGLINE_TEST_WORLD",
  "REDIS_URL",
  "E2E_PORT_B",
];
const appEnv = Object.fromEntries(Object.entries(process.env).filter(([k]) => !TEST_KEYS.includes(k)));
const inAppWorld = (script, extra = {}) =>
  execFileSync("bash", ["-c", `source scripts/lib.sh >/dev/null; ${script}`], {
    cwd: root,
    env: { ...appEnv, ...extra },
    encoding: "utf8",
    stdio: ["ignore", "pipe", "pipe"],
    timeout: 120_000,
  }).trim();

const [appPort, mailDir, appRunning] = inAppWorld(
  'echo "$PORT"; echo "${MAIL_CATCHER_DIR:-.mail}"; svc_running app && echo yes || echo no',
).split("\n");
const settings = { port: appPort, mail: mailDir, app: appRunning === "yes" };
const portTaken = async (port) => {
  try {
    await fetch(`http://127.0.0.1:${port}/`, { signal: AbortSignal.timeout(3000), redirect: "manual" });
    return true;
  } catch {
    return false;
  }
};

let started = null; // { child, before: { mail, s3, pg, worker } } when this check started the app
let base = `http://127.0.0.1:${settings.port}`;
if (settings.app && (await portTaken(settings.port))) {
  log(`watching this checkout's running app on ${base}`);
} else {
  let port = Number(settings.port);
  if (await portTaken(port)) port = Number(process.env.TEST_PORT_BASE) + 4;
  base = `http://127.0.0.1:${port}`;
  const before = JSON.parse(
    inAppWorld(
      `echo "{\\"mail\\": $(svc_running mail && echo true || echo false), \\"s3\\": $(svc_running s3 && echo true || echo false), \\"pg\\": $(pg_running && echo true || echo false), \\"worker\\": $(svc_running mail-worker && echo true || echo false)}"`,
    ),
  );
  log(`starting npm start on ${base} (services already running: ${JSON.stringify(before)})`);
  const out = fs.openSync(path.join(runDir, "beside-app.log"), "w");
  const child = spawn("bash", ["scripts/start.sh"], {
    cwd: root,
    env: { ...appEnv, PORT: String(port) },
    stdio: ["ignore", out, out],
  });
  started = { child, before, port };
}

// ---- the checks ----
const pages = ["/", "/packs", "/methods", "/sign-in", "/analyse"];
async function checkPages() {
  const problems = [];
  const packs = await fetch(`${base}/api/v1/packs?size=10`).then(
    (r) => (r.ok ? r.json() : null),
    () => null,
  );
  const slug = packs?.data?.[0]?.slug;
  for (const p of slug ? [...pages, `/packs/${slug}`] : pages) {
    try {
      const res = await fetch(base + p, { signal: AbortSignal.timeout(20_000) });
      const html = await res.text();
      if (res.status !== 200) {
        problems.push(`${p} answered ${res.status}`);
        continue;
      }
      // Every script the page loads must be served (a replaced build folder answers 500/404 here).
      const scripts = [...html.matchAll(/<script[^>]+src="(\/_next\/[^"]+)"/g)].map((m) => m[1]).slice(0, 4);
      if (scripts.length === 0) problems.push(`${p} loads no scripts`);
      for (const s of scripts) {
        const r = await fetch(base + s, { signal: AbortSignal.timeout(20_000) });
        await r.arrayBuffer();
        if (r.status !== 200) problems.push(`${p}: its script ${s} answered ${r.status}`);
      }
    } catch (err) {
      problems.push(`${p}: ${err.message}`);
    }
  }
  if (!slug) problems.push("/api/v1/packs listed no pack");
  return problems;
}

const cookiesOf = (res) => res.headers.getSetCookie().map((c) => c.split(";")[0]);
async function checkSignIn() {
  const email = `beside-${Date.now().toString(36)}@sagline.test`;
  try {
    const csrf = await fetch(`${base}/api/auth/csrf`);
    const { csrfToken } = await csrf.json();
    const jar = cookiesOf(csrf);
    const since = Date.now() - 1000;
    const ask = await fetch(`${base}/api/auth/signin/nodemailer`, {
      method: "POST",
      redirect: "manual",
      headers: { cookie: jar.join("; "), "content-type": "application/x-www-form-urlencoded" },
      body: new URLSearchParams({ email, csrfToken, callbackUrl: "/account" }),
    });
    const where = ask.headers.get("location") ?? "";
    // The sign-in page's own form lands on /sign-in/check-email; a bare POST gets Auth.js's verify-request route.
    if (!/\/sign-in\/check-email|\/api\/auth\/verify-request/.test(where))
      return [`asking for a link answered ${ask.status} → ${where || "nowhere"}`];
    const dir = path.resolve(root, settings.mail);
    let link = "";
    for (let i = 0; i < 100 && !link; i++) {
      for (const f of fs.existsSync(dir) ? fs.readdirSync(dir).filter((n) => n.endsWith(".json")) : []) {
        const m = JSON.parse(fs.readFileSync(path.join(dir, f), "utf8"));
        if (m.to.includes(email) && Date.parse(m.receivedAt) >= since) link = m.text.match(/https?:\/\/\S+/)?.[0] ?? "";
      }
      if (!link) await sleep(200);
    }
    if (!link) return [`no sign-in e-mail for ${email} reached ${settings.mail}/ within 20 s`];
    const u = new URL(link);
    const back = await fetch(base + u.pathname + u.search, { redirect: "manual", headers: { cookie: jar.join("; ") } });
    const session = cookiesOf(back).filter((c) => c.includes("session-token"));
    if (session.length === 0) return [`the sign-in link answered ${back.status} without a session`];
    const me = await fetch(`${base}/api/v1/me`, { headers: { cookie: session.join("; ") } }).then((r) => r.json());
    if (!me.user) return ["signed in, but /api/v1/me sees nobody"];
    return [];
  } catch (err) {
    return [`sign-in: ${err.message}`];
  }
}

// ---- the run ----
const results = [];
const record = (title, problems) => {
  results.push({ title, ok: problems.length === 0, problems });
  log(`${problems.length === 0 ? "ok  " : "FAIL"} ${title}${problems.length ? ": " + problems.join("; ") : ""}`);
};
const stopAsked = () => fs.existsSync(stopFile);
const deadline = Date.now() + 20 * 60_000;
let ready = false;
while (!ready && Date.now() < deadline) {
  if (started && started.child.exitCode !== null) break;
  ready = await fetch(base + "/", { signal: AbortSignal.timeout(5000) }).then(
    (r) => r.status === 200,
    () => false,
  );
  if (!ready) await sleep(2000);
}
if (!ready) {
  record("the live app starts", [
    started ? `npm start did not serve ${base} (see ${runDir}/beside-app.log)` : `${base} stopped answering`,
  ]);
} else {
  log(`live app ready on ${base}`);
  let rounds = 0,
    signIns = 0;
  const during = [];
  let lastSignIn = 0;
  while (!stopAsked()) {
    const problems = await checkPages();
    rounds++;
    if (problems.length) {
      during.push(...problems.map((p) => `round ${rounds}: ${p}`));
      log(`round ${rounds}: ${problems.join("; ")}`);
    }
    // Sign-ins are rate-limited per address and per IP (20 per 15 minutes), so only every 3 minutes.
    if (Date.now() - lastSignIn > 180_000) {
      lastSignIn = Date.now();
      signIns++;
      const problemsSigningIn = await checkSignIn();
      during.push(...problemsSigningIn.map((p) => `sign-in ${signIns}: ${p}`));
      log(`sign-in ${signIns}: ${problemsSigningIn.length ? problemsSigningIn.join("; ") : "ok"}`);
    }
    for (let i = 0; i < 10 && !stopAsked(); i++) await sleep(500);
  }
  record(`pages, scripts and sign-in answer while the suites run (${rounds} rounds, ${signIns} sign-ins)`, during);
  record("pages and their scripts answer afterwards", await checkPages());
  record("a sign-in works afterwards", await checkSignIn());
}

if (started) {
  log("stopping the app this check started, and the services it started");
  const { before } = started;
  try {
    inAppWorld(
      `svc_stop app; ${before.worker ? "" : "svc_stop mail-worker;"} ${before.s3 ? "" : "svc_stop s3;"} ${before.mail ? "" : "svc_stop mail;"} ${before.pg ? "" : "pg_stop;"} true`,
      { PORT: String(started.port) },
    );
  } catch (err) {
    log(`stopping: ${err.message}`);
  }
  started.child.kill();
}

const failed = results.filter((r) => !r.ok).length;
fs.writeFileSync(
  path.join(runDir, "results-beside.json"),
  JSON.stringify({ numPassedTests: results.length - failed, numFailedTests: failed, results }, null, 2),
);
process.exit(failed > 0 ? 1 : 0);
