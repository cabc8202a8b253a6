import { beforeAll, describe, expect, it, vi } from "vitest";
import { GET as oembed } from "@/app/api/oembed/route";
import { GET as image } from "@/app/(public)/charts/image/[state]/[file]/route";
import { GET as listCharts } from "@/app/api/v1/charts/route";
import { GET as getOpenApi } from "@/app/api/v1/openapi.json/route";
import { db } from "@/db";
import { savedCharts } from "@/db/schema";
import { encodeChartState, statePath, type ChartState } from "@/lib/open-data/chart-state";
import { seedOpenData } from "../helpers/open-data-fixtures";

// Chart data reads through unstable_cache; outside Next.js every read goes to the database.
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const P = "cht";
let state: ChartState;
const BASE = process.env.APP_URL ?? "http://localhost:3000";
const noParams = { params: Promise.resolve({}) };
const req = (path: string) =>
  new Request(`http://localhost:3000${path}`, { headers: { "x-forwarded-for": "203.0.113.5" } });

beforeAll(async () => {
  const fx = await seedOpenData(P);
  state = { v: 1, kind: "label-check", group: fx.group, title: `${P} label check` };
  await db
    .insert(savedCharts)
    .values({ id: `${P}-one`, kind: "label-check", title: state.title, state, featuredAt: new Date() });
});

describe("GET /api/oembed (oembed.com §2.3)", () => {
  it("answers a chart permalink with a rich response that honours maxwidth", async () => {
    const url = `${BASE}/charts/view/${encodeChartState(state)}`;
    const res = await oembed(req(`/api/oembed?url=${encodeURIComponent(url)}&maxwidth=500&format=json`), noParams);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toContain("application/json");
    const body = (await res.json()) as Record<string, unknown>;
    expect(body).toMatchObject({ version: "1.0", type: "rich", provider_name: "Sagline" });
    expect(body.width).toBeLessThanOrEqual(500);
    expect(typeof body.html).toBe("string");
    expect(typeof body.height).toBe("number");
  });
  it("is 404 for URLs that are not charts and 501 for formats other than json", async () => {
    expect((await oembed(req(`/api/oembed?url=${encodeURIComponent(`${BASE}/packs/x`)}`), noParams)).status).toBe(404);
    const url = `${BASE}/charts/view/${encodeChartState(state)}`;
    expect((await oembed(req(`/api/oembed?url=${encodeURIComponent(url)}&format=xml`), noParams)).status).toBe(501);
    expect((await oembed(req("/api/oembed"), noParams)).status).toBe(422);
  });
});

describe("chart images", () => {
  const params = (file: string) => ({ params: Promise.resolve({ state: encodeChartState(state), file }) });
  it("serves the SVG with the licence inside", async () => {
    const res = await image(req("/charts/image/x/chart.svg"), params("chart.svg"));
    expect(res.headers.get("content-type")).toContain("image/svg+xml");
    const svg = await res.text();
    expect(svg).toContain("Source: Sagline");
    expect(svg).toContain("CC BY 4.0");
    expect(svg).toContain("3 packs, 4 approved results");
  });
  it("renders a PNG on the server, as a download when asked", async () => {
    const res = await image(req("/charts/image/x/chart.png?download=1"), params("chart.png"));
    expect(res.headers.get("content-type")).toBe("image/png");
    expect(res.headers.get("content-disposition")).toContain(".png");
    const bytes = new Uint8Array(await res.arrayBuffer());
    expect(Array.from(bytes.slice(0, 8))).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
    expect(bytes.length).toBeGreaterThan(10_000);
  });
  it("404s a broken state", async () => {
    expect(
      (await image(req("/charts/image/x/chart.svg"), { params: Promise.resolve({ state: "nope", file: "chart.svg" }) }))
        .status,
    ).toBe(404);
  });
});

