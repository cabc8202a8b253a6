// The shared cache of several app instances (issue 18; server/cache/redis-cache-handler.mjs) against the test
// world's real Redis (REDIS_URL, started by scripts/lib.sh). Two handler objects stand for two instances.
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";

type HandlerModule = typeof import("@/server/cache/redis-cache-handler.mjs");
type Handler = InstanceType<HandlerModule["default"]>;

const redisUrl = process.env.REDIS_URL;
const dirs: string[] = [];
/** A build folder with its BUILD_ID, as Next passes `serverDistDir` (<distDir>/server) to the handler. */
function build(id: string): string {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "sagline-build-"));
  dirs.push(dir);
  fs.mkdirSync(path.join(dir, "server"));
  fs.writeFileSync(path.join(dir, "BUILD_ID"), id);
  return path.join(dir, "server");
}
const load = async (): Promise<HandlerModule> => import("@/server/cache/redis-cache-handler.mjs");
const unique = () => `t${Date.now()}${Math.random().toString(36).slice(2, 8)}`;

describe.runIf(redisUrl)("the shared cache in Redis", () => {
  let mod: HandlerModule;
  let a: Handler;
  let b: Handler;
  beforeAll(async () => {
    mod = await load();
    const dist = build("build-1");
    a = new mod.default({ serverDistDir: dist });
    b = new mod.default({ serverDistDir: dist });
  });
  afterAll(async () => {
    await mod.closeSharedCache();
    for (const d of dirs) fs.rmSync(d, { recursive: true, force: true });
  });

  it("keeps Buffers and Maps through JSON (a page entry holds both)", () => {
    const page = {
      kind: "APP_PAGE",
      html: "<p>x</p>",
      rscData: Buffer.from([0, 1, 2, 255]),
      segmentData: new Map([["/_index", Buffer.from("seg")]]),
      headers: { "x-next-cache-tags": "pack:a,_N_T_/packs/a" },
      status: 200,
    };
    const back = mod.decode(mod.encode(page)) as typeof page;
    expect(back.rscData.equals(page.rscData)).toBe(true);
    expect(back.segmentData.get("/_index")?.toString()).toBe("seg");
    expect(back.headers).toEqual(page.headers);
    // A plain object that merely has a $buffer key among others stays an object.
    expect(mod.decode(mod.encode({ $buffer: "x", other: 1 }))).toEqual({ $buffer: "x", other: 1 });
  });

  it("an entry written by one instance is read by the other, until one of its tags is revalidated anywhere", async () => {
    const key = unique();
    const tag = `pack:${unique()}`;
    const value = { kind: "FETCH", data: { body: "[1,2]", headers: {}, status: 200 }, revalidate: 3600, tags: [tag] };
    await a.set(key, value, { tags: [tag] });
    expect((await b.get(key, { kind: "FETCH", tags: [tag] }))?.value).toEqual(value);
    await new Promise((r) => setTimeout(r, 2));
    await b.revalidateTag([tag]);
    expect(await a.get(key, { kind: "FETCH", tags: [tag] })).toBeNull();
    // Written again after the decision: served again.
    await new Promise((r) => setTimeout(r, 2));
    await a.set(key, value, { tags: [tag] });
    expect((await b.get(key, { kind: "FETCH", tags: [tag] }))?.value).toEqual(value);
  });

  it("a page answers to the tags in its cache-tags header, and to the soft tags of the request reading it", async () => {
    const key = `/packs/${unique()}`;
    const tag = `group:${unique()}`;
    const soft = `_N_T_${key}`;
    const page = { kind: "APP_PAGE", html: "<p/>", rscData: Buffer.from("r"), headers: { "x-next-cache-tags": tag } };
    await a.set(key, page, {});
    expect(await b.get(key, { kind: "APP_PAGE" })).not.toBeNull();
    await new Promise((r) => setTimeout(r, 2));
    await a.revalidateTag(tag);
    expect(await b.get(key, { kind: "APP_PAGE" })).toBeNull();

    await new Promise((r) => setTimeout(r, 2));
    await a.set(key, page, {});
    expect(await b.get(key, { kind: "APP_PAGE", softTags: [soft] })).not.toBeNull();
    await new Promise((r) => setTimeout(r, 2));
    await b.revalidateTag(soft);
    expect(await a.get(key, { kind: "APP_PAGE", softTags: [soft] })).toBeNull();
  });

  it("a tag revalidated does not touch entries without it, and a null write removes an entry", async () => {
    const key = unique();
    await a.set(key, { kind: "FETCH", data: {}, tags: ["pack:keep"] }, { tags: ["pack:keep"] });
    await b.revalidateTag(`pack:${unique()}`);
    expect(await b.get(key, { kind: "FETCH", tags: ["pack:keep"] })).not.toBeNull();
    await a.set(key, null);
    expect(await b.get(key, { kind: "FETCH" })).toBeNull();
  });

  it("a new build never reads the entries of another build", async () => {
    const key = unique();
    await a.set(key, { kind: "FETCH", data: {} }, {});
    const next = new mod.default({ serverDistDir: build("build-2") });
    expect(await next.get(key, { kind: "FETCH" })).toBeNull();
    expect(await b.get(key, { kind: "FETCH" })).not.toBeNull();
  });
});

describe("without a reachable Redis", () => {
  it("reads miss, writes and revalidations do not throw: pages are rendered fresh, never served stale", async () => {
    vi.resetModules();
    const saved = process.env.REDIS_URL;
    process.env.REDIS_URL = "redis://127.0.0.1:1"; // nothing listens on port 1
    const errors = vi.spyOn(console, "error").mockImplementation(() => {});
    try {
      const mod = await load();
      const h = new mod.default({});
      await expect(h.set("k", { kind: "FETCH", data: {} }, {})).resolves.toBeUndefined();
      await expect(h.get("k", { kind: "FETCH" })).resolves.toBeNull();
      await expect(h.revalidateTag(["pack:x"])).resolves.toBeUndefined();
      expect(errors.mock.calls.some(([m]) => String(m).includes("shared cache"))).toBe(true);
      await mod.closeSharedCache();
    } finally {
      errors.mockRestore();
      if (saved === undefined) delete process.env.REDIS_URL;
      else process.env.REDIS_URL = saved;
    }
  });
});
