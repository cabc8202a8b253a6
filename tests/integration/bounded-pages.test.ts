// Pages keep their size as a group grows. The home page's label check draws at most HOME_LABEL_CHECK_MAX_PACKS
// packs (picked in SQL: most published results, ties by slug) and lists HOME_RANKING_MAX_MAKERS makers, each cut
// saying "Showing N of M" with a link to the full table; a curves chart draws at most MAX_CURVES curves, picked in
// SQL by the same rule, and says how many packs it left out.
import { beforeAll, describe, expect, it, vi } from "vitest";
import { GET as fragment } from "@/app/(public)/fragments/label-check/[group]/route";
import { listPacksInGroup } from "@/db/queries/groups";
import { listGroupCurves } from "@/db/queries/open-data/results";
import { HOME_LABEL_CHECK_MAX_PACKS, HOME_RANKING_MAX_MAKERS } from "@/lib/bounded-lists";
import { MAX_CURVES } from "@/lib/open-data/chart-data";
import { loadChartData } from "@/server/open-data/load-chart-data";
import { makeMaker, makePack, makeResult, makeUser } from "../helpers/fixtures";
import { seedOpenData } from "../helpers/open-data-fixtures";

vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const MAKERS = HOME_RANKING_MAX_MAKERS + 2;
const PACKS = HOME_LABEL_CHECK_MAX_PACKS + 5;
const BUSY = 4; // packs with three results each; the rest have one
let bigGroup = "";
let smallGroup = "";
let slugs: { slug: string; results: number }[] = [];

const html = async (group: string) => {
  const res = await fragment(
    new Request(`http://localhost:3000/fragments/label-check/${group}`, {
      headers: { "x-forwarded-for": "203.0.113.41" },
    }),
    { params: Promise.resolve({ group }) },
  );
  expect(res.status).toBe(200);
  return res.text();
};

beforeAll(async () => {
  smallGroup = (await seedOpenData("bndh")).group;
  const user = await makeUser();
  // A method card no other test file uses (cold room, unusual rate, cut-off and cycles): a group of its own.
  const makers = [];
  for (let i = 0; i < MAKERS; i++) makers.push(await makeMaker(`Bounded Maker ${String(i).padStart(2, "0")}`));
  for (let i = 0; i < PACKS; i++) {
    const pack = await makePack(makers[i % MAKERS]!.id, { slug: `bndh-pack-${String(i).padStart(3, "0")}` });
    // The busiest packs are the last by slug, so the pick cannot be "the first by slug".
    const busy = i >= PACKS - BUSY;
    const n = busy ? 3 : 1;
    for (let k = 0; k < n; k++) {
      const r = await makeResult(pack, user.id, {
        ambientC: 4,
        rateC: 27,
        cutoffVPerCell: 3.05,
        cycles: 150,
        sagLimitedC: 30 + (i % 7),
      });
      bigGroup = r.groupKey;
    }
    slugs.push({ slug: pack.slug, results: n });
  }
  slugs = slugs.sort((a, b) => b.results - a.results || a.slug.localeCompare(b.slug));
});

describe("bounded home label check", () => {
  it("picks the packs in SQL: most published results first, ties by slug, at most the cap", async () => {
    const top = await listPacksInGroup(bigGroup, HOME_LABEL_CHECK_MAX_PACKS);
    expect(top.map((p) => p.packSlug)).toEqual(slugs.slice(0, HOME_LABEL_CHECK_MAX_PACKS).map((s) => s.slug));
    expect((await listPacksInGroup(bigGroup)).length).toBe(PACKS); // without a limit: every pack, as before
  });

  it("draws at most the cap, names the rule, and links to the full table", async () => {
    const page = await html(bigGroup);
    const drawn = /against labelled C, (\d+) packs/.exec(page)?.[1];
    expect(Number(drawn)).toBe(HOME_LABEL_CHECK_MAX_PACKS);
    expect(page).toContain(
      `Showing ${HOME_LABEL_CHECK_MAX_PACKS} of ${PACKS} packs: the packs with the most published results`,
    );
    expect(page).toContain(`href="/packs?group=${encodeURIComponent(bigGroup)}&amp;sort=results&amp;dir=desc"`);
    // The busiest packs are drawn; the last one-result packs by slug are not.
    for (const s of slugs.slice(0, BUSY)) expect(page).toContain(`/packs/${s.slug}`);
    for (const s of slugs.slice(HOME_LABEL_CHECK_MAX_PACKS)) expect(page).not.toContain(`/packs/${s.slug}"`);
  });

  it("lists at most the cap of makers and says how many there are", async () => {
    const page = await html(bigGroup);
    const list = /data-testid="maker-ranking">([\s\S]*?)<\/ul>/.exec(page)?.[1] ?? "";
    expect(list.match(/<li/g)?.length).toBe(HOME_RANKING_MAX_MAKERS);
    expect(page).toContain(`Showing ${HOME_RANKING_MAX_MAKERS} of ${MAKERS} makers: the highest medians`);
  });

  it("says nothing about a cut where nothing was cut", async () => {
    const page = await html(smallGroup);
    expect(page).not.toContain("label-check-cut");
    expect(page).not.toContain("ranking-cut");
  });
});

describe("bounded curves chart", () => {
  it("reads at most MAX_CURVES curves in SQL, one per pack, for the busiest packs, and counts the rest", async () => {
    const { series, packTotal } = await listGroupCurves(bigGroup, { packIds: null }, MAX_CURVES);
    expect(packTotal).toBe(PACKS);
    expect(series.map((s) => s.packSlug)).toEqual(slugs.slice(0, MAX_CURVES).map((s) => s.slug));
    expect(new Set(series.map((s) => s.resultId)).size).toBe(MAX_CURVES);
  });

  it("draws at most MAX_CURVES and says how many packs were left out and by which rule", async () => {
    const data = await loadChartData({ v: 1, kind: "curves", group: bigGroup, title: "Curves" });
    expect(data.curves).toHaveLength(MAX_CURVES);
    expect(data.leftOut.join(" ")).toContain(
      `${PACKS - MAX_CURVES} more packs not drawn: at most ${MAX_CURVES} curves, for the packs with the most published results`,
    );
  });
});
