// Curated charts (issue 13, item 4): anyone signed in may save a chart (limited per account) and share its
// link; /charts and GET /api/v1/charts list only charts a moderator featured, a page at a time; featuring and
// unfeaturing is a moderator's action (chart.feature), audited and refreshing the list's tag.
import { and, eq, isNotNull } from "drizzle-orm";
import { beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { db } from "@/db";
import { auditEvents, savedCharts } from "@/db/schema";
import { listFeaturedCharts } from "@/db/queries/open-data/charts";
import type { ChartState } from "@/lib/open-data/chart-state";
import { requestState } from "../helpers/next-mocks";
import { seedOpenData } from "../helpers/open-data-fixtures";
import { signedIn } from "../helpers/users";

const revalidate = vi.hoisted(() => ({ revalidateTags: vi.fn() }));
vi.mock("@/server/revalidate", () => revalidate);
vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const { GET, POST } = await import("@/app/api/v1/charts/route");
const { featureChart } = await import("@/app/(review)/review/charts/actions/feature-chart");
const { default: ChartsPage } = await import("@/app/(public)/charts/page");

const P = "cur";
let state: ChartState;
const noParams = { params: Promise.resolve({}) };
let ip = 0;
const get = (query = "") =>
  GET(
    new Request(`http://localhost:3000/api/v1/charts${query}`, { headers: { "x-forwarded-for": `10.8.0.${++ip}` } }),
    noParams,
  );
const save = (token: string, title: string) =>
  POST(
    new Request("http://localhost:3000/api/v1/charts", {
      method: "POST",
      headers: { "content-type": "application/json", host: "localhost:3000", cookie: `authjs.session-token=${token}` },
      body: JSON.stringify({ state: { ...state, title } }),
    }),
    noParams,
  );
type ListBody = {
  data: { id: string; featuredAt: string | null }[];
  meta: { total: number; pageCount: number };
  links: { next: string | null };
};

beforeAll(async () => {
  const fx = await seedOpenData(P);
  state = { v: 1, kind: "label-check", group: fx.group, title: `${P} chart` };
  await unfeatureAll();
});
/** Charts other test files featured would be counted too: take them off the list (they stay saved). */
const unfeatureAll = () =>
  db.update(savedCharts).set({ featuredAt: null, featuredById: null }).where(isNotNull(savedCharts.featuredAt));
beforeEach(() => {
  requestState.token = null;
  revalidate.revalidateTags.mockClear();
});

describe("saving, featuring and listing charts", () => {
  it("a contributor saves a chart; it is not listed; a moderator features it: listed, audited, the list's tag refreshed", async () => {
    const author = await signedIn("contributor", "chart-author");
    const res = await save(author.token, "FREE PACKS at evil.example");
    expect(res.status).toBe(201);
    const { id } = ((await res.json()) as { data: { id: string } }).data;
    expect(((await (await get()).json()) as ListBody).data.map((c) => c.id)).not.toContain(id);

    const mod = await signedIn("moderator");
    requestState.token = mod.token;
    expect(await featureChart(null, { chartId: id, featured: "1" })).toEqual({
      ok: true,
      data: { chartId: id, featured: true, changed: true },
    });
    expect(revalidate.revalidateTags).toHaveBeenCalledWith(["charts"]);
    const listed = (await (await get()).json()) as ListBody;
    expect(listed.data.find((c) => c.id === id)?.featuredAt).toEqual(expect.any(String));
    const [audit] = await db
      .select()
      .from(auditEvents)
      .where(and(eq(auditEvents.entityType, "saved_chart"), eq(auditEvents.entityId, id)));
    expect(audit).toMatchObject({
      actorId: mod.id,
      action: "chart.feature",
      data: { title: "FREE PACKS at evil.example" },
    });

    // Featuring again changes nothing; taking it off lists it no more and is audited too.
    expect(await featureChart(null, { chartId: id, featured: "1" })).toMatchObject({
      ok: true,
      data: { changed: false },
    });
    expect(await featureChart(null, { chartId: id, featured: "0" })).toMatchObject({
      ok: true,
      data: { featured: false },
    });
    expect(((await (await get()).json()) as ListBody).data.map((c) => c.id)).not.toContain(id);
    const actions = await db
      .select({ action: auditEvents.action })
      .from(auditEvents)
      .where(eq(auditEvents.entityId, id));
    expect(actions.map((a) => a.action).sort()).toEqual(["chart.feature", "chart.unfeature"]);
  });

  it("only moderators and admins feature (contributors: forbidden); unknown and malformed ids are refused", async () => {
    const author = await signedIn("contributor");
    const { id } = ((await (await save(author.token, "Mine")).json()) as { data: { id: string } }).data;
    requestState.token = author.token;
    expect(await featureChart(null, { chartId: id, featured: "1" })).toMatchObject({ ok: false, code: "forbidden" });
    requestState.token = (await signedIn("admin")).token;
    expect(await featureChart(null, { chartId: "no-such-chart", featured: "1" })).toMatchObject({ code: "not_found" });
    expect(await featureChart(null, { chartId: "../../etc", featured: "1" })).toMatchObject({ code: "validation" });
    const yes = { chartId: id, featured: "yes" } as unknown as { chartId: string; featured: "1" };
    expect(await featureChart(null, yes)).toMatchObject({ code: "validation" });
  });

  it("saving is limited per account: 20 an hour, then 429 with Retry-After", async () => {
    const busy = await signedIn("contributor", "busy-saver");
    for (let i = 0; i < 20; i++) expect((await save(busy.token, `Busy ${i}`)).status).toBe(201);
    const limited = await save(busy.token, "One more");
    expect(limited.status).toBe(429);
    expect(Number(limited.headers.get("retry-after"))).toBeGreaterThan(0);
  });

  it("the featured list is paged, newest feature first (API and /charts), with a 404 past the last page of /charts", async () => {
    await unfeatureAll();
    const base = Date.UTC(2026, 0, 1);
    await db.insert(savedCharts).values(
      Array.from({ length: 25 }, (_, i) => ({
        id: `${P}-paged-${String(i).padStart(2, "0")}`,
        kind: "label-check" as const,
        title: `Paged ${i}`,
        state: { ...state, title: `Paged ${i}` },
        featuredAt: new Date(base + i * 60_000),
      })),
    );
    const first = (await (await get("?size=10")).json()) as ListBody;
    expect(first.meta).toMatchObject({ total: 25, pageCount: 3 });
    expect(first.data.map((c) => c.id).slice(0, 2)).toEqual([`${P}-paged-24`, `${P}-paged-23`]);
    expect(first.links.next).toContain("page=2");
    const last = (await (await get("?size=10&page=3")).json()) as ListBody;
    expect(last.data.map((c) => c.id)).toEqual([
      `${P}-paged-04`,
      `${P}-paged-03`,
      `${P}-paged-02`,
      `${P}-paged-01`,
      `${P}-paged-00`,
    ]);
    expect((await get("?size=51")).status).toBe(422);
    expect((await listFeaturedCharts(3, 12)).rows.map((r) => r.id)).toEqual([`${P}-paged-00`]);
    // The page: 12 a page, three pages; page 4 does not exist.
    await expect(ChartsPage({ searchParams: Promise.resolve({ page: "3" }) })).resolves.toBeTruthy();
    await expect(ChartsPage({ searchParams: Promise.resolve({ page: "4" }) })).rejects.toMatchObject({
      digest: "NEXT_HTTP_ERROR_FALLBACK;404",
    });
  });
});
