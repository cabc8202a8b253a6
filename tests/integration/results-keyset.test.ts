// GET /api/v1/results paged by key (after=<id>): no gaps and no repeats while results are approved between page
// reads, the same order as numbered pages, numbered pages capped, and the total said to be PostgreSQL's estimate.
import { beforeAll, describe, expect, it, vi } from "vitest";
import { GET as getResults } from "@/app/api/v1/results/route";
import { sql } from "drizzle-orm";
import { db } from "@/db";
import { users } from "@/db/schema";
import { RESULT_PAGE_CAP } from "@/lib/api-contract/queries";
import { decideResult } from "@/server/review";
import { makeResult } from "../helpers/fixtures";
import { makeModerator, seedOpenData } from "../helpers/open-data-fixtures";

vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const P = "keyset";
let fx: Awaited<ReturnType<typeof seedOpenData>>;
let moderatorId = "";
let contributorId = "";
let ip = 0;
const req = (path: string) =>
  new Request(`http://localhost:3000${path}`, { headers: { "x-forwarded-for": `10.7.0.${++ip % 250}` } });
const noParams = { params: Promise.resolve({}) };
type Body = {
  data: { id: number }[];
  meta: { total: number; totalIsEstimate: boolean; page?: number; after?: number };
  links: { next: string | null; last: string | null; prev: string | null };
};

async function read(path: string): Promise<{ status: number; body: Body; totalHeader: string | null }> {
  const res = await getResults(req(path), noParams);
  return { status: res.status, body: (await res.json()) as Body, totalHeader: res.headers.get("x-total-count") };
}

async function approve(resultId: number): Promise<void> {
  await decideResult(moderatorId, resultId, {
    kind: "approve",
    note: null,
    catalogue: { intoPackId: null, intoMakerId: null },
  });
}

beforeAll(async () => {
  fx = await seedOpenData(P);
  moderatorId = await makeModerator(P);
  const [contributor] = await db
    .insert(users)
    .values({ email: `${P}-bench@example.test`, displayName: `${P} contributor` })
    .returning();
  if (!contributor) throw new Error("no contributor");
  contributorId = contributor.id;
  // More published results than numbered pages of one reach.
  for (let i = 0; i < RESULT_PAGE_CAP; i++) await makeResult(fx.packs[i % 3]!, contributorId, { ambientC: 27 });
});

describe("GET /api/v1/results by key", () => {
  it("follows links.next over every published result without gaps or repeats while results are approved", async () => {
    // Pending results made one by one, so their ids grow in the order they will be approved.
    const pending: { id: number }[] = [];
    for (const i of [0, 1, 2, 0])
      pending.push(await makeResult(fx.packs[i]!, contributorId, { status: "pending", ambientC: 27 }));
    // The full list before any approval, from numbered pages (the reference order).
    const before: number[] = [];
    for (let page = 1; ; page++) {
      const { body } = await read(`/api/v1/results?size=200&page=${page}`);
      before.push(...body.data.map((r) => r.id));
      if (body.meta.total <= page * 200) break;
    }
    expect(before.length).toBeGreaterThan(RESULT_PAGE_CAP);

    const seen: number[] = [];
    let path: string | null = "/api/v1/results?size=3";
    let reads = 0;
    while (path) {
      const { status, body } = await read(path);
      expect(status, path).toBe(200);
      seen.push(...body.data.map((r) => r.id));
      // Approve one result between page reads, until all four are in.
      const next = pending[reads++];
      if (next) await approve(next.id);
      path = body.links.next;
    }
    expect(new Set(seen).size).toBe(seen.length); // no repeats
    expect(seen).toEqual([...seen].sort((a, b) => a - b)); // id order
    // No gaps: everything published before, plus every result approved while reading (new ids come last).
    expect(seen).toEqual([...before, ...pending.map((r) => r.id)]);
  });

  it("reads the same order as numbered pages, and says its total is an estimate", async () => {
    const numbered: number[] = [];
    const first = await read("/api/v1/results?size=4&page=1");
    expect(first.body.meta.totalIsEstimate).toBe(false);
    expect(first.totalHeader).toBe(String(first.body.meta.total));
    // The reference order from numbered pages of 200 (20 of them reach 4,000 results: more than this database holds).
    for (let page = 1; (page - 1) * 200 < first.body.meta.total; page++)
      numbered.push(...(await read(`/api/v1/results?size=200&page=${page}`)).body.data.map((r) => r.id));

    const keyed: number[] = [];
    let path: string | null = `/api/v1/results?size=4&after=${numbered[1]}`;
    const page = await read(path);
    expect(page.body.meta).toMatchObject({ totalIsEstimate: true, after: numbered[1] });
    expect(page.body.meta.page).toBeUndefined();
    expect(page.body.links).toMatchObject({ last: null, prev: null });
    expect(page.totalHeader).toBeNull(); // an estimate is not sent as X-Total-Count
    expect(page.body.meta.total).toBeGreaterThanOrEqual(page.body.data.length);
    while (path) {
      const { body } = await read(path);
      keyed.push(...body.data.map((r) => r.id));
      path = body.links.next;
    }
    expect(keyed).toEqual(numbered.slice(2));
    // With fresh statistics the planner's estimate is near the exact count (PostgreSQL wiki, "Count estimate":
    // as good as the statistics). Generous bounds: the estimate of a three-table join is no exact science.
    await db.execute(sql`analyze results, packs, makers`);
    const estimated = (await read(`/api/v1/results?after=1`)).body.meta.total;
    expect(estimated).toBeGreaterThanOrEqual(first.body.meta.total * 0.5);
    expect(estimated).toBeLessThanOrEqual(first.body.meta.total * 2);
    // links.next of a numbered page reads by key and continues where the page ended.
    expect(first.body.links.next).toBe(`/api/v1/results?size=4&after=${numbered[3]}`);
  });

  it("filters by key like by number (one pack's results)", async () => {
    const slug = fx.packs[1]!.slug;
    const all = (await read(`/api/v1/results?pack=${slug}&size=200`)).body.data.map((r) => r.id);
    const firstId = all[0];
    if (firstId === undefined) throw new Error("the pack has no published result");
    const rest = (await read(`/api/v1/results?pack=${slug}&size=200&after=${firstId}`)).body.data.map((r) => r.id);
    expect(rest).toEqual(all.slice(1));
    const past = await read(`/api/v1/results?pack=${slug}&after=${all.at(-1)}`);
    expect(past.body.data).toEqual([]);
    expect(past.body.links.next).toBeNull();
  });

  it("caps numbered pages and rejects bad keys with a 422 that says what to do", async () => {
    const capped = await getResults(req(`/api/v1/results?page=${RESULT_PAGE_CAP + 1}&size=1`), noParams);
    expect(capped.status).toBe(422);
    const err = ((await capped.json()) as { error: { fieldErrors: Record<string, string[]> } }).error;
    expect(err.fieldErrors.page?.[0]).toContain("after=");
    for (const bad of ["after=0", "after=-3", "after=1e3", "after=x", "after=5&page=2"]) {
      const res = await getResults(req(`/api/v1/results?${bad}`), noParams);
      expect(res.status, bad).toBe(422);
    }
    // A numbered list longer than the cap has no `last` link (it would answer 422).
    const long = await read("/api/v1/results?size=1&page=1");
    expect(long.body.meta.total).toBeGreaterThan(RESULT_PAGE_CAP);
    expect(long.body.links.last).toBeNull();
    const short = await read(`/api/v1/results?pack=${fx.packs[1]!.slug}&size=200`);
    expect(short.body.links.last).toContain("page=1");
  });
});
