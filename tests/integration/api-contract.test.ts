// One public contract (issue 17 item 3, issue 13 item 7): the OpenAPI document, generated from the zod schemas,
// is valid OpenAPI 3.1 by an outside validator (@seriousme/openapi-schema-validator, the OAS 3.1 JSON Schema), it
// covers every public route on disk, and the REAL answers of every route — on seeded data, successes and errors —
// validate against the document's response schemas (ajv, JSON Schema 2020-12).
import fs from "node:fs";
import path from "node:path";
import { Validator } from "@seriousme/openapi-schema-validator";
import Ajv2020 from "ajv/dist/2020";
import { beforeAll, describe, expect, it, vi } from "vitest";
import { db } from "@/db";
import { savedCharts } from "@/db/schema";
import { PACK_SORT_KEYS } from "@/lib/api-contract/queries";
import { GROUP_KEY_PATTERN } from "@/lib/api-contract/params";
import { encodeChartState, type ChartState } from "@/lib/open-data/chart-state";
import { postRequest, sampleLog } from "../helpers/logs";
import { seedOpenData } from "../helpers/open-data-fixtures";
import { makePack, submission, uploadLog } from "../helpers/submission";
import { signedIn } from "../helpers/users";
import { requestState } from "../helpers/next-mocks";
import { decideResult } from "@/server/review";

vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

