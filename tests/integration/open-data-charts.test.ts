import { beforeAll, describe, expect, it, vi } from "vitest";
import { GET as oembed } from "@/app/api/oembed/route";
import { GET as image } from "@/app/(public)/charts/image/[state]/[file]/route";
import { GET as listCharts } from "@/app/api/v1/charts/route";
import { db } from "@/db";
import { savedCharts } from "@/db/schema";
import { encodeChartState, type ChartState } from "@/lib/open-data/chart-state";
import { seedOpenData } from "../helpers/open-data-fixtures";

// Chart data reads through unstable_cache; outside Next.js every read goes to the database.
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const P = "cht";
let state: ChartState;
const BASE = process.env.APP_URL ?? "http://localhost:3000";
const noParams = { params: Promise.resolve({}) };
const req = (path: string) => new Request(`http://localhost:3000${path}`, { headers: { "x-forwarded-for": "203.0.113.5" } });

beforeAll(async () => {
  const fx = await seedOpenData(P);
  state = { v: 1, kind: "label-check", group: fx.group, title: `${P} label check` };
  await db.insert(savedCharts).values({ id: `${P}-one`, kind: "label-check", title: state.title, state });
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
    expect((await image(req("/charts/image/x/chart.svg"), { params: Promise.resolve({ state: "nope", file: "chart.svg" }) })).status).toBe(404);
  });
});

describe("GET /api/v1/charts", () => {
  it("lists saved charts with their links", async () => {
    const body = (await (await listCharts(req("/api/v1/charts"), noParams)).json()) as { data: { id: string; links: { permalink: string; embed: string } | null }[] };
    const one = body.data.find((c) => c.id === `${P}-one`);
    expect(one?.links?.permalink).toBe(`/charts/view/${encodeChartState(state)}`);
    expect(one?.links?.embed).toMatch(/^\/embed\/chart\//);
  });
});

describe("POST /api/v1/charts (curated list, chart.save)", () => {
  const post = (body: unknown, headers: Record<string, string> = {}) =>
    import("@/app/api/v1/charts/route").then(({ POST }) =>
      POST(new Request("http://localhost:3000/api/v1/charts", { method: "POST", headers: { "content-type": "application/json", host: "localhost:3000", ...headers }, body: JSON.stringify(body) }), noParams),
    );

  it("needs a signed-in role: anonymous journalists publish permalinks instead (401)", async () => {
    expect((await post({ state })).status).toBe(401);
  });

  it("saves for a signed-in contributor, refuses other origins and invalid states", async () => {
    const { sessions, users } = await import("@/db/schema");
    const [u] = await db.insert(users).values({ email: `${P}-saver@example.test` }).returning();
    if (!u) throw new Error("no user");
    await db.insert(sessions).values({ sessionToken: `${P}-token`, userId: u.id, expires: new Date(Date.now() + 3_600_000) });
    const cookie = { cookie: `authjs.session-token=${P}-token` };
    const res = await post({ state: { ...state, title: "Saved by a contributor" } }, cookie);
    expect(res.status).toBe(201);
    const saved = ((await res.json()) as { data: { id: string } }).data;
    expect(saved.id).toMatch(/^saved-by-a-contributor-[0-9a-f]{8}$/);
    const list = (await (await listCharts(req("/api/v1/charts"), noParams)).json()) as { data: { id: string }[] };
    expect(list.data.map((c) => c.id)).toContain(saved.id);
    expect((await post({ state }, { ...cookie, origin: "https://elsewhere.example" })).status).toBe(403);
    expect((await post({ state: { ...state, kind: "pie" } }, cookie)).status).toBe(422);
  });
});
