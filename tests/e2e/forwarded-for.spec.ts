// Issue 13 against the running server (scripts/serve.mjs, socket and all): forged X-Forwarded-For values make no
// new rate-limit buckets, chart links are drawn per request behind Cache-Control with a cap on new states, and
// a JSON body to a server action is a 400 that leaves no crash in the server's log. Requests go out from their
// own loopback addresses (127.0.0.x, all of which reach the server on Linux) so these buckets are not the ones
// the rest of the browser tests use.
import fs from "node:fs";
import http from "node:http";
import path from "node:path";
import { expect, test } from "@playwright/test";
import { generateLog, toCsv } from "../../lib/synthetic/equivalent-circuit";
import { linkFromCatcher } from "./sign-in-helpers";

const base = new URL(process.env.E2E_BASE_URL ?? "http://localhost:3100");

type Answer = { status: number; headers: http.IncomingHttpHeaders; body: string };
function send(
  from: string,
  method: string,
  pathname: string,
  headers: Record<string, string>,
  body?: string | Buffer,
): Promise<Answer> {
  return new Promise((resolve, reject) => {
    const req = http.request(
      {
        host: "127.0.0.1",
        port: base.port,
        method,
        path: pathname,
        localAddress: from,
        headers: { host: base.host, ...headers },
      },
      (res) => {
        const chunks: Buffer[] = [];
        res.on("data", (c: Buffer) => chunks.push(c));
        res.on("end", () =>
          resolve({ status: res.statusCode ?? 0, headers: res.headers, body: Buffer.concat(chunks).toString() }),
        );
      },
    );
    req.on("error", reject);
    if (body !== undefined) req.write(body);
    req.end();
  });
}
const forged = (i: number) => `198.18.${i}.1, 10.0.${i}.9`;
const cookiesOf = (a: Answer) =>
  ([] as string[]).concat(a.headers["set-cookie"] ?? []).map((c) => c.split(";")[0] ?? "");

/** A whole e-mail sign-in over plain HTTP from `from` (so the browser's sign-in allowance is left alone). */
async function sessionCookie(from: string, email: string): Promise<string> {
  const csrf = await send(from, "GET", "/api/auth/csrf", {});
  const jar = cookiesOf(csrf);
  const since = Date.now() - 1000;
  const ask = await send(
    from,
    "POST",
    "/api/auth/signin/nodemailer",
    { "content-type": "application/x-www-form-urlencoded", cookie: jar.join("; ") },
    new URLSearchParams({ email, csrfToken: (JSON.parse(csrf.body) as { csrfToken: string }).csrfToken }).toString(),
  );
  expect(ask.status).toBe(302);
  const link = new URL(await linkFromCatcher(email, since));
  const back = await send(from, "GET", `${link.pathname}${link.search}`, { cookie: jar.join("; ") });
  const session = cookiesOf(back).find((c) => c.includes("session-token"));
  expect(session).toBeDefined();
  return session ?? "";
}

test("40 analyses with a new forged X-Forwarded-For each: the client's address is the socket's, 30 pass, then 429", async () => {
  const csv = toCsv(
    generateLog({ seed: 3, cells: 4, capacityMah: 1300, loadCurrentA: 13, noise: { voltageV: 0.004 } }).rows,
  );
  const statuses: number[] = [];
  for (let i = 0; i < 40; i++) {
    const res = await send(
      "127.0.0.77",
      "POST",
      "/api/v1/analyse",
      { "content-type": "text/csv", "x-forwarded-for": forged(i) },
      csv,
    );
    statuses.push(res.status);
  }
  expect(statuses.slice(0, 30)).toEqual(Array(30).fill(200));
  expect(statuses.slice(30)).toEqual(Array(10).fill(429));
  // Another loopback address is another client: its own allowance.
  expect((await send("127.0.0.78", "POST", "/api/v1/analyse", { "content-type": "text/csv" }, csv)).status).toBe(200);
});