describe("chart image sizes (width, height, PNG scale)", () => {
  const params = (file: string) => ({ params: Promise.resolve({ state: encodeChartState(state), file }) });
  const get = (file: "chart.png" | "chart.svg", query = "", headers: Record<string, string> = {}) =>
    image(
      new Request(`http://localhost:3000/charts/image/x/${file}${query}`, {
        headers: { "x-forwarded-for": "203.0.113.6", ...headers },
      }),
      params(file),
    );
  // PNG: the IHDR chunk follows the 8-byte signature; width and height are big-endian at bytes 16 and 20 (RFC 2083 §4.1.1).
  const pngSize = async (res: Response) => {
    const bytes = Buffer.from(await res.arrayBuffer());
    expect([...bytes.subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
    expect(bytes.toString("ascii", 12, 16)).toBe("IHDR");
    return { width: bytes.readUInt32BE(16), height: bytes.readUInt32BE(20) };
  };

  it("draws the PNG at width × scale by height × scale pixels, 1600 × 1000 by default", async () => {
    expect(await pngSize(await get("chart.png"))).toEqual({ width: 1600, height: 1000 });
    expect(await pngSize(await get("chart.png", "?width=400&scale=3"))).toEqual({ width: 1200, height: 1200 });
    expect(await pngSize(await get("chart.png", "?width=1000&height=700&scale=1"))).toEqual({
      width: 1000,
      height: 700,
    });
    expect(await pngSize(await get("chart.png", "?width=320"))).toEqual({ width: 640, height: 800 });
  });

  it("gives the SVG the asked width and height, laid out at its design width (components/charts/image)", async () => {
    // The viewBox is the size ÷ k, k = √(width ÷ 800) kept within 0.92–1.45: the same shape, type that stays legible.
    const box = (svg: string) => {
      const m = /^<svg [^>]*viewBox="0 0 ([\d.]+) ([\d.]+)" width="(\d+)" height="(\d+)"/.exec(svg);
      return m ? m.slice(1).map(Number) : [];
    };
    const k = (w: number) => Math.min(1.45, Math.max(0.92, Math.sqrt(w / 800)));
    for (const [query, w, h] of [
      ["?width=480", 480, 400],
      ["?width=600&height=900", 600, 900],
      ["", 800, 500],
      ["?width=1600&height=1000", 1600, 1000],
    ] as const) {
      const [vw = 0, vh = 0, width, height] = box(await (await get("chart.svg", query)).text());
      expect([width, height], query).toEqual([w, h]);
      expect(vw).toBeCloseTo(w / k(w), 0);
      expect(vh).toBeCloseTo(h / k(w), 0);
    }
  });

  it.each([
    ["chart.png", "?width=abc", "width"],
    ["chart.png", "?width=800.5", "width"],
    ["chart.png", "?width=100", "width"],
    ["chart.png", "?width=1601", "width"],
    ["chart.png", "?width=320&height=600", "height"],
    ["chart.png", "?height=2000", "height"],
    ["chart.png", "?scale=4", "scale"],
    ["chart.png", "?scale=two", "scale"],
    ["chart.png", "?width=1600&scale=3", "scale"],
    ["chart.svg", "?scale=2", "scale"],
    ["chart.svg", "?width=99999", "width"],
  ] as const)("%s%s answers 400 with a plain JSON message on %s", async (file, query, field) => {
    const res = await get(file, query);
    expect(res.status).toBe(400);
    expect(res.headers.get("content-type")).toContain("application/json");
    const body = (await res.json()) as {
      error: { code: string; message: string; fieldErrors: Record<string, string[]> };
    };
    expect(body.error.code).toBe("bad_request");
    expect(Object.keys(body.error.fieldErrors)).toEqual([field]);
    expect(body.error.message).toContain(field);
    expect(body.error.message).not.toMatch(/at .+\.ts|ZodError|Error:/);
  });

  it("keeps the bounds the OpenAPI document states", async () => {
    type Param = {
      name: string;
      in: string;
      schema: { minimum?: number; maximum?: number; enum?: (number | string)[] };
    };
    const doc = (await (await getOpenApi(req("/api/v1/openapi.json"), noParams)).json()) as {
      paths: Record<string, { get: { parameters: Param[]; responses: Record<string, unknown> } }>;
    };
    const op = doc.paths["/charts/image/{state}/{file}"]?.get;
    expect(op?.responses).toHaveProperty("400");
    const schema = (name: string) => op?.parameters.find((p) => p.name === name && p.in === "query")?.schema ?? {};
    const { minimum = NaN, maximum = NaN } = schema("width");
    expect((await get("chart.svg", `?width=${minimum}`)).status).toBe(200);
    expect((await get("chart.svg", `?width=${maximum}`)).status).toBe(200);
    expect((await get("chart.svg", `?width=${minimum - 1}`)).status).toBe(400);
    expect((await get("chart.svg", `?width=${maximum + 1}`)).status).toBe(400);
    for (const scale of schema("scale").enum ?? [])
      expect((await get("chart.png", `?width=${minimum}&scale=${scale}`)).status).toBe(200);
    expect(schema("scale").enum).toEqual([1, 2, 3]);
  });

  it("tags each size and scale apart, answers a matching If-None-Match with 304, and names downloads by pixel size", async () => {
    const a = await get("chart.png");
    const b = await get("chart.png", "?scale=1");
    const c = await get("chart.png", "?width=400");
    const d = await get("chart.svg");
    const tags = [a, b, c, d].map((r) => r.headers.get("etag"));
    expect(tags.every((t) => /^"[A-Za-z0-9_-]{27}"$/.test(t ?? ""))).toBe(true);
    expect(new Set(tags).size).toBe(4);
    expect((await get("chart.png", "?width=400")).headers.get("etag")).toBe(tags[2]);
    const again = await get("chart.png", "?width=400", { "if-none-match": tags[2] ?? "" });
    expect(again.status).toBe(304);
    expect(await again.text()).toBe("");
    expect((await get("chart.png", "", { "if-none-match": tags[2] ?? "" })).status).toBe(200);
    const download = await get("chart.png", "?width=400&scale=3&download=1");
    expect(download.headers.get("content-disposition")).toBe(
      `attachment; filename="sagline-${P}-label-check-1200x1200.png"`,
    );
  });
});

describe("GET /api/v1/charts", () => {
  it("lists featured charts with their links", async () => {
    const body = (await (await listCharts(req("/api/v1/charts"), noParams)).json()) as {
      data: { id: string; links: { permalink: string; embed: string } | null }[];
    };
    const one = body.data.find((c) => c.id === `${P}-one`);
    expect(one?.links?.permalink).toBe(`/charts/view/${statePath(encodeChartState(state))}`);
    expect(one?.links?.embed).toMatch(/^\/embed\/chart\//);
  });
});

describe("POST /api/v1/charts (saving a chart, chart.save; listing it is a moderator's decision)", () => {
  const post = (body: unknown, headers: Record<string, string> = {}) =>
    import("@/app/api/v1/charts/route").then(({ POST }) =>
      POST(
        new Request("http://localhost:3000/api/v1/charts", {
          method: "POST",
          headers: { "content-type": "application/json", host: "localhost:3000", ...headers },
          body: JSON.stringify(body),
        }),
        noParams,
      ),
    );

  it("needs a signed-in role: anonymous journalists publish permalinks instead (401)", async () => {
    expect((await post({ state })).status).toBe(401);
  });

  it("saves for a signed-in contributor (not listed until featured), refuses other origins and invalid states", async () => {
    const { sessions, users } = await import("@/db/schema");
    const [u] = await db
      .insert(users)
      .values({ email: `${P}-saver@example.test` })
      .returning();
    if (!u) throw new Error("no user");
    await db
      .insert(sessions)
      .values({ sessionToken: `${P}-token`, userId: u.id, expires: new Date(Date.now() + 3_600_000) });
    const cookie = { cookie: `authjs.session-token=${P}-token` };
    const res = await post({ state: { ...state, title: "Saved by a contributor" } }, cookie);
    expect(res.status).toBe(201);
    const saved = ((await res.json()) as { data: { id: string } }).data;
    expect(saved.id).toMatch(/^saved-by-a-contributor-[0-9a-f]{8}$/);
    expect(saved).toMatchObject({ featuredAt: null });
    const list = (await (await listCharts(req("/api/v1/charts"), noParams)).json()) as { data: { id: string }[] };
    expect(list.data.map((c) => c.id)).not.toContain(saved.id);
    expect(list.data.map((c) => c.id)).toContain(`${P}-one`);
    expect((await post({ state }, { ...cookie, origin: "https://elsewhere.example" })).status).toBe(403);
    expect((await post({ state: { ...state, kind: "pie" } }, cookie)).status).toBe(422);
  });
});