type Doc = {
  info: { license: Record<string, string> };
  paths: Record<string, Record<string, Op>>;
  components: { schemas: Record<string, object> };
};
type Op = {
  parameters: { name: string; in: string; schema: { enum?: string[]; pattern?: string } }[];
  responses: Record<string, { content?: Record<string, { schema: object }> }>;
};
type Handler = ((req: Request, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>) & {
  permission?: string;
};

const root = path.resolve(__dirname, "../..");
const P = "ctr";
let doc: Doc;
let ajv: Ajv2020;
let ip = 0;

/** app/…/route.ts → its URL template ("(public)" groups dropped, [x] → {x}). */
function templateOf(file: string): string {
  const rel = path.relative(path.join(root, "app"), path.dirname(file)).split(path.sep);
  return `/${rel
    .filter((s) => !/^\(.*\)$/.test(s))
    .map((s) => s.replace(/^\[(.+)\]$/, "{$1}"))
    .join("/")}`;
}
const routeFiles = (fs.readdirSync(path.join(root, "app"), { recursive: true }) as string[])
  .filter((f) => /(^|[/\\])route\.ts$/.test(f))
  .map((f) => path.join(root, "app", f));

async function handlerOf(template: string, method: "GET" | "POST"): Promise<Handler> {
  const file = routeFiles.find((f) => templateOf(f) === template);
  if (!file) throw new Error(`no route file for ${template}`);
  const mod = (await import(file)) as Record<string, Handler | undefined>;
  const h = mod[method];
  if (!h) throw new Error(`${template} has no ${method}`);
  return h;
}

const seen = new Set<string>();

/** Calls a route for real and validates its answer against the document's schema for its status and type. */
async function check(
  method: "get" | "post",
  template: string,
  url: string,
  params: Record<string, string>,
  init: { body?: string; headers?: Record<string, string> } = {},
): Promise<Response> {
  const handler = await handlerOf(template, method === "get" ? "GET" : "POST");
  const headers = { "x-forwarded-for": `10.66.${++ip % 250}.1`, host: "localhost:3000", ...init.headers };
  const req =
    method === "get"
      ? new Request(`http://localhost:3000${url}`, { headers })
      : postRequest(url, init.body ?? null, headers);
  const res = await handler(req, { params: Promise.resolve(params) });
  const op = doc.paths[template]?.[method];
  expect(op, `${method} ${template} is in the document`).toBeDefined();
  const response = op?.responses[String(res.status)];
  expect(response, `${method} ${url}: status ${res.status} is documented`).toBeDefined();
  const type = (res.headers.get("content-type") ?? "").split(";")[0]?.trim() ?? "";
  if (res.status !== 304) expect(Object.keys(response?.content ?? {}), `${method} ${url}: ${type}`).toContain(type);
  if (type === "application/json") {
    const schema = response?.content?.[type]?.schema ?? {};
    expect(refOf(schema), `${method} ${url}: a named response schema`).toMatch(/^#\/components\/schemas\/\w+$/);
    const validate = validatorOf(refOf(schema));
    const body: unknown = await res.clone().json();
    expect(validate(body) ? [] : validate.errors, `${method} ${url} (${res.status})`).toEqual([]);
  }
  seen.add(`${method} ${template} ${res.status}`);
  return res;
}
const validatorOf = (ref: string) => ajv.compile({ $ref: `https://sagline.test/openapi.json${ref}` });
const refOf = (schema: object) => ("$ref" in schema && typeof schema.$ref === "string" ? schema.$ref : "");

let fx: Awaited<ReturnType<typeof seedOpenData>>;
let chartState: ChartState;
let flagged = 0;
let withLog = 0;

beforeAll(async () => {
  const res = await (
    await handlerOf("/api/v1/openapi.json", "GET")
  )(new Request("http://localhost:3000/api/v1/openapi.json"), {
    params: Promise.resolve({}),
  });
  doc = (await res.json()) as Doc;
  ajv = new Ajv2020({ strict: false, allErrors: true, validateFormats: false });
  ajv.addSchema({ ...doc, $id: "https://sagline.test/openapi.json" });
  fx = await seedOpenData(P);
  chartState = { v: 1, kind: "label-check", group: fx.group, title: `${P} chart` };
  await db
    .insert(savedCharts)
    .values({ id: `${P}-chart`, kind: "label-check", title: chartState.title, state: chartState });
  // A result with a stored log, through the real submission flow, and one to flag.
  const { packId } = await makePack();
  const me = await signedIn("contributor", `${P}-tester`);
  const mod = await signedIn("moderator", `${P}-moderator`);
  requestState.token = me.token;
  const sub = await submitResult(null, submission(packId, await uploadLog(me.token, sampleLog({ seed: 811 }).csv)));
  if (!sub.ok) throw new Error(sub.error);
  withLog = sub.data.resultId;
  await decideResult(mod.id, withLog, {
    kind: "approve",
    note: null,
    catalogue: { intoPackId: null, intoMakerId: null },
  });
  requestState.token = null;
  flagged = fx.results.find((r) => r.status === "approved")?.id ?? 0;
});
const { submitResult } = await import("@/app/(contributor)/submit/actions/submit-result");

describe("the OpenAPI document", () => {
  it("is valid OpenAPI 3.1 by the specification's own JSON Schema (an outside validator)", async () => {
    const validator = new Validator();
    const result = await validator.validate(structuredClone(doc) as never);
    expect(result.errors ?? []).toEqual([]);
    expect(result.valid).toBe(true);
    expect(validator.version).toBe("3.1");
    // The licence carries the SPDX identifier and no url: OpenAPI 3.1 forbids both (§4.8.4).
    expect(doc.info.license).toEqual({ name: "CC BY 4.0", identifier: "CC-BY-4.0" });
    const both = structuredClone(doc);
    both.info.license.url = "https://creativecommons.org/licenses/by/4.0/";
    expect((await new Validator().validate(both as never)).valid).toBe(false); // the validator does enforce it
  });

  it("covers every public route handler on disk, and only routes that exist", async () => {
    // Auth.js's own endpoints speak the sign-in protocol of the auth library, not the public data contract.
    // The chart embed and the home page's label-check fragment are HTML for people, served by route handlers only
    // so that they carry no framework script (issue 15): pages, not the data contract. A result's label photos are
    // evidence served with their own check (server/evidence.ts: moderators, the contributor, everyone once
    // published), not open data.
    const NOT_THE_API = new Set([
      "get /api/auth/{...nextauth}",
      "post /api/auth/{...nextauth}",
      "get /embed/chart/{...state}",
      "get /fragments/label-check/{group}",
      "get /fragments/label-check/{group}/{rating}",
      "get /results/{id}/photos/{n}",
    ]);
    // Every public handler is documented; a documented route may also need a session (a reader's flag), but it
    // must exist on disk.
    const onDisk = new Set<string>();
    const publicOnDisk = new Set<string>();
    for (const file of routeFiles) {
      const mod = (await import(file)) as Record<string, Handler | undefined>;
      for (const method of ["GET", "POST"] as const) {
        const op = `${method.toLowerCase()} ${templateOf(file)}`;
        if (!mod[method] || NOT_THE_API.has(op)) continue;
        onDisk.add(op);
        if (mod[method]?.permission === "public") publicOnDisk.add(op);
      }
    }
    const documented = new Set(
      Object.entries(doc.paths).flatMap(([p, ops]) => Object.keys(ops).map((m) => `${m} ${p}`)),
    );
    expect([...publicOnDisk].filter((r) => !documented.has(r))).toEqual([]);
    expect([...documented].filter((r) => !onDisk.has(r))).toEqual([]);
    expect(documented.has("post /api/v1/results/{id}/flags")).toBe(true);
  });

  it("states one filter contract: sort has its enum, and every group key parameter has the one pattern", () => {
    const params = Object.values(doc.paths).flatMap((ops) => Object.values(ops).flatMap((op) => op.parameters));
    expect(params.find((p) => p.name === "sort")?.schema.enum).toEqual([...PACK_SORT_KEYS]);
    const groupPatterns = params.filter((p) => p.name === "group" || p.name === "key").map((p) => p.schema.pattern);
    expect(groupPatterns.length).toBeGreaterThanOrEqual(4);
    expect(new Set(groupPatterns)).toEqual(new Set([GROUP_KEY_PATTERN.source]));
  });
});

describe("real answers of every route validate against the document", () => {
  it("lists and items: makers, packs, results, groups, charts", async () => {
    const maker = fx.makers[0]?.slug ?? "";
    const pack = fx.packs[0]?.slug ?? "";
    const result = String(fx.results[0]?.id ?? 0);
    await check("get", "/api/v1/makers", "/api/v1/makers?size=2", {});
    await check("get", "/api/v1/makers/{slug}", `/api/v1/makers/${maker}`, { slug: maker });
    await check("get", "/api/v1/packs", `/api/v1/packs?group=${fx.group}&sort=labelRatio&dir=desc`, {});
    await check("get", "/api/v1/packs", `/api/v1/packs?q=${P}%20kestrel&size=1`, {});
    await check("get", "/api/v1/packs/{slug}", `/api/v1/packs/${pack}`, { slug: pack });
    await check("get", "/api/v1/results", `/api/v1/results?group=${fx.group}&size=2&page=2`, {});
    await check("get", "/api/v1/results/{id}", `/api/v1/results/${result}`, { id: result });
    await check("get", "/api/v1/groups", "/api/v1/groups?minResults=2", {});
    await check("get", "/api/v1/groups/{key}", `/api/v1/groups/${fx.group}?cells=4`, { key: fx.group });
    await check("get", "/api/v1/charts", "/api/v1/charts", {});
    await check("get", "/api/v1/charts/{id}", `/api/v1/charts/${P}-chart`, { id: `${P}-chart` });
  });

  it("files: downloads, README, the Data Package, the raw log, chart images, the document itself", async () => {
    for (const file of ["makers.csv", "packs.json", "results.csv", "results.json", "makers.json", "README.txt"])
      await check("get", "/data/download/{file}", `/data/download/${file}?group=${fx.group}`, { file });
    await check("get", "/data/datapackage.json", "/data/datapackage.json", {});
    await check("get", "/api/v1/results/{id}/log", `/api/v1/results/${withLog}/log`, { id: String(withLog) });
    const state = encodeChartState(chartState);
    await check("get", "/charts/image/{state}/{file}", `/charts/image/${state}/chart.svg`, {
      state,
      file: "chart.svg",
    });
    await check("get", "/api/v1/openapi.json", "/api/v1/openapi.json", {});
  });

  it("tools: analyse, oEmbed, a reader's flag, who is signed in", async () => {
    await check(
      "post",
      "/api/v1/analyse",
      "/api/v1/analyse?cells=4&ratedMah=1300&include=curve",
      {},
      {
        body: sampleLog().csv,
        headers: { "content-type": "text/csv" },
      },
    );
    const url = encodeURIComponent(
      `${process.env.APP_URL ?? "http://localhost:3000"}/charts/view/${encodeChartState(chartState)}`,
    );
    await check("get", "/api/oembed", `/api/oembed?url=${url}&maxwidth=600`, {});
    const reader = await signedIn("contributor", `${P}-reader`);
    await check(
      "post",
      "/api/v1/results/{id}/flags",
      `/api/v1/results/${flagged}/flags`,
      { id: String(flagged) },
      {
        body: JSON.stringify({ reason: "wrong-figures", note: "The capacity is above the rating." }),
        headers: { "content-type": "application/json", cookie: `authjs.session-token=${reader.token}` },
      },
    );
    await check("get", "/api/v1/me", "/api/v1/me", {});
  });

  it("errors: 404, 422 and 304 answers are the documented shapes", async () => {
    await check("get", "/api/v1/makers/{slug}", "/api/v1/makers/no-such-maker", { slug: "no-such-maker" });
    await check("get", "/api/v1/results", "/api/v1/results?group=nope", {});
    await check("get", "/api/v1/results", "/api/v1/results?page=9999", {});
    await check("get", "/api/v1/packs", "/api/v1/packs?cells=x&sort=colour", {});
    await check("get", "/api/v1/groups/{key}", "/api/v1/groups/nope", { key: "nope" });
    await check("get", "/api/v1/results/{id}", "/api/v1/results/abc", { id: "abc" });
    await check("get", "/data/download/{file}", "/data/download/results.csv?group=nope", { file: "results.csv" });
    await check("get", "/api/oembed", "/api/oembed?url=https%3A%2F%2Felsewhere.example%2Fx", {});
    const etag = (await check("get", "/api/v1/makers", "/api/v1/makers", {})).headers.get("etag") ?? "";
    const notModified = await check(
      "get",
      "/api/v1/makers",
      "/api/v1/makers",
      {},
      { headers: { "if-none-match": etag } },
    );
    expect(notModified.status).toBe(304);
  });

  it("catches answers that stray from the contract (the check itself can fail)", async () => {
    const res = await check("get", "/api/v1/makers", "/api/v1/makers?size=1", {});
    const body = (await res.json()) as { data: Record<string, unknown>[]; meta: Record<string, unknown> };
    const validate = validatorOf("#/components/schemas/MakerList");
    expect(validate(body)).toBe(true);
    expect(validate({ ...body, data: [{ ...body.data[0], packCount: "3" }] })).toBe(false);
    expect(validate({ ...body, data: [{ ...body.data[0], extra: 1 }] })).toBe(false);
    expect(validate({ ...body, meta: { ...body.meta, pageSize: 1 } })).toBe(false);
  });

  it("left no documented operation uncalled", () => {
    const ops = Object.entries(doc.paths).flatMap(([p, o]) => Object.keys(o).map((m) => `${m} ${p}`));
    const answered = ops.filter((op) => [...seen].some((s) => s.startsWith(`${op} 2`)));
    expect(answered).toEqual(ops);
  });
});