test("20 flags from one signed-in reader with a new forged X-Forwarded-For each: 10 pass, then 429", async () => {
  const cookie = await sessionCookie("127.0.0.79", `replay-${Date.now().toString(36)}@sagline.test`);
  const ids = new Set<number>();
  for (let p = 1; ids.size < 20 && p <= 5; p++) {
    const res = await send("127.0.0.79", "GET", `/api/v1/results?size=50&page=${p}`, {});
    for (const r of (JSON.parse(res.body) as { data: { id: number }[] }).data) ids.add(r.id);
  }
  const statuses: number[] = [];
  for (const [i, id] of [...ids].slice(0, 20).entries()) {
    const res = await send(
      "127.0.0.79",
      "POST",
      `/api/v1/results/${id}/flags`,
      { "content-type": "application/json", cookie, "x-forwarded-for": forged(i) },
      JSON.stringify({ reason: "other", note: "Replayed by a browser test." }),
    );
    statuses.push(res.status);
  }
  expect(statuses).toEqual([...Array(10).fill(201), ...Array(10).fill(429)]);
});

test("a new chart link is drawn per request with Cache-Control for shared caches, and a client's new states are capped", async () => {
  const charts = await send("127.0.0.80", "GET", "/api/v1/charts", {});
  const state = (JSON.parse(charts.body) as { data: { state: Record<string, unknown> }[] }).data[0]?.state;
  expect(state).toBeDefined();
  const link = (i: number) => {
    const encoded = Buffer.from(JSON.stringify({ ...state, title: `Replay ${Date.now()} ${i}` })).toString("base64url");
    return `/charts/view/${(encoded.match(/.{1,120}/g) ?? []).join("/")}`;
  };
  const first = await send("127.0.0.80", "GET", link(0), {});
  expect(first.status).toBe(200);
  expect(first.headers["cache-control"]).toBe("public, max-age=0, s-maxage=3600, stale-while-revalidate=86400");
  const statuses = [first.status];
  for (let i = 1; i < 35; i++)
    statuses.push((await send("127.0.0.80", "GET", link(i), { "x-forwarded-for": forged(i) })).status);
  expect(statuses.slice(0, 30)).toEqual(Array(30).fill(200));
  expect(statuses.slice(30)).toEqual(Array(5).fill(429));
  const refused = await send("127.0.0.80", "GET", link(99), {});
  expect(refused.headers["cache-control"]).toBe("no-store");
  expect(Number(refused.headers["retry-after"])).toBeGreaterThan(0);
});

test("a JSON body to the sign-in action is answered 400 and leaves no crash in the server's log", async () => {
  const html = (await send("127.0.0.81", "GET", "/sign-in", {})).body;
  const id = /&quot;id&quot;:&quot;([0-9a-f]{40,})&quot;/.exec(html)?.[1];
  expect(id).toBeDefined();
  const log = path.join(process.env.RUN_DIR ?? ".run/test", "app-e2e.log");
  const before = fs.existsSync(log) ? fs.statSync(log).size : 0;
  const json = await send(
    "127.0.0.81",
    "POST",
    "/sign-in",
    { "next-action": id ?? "", "content-type": "application/json" },
    JSON.stringify({ email: "a@example.test, b@example.test" }),
  );
  expect(json.status).toBe(400);
  expect(json.body).not.toMatch(/at .+\.js:\d+/); // no stack trace in the answer
  const big = await send(
    "127.0.0.81",
    "POST",
    "/sign-in",
    {
      "next-action": id ?? "",
      "content-type": "multipart/form-data; boundary=x",
      "content-length": String(2 * 1024 * 1024),
    },
    Buffer.alloc(2 * 1024 * 1024, 97),
  );
  expect(big.status).toBe(413);
  await new Promise((r) => setTimeout(r, 300));
  if (fs.existsSync(log)) {
    const added = fs.readFileSync(log, "utf8").slice(before);
    expect(added).not.toMatch(/unexpected error|TypeError|Body exceeded/);
  }
});
