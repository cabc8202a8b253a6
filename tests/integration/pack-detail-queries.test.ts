// The query behind /packs/[slug]: figures per group, sustained C (the highest MEASURED value among published
// results, content/methods/figures.md), the ageing figures — one pack's retention series from a multi-cycle
// log, and results across cycle counts with a projection only where the data supports it.
import { beforeAll, describe, expect, it } from "vitest";
import { getPackDetail } from "@/db/queries/pack-detail";
import { projectTo80, retentionSeries, retentionTrend } from "@/lib/analysis";
import { emptyCatalogue, makeMaker, makePack, makeResult, makeUser, openReaderCase } from "../helpers/fixtures";

let slug = "";
// One physical pack over 5 cycles of one log (invented numbers), and a longer series on a result that is not public.
const series = retentionSeries(
  [1900, 1890, 1882, 1870, 1861].map((capacityMah, i) => ({ cycle: i + 1, capacityMah })),
  2000,
);
const longer = retentionSeries(
  Array.from({ length: 8 }, (_, i) => ({ cycle: i + 1, capacityMah: 1900 - 10 * i })),
  2000,
);
if (!series || !longer) throw new Error("retention series expected");

beforeAll(async () => {
  await emptyCatalogue();
  const tester = await makeUser();
  const m = await makeMaker("Elder Test Cells");
  const pack = await makePack(m.id, { ratedCapacityMah: 2000, labelledContinuousC: 60 });
  slug = pack.slug;
  // Sustained C candidates (all new packs, warm, 3.3 V; rate bands differ so groups differ too). The stated rate
  // no longer counts: only the measured rating of runs that qualified (null for the others).
  await makeResult(pack, tester.id, { rateC: 5, sagLimitedC: 30, sustainedCMeasured: 4.9 });
  await makeResult(pack, tester.id, { rateC: 8, sagLimitedC: 32, sustainedCMeasured: 7.9, retention: series });
  await makeResult(pack, tester.id, { rateC: 15, passedStop: true, sustainedCMeasured: null }); // did not qualify
  // The answer: it qualified; an open reader case leaves it published, so it counts until moderators decide.
  await openReaderCase((await makeResult(pack, tester.id, { rateC: 20, sustainedCMeasured: 19.6 })).id, tester.id);
  await makeResult(pack, tester.id, { rateC: 25, status: "rejected", sustainedCMeasured: 24.5 }); // not published
  await makeResult(pack, tester.id, { rateC: 12, reachedCutoff: false }); // stopped before cut-off
  await makeResult(pack, tester.id, { rateC: 30, loadMode: "constant-power" }); // no measured rating
  await makeResult(pack, tester.id, { rateC: 40, status: "pending", sustainedCMeasured: 39, retention: longer }); // not public
  // Cycling: same method, ambient, cut-off and rate; ages 0, 60, 120, 180.
  for (const [cycles, mah] of [
    [60, 1880],
    [120, 1800],
    [180, 1720],
  ] as const)
    await makeResult(pack, tester.id, { rateC: 8, cycles, capacityMah: mah });
});

describe("pack detail", () => {
  it("splits published results by like-for-like group and leaves non-public ones out", async () => {
    const d = await getPackDetail(slug);
    expect(d?.results.length).toBe(9);
    const keys = new Set(d?.groups.map((g) => g.group.key));
    expect(keys.size).toBe(d?.groups.length);
    const byKeyEnd = (end: string) => d?.groups.find((g) => g.group.key.endsWith(end));
    expect(byKeyEnd("_r5-10_new")?.n).toBe(1); // the new 8C run
    expect(byKeyEnd("_r10-20_new")).toMatchObject({ n: 3, openCases: 1 }); // 12C, 15C and 20C (with its open case)
    expect(byKeyEnd("_r5-10_c50-199")?.n).toBe(3); // aged 60, 120 and 180 cycles
    expect(byKeyEnd("_r5-10_c50-199")?.figures.capacityMah?.median).toBe(1800);
  });

  it("takes sustained C as the highest measured value among published results (not the rate the tester stated)", async () => {
    const d = await getPackDetail(slug);
    expect(d?.sustained?.rateC).toBeCloseTo(19.6, 5);
    // Per group: the highest measured value of that group's published results only.
    const g = d?.groups.find((x) => x.group.key.endsWith("_r10-20_new"));
    expect(g?.sustainedC).toBeCloseTo(19.6, 5); // 12C stopped early and 15C passed the stop temperature
    expect(d?.groups.find((x) => x.group.key.endsWith("_r2-5_new"))?.sustainedC).toBeCloseTo(4.9, 5);
    expect(d?.groups.find((x) => x.group.key.endsWith("_r5-10_new"))?.sustainedC).toBeCloseTo(7.9, 5);
  });

  it("draws one physical pack's ageing from the published result whose log holds several cycles", async () => {
    const d = await getPackDetail(slug);
    const one = d?.ageing.onePack;
    expect(one?.retention.points.map((p) => p.cycle)).toEqual([1, 2, 3, 4, 5]);
    expect(one?.otherSeries).toBe(0); // the pending 8-cycle result is not public
    expect(one?.retention.projectionNote).toBe(series.projectionNote);
  });

  it("keeps the results across cycle counts apart, with a projection only where the data supports it", async () => {
    const d = await getPackDetail(slug);
    const across = d?.ageing.acrossResults;
    expect(across?.points.map((p) => p.cycles)).toEqual([0, 60, 120, 180]);
    const expected = retentionTrend(
      [
        { cycles: 0, capacityMah: 1900 },
        { cycles: 60, capacityMah: 1880 },
        { cycles: 120, capacityMah: 1800 },
        { cycles: 180, capacityMah: 1720 },
      ],
      2000,
    );
    expect(across?.trend?.cyclesTo80).toBeCloseTo(expected?.cyclesTo80 ?? Number.NaN, 6);
    expect(across?.trend?.slopePerCycle).toBeLessThan(0);
    // The line reaches 80 % near cycle 490: more than half the observed span (0–180) past the last cycle, so
    // no projection (Sagline's rule, lib/analysis/cycles.ts projectTo80).
    expect(across?.projection).toEqual(projectTo80(expected, 0, 180, 4));
    expect(across?.projection.cyclesTo80).toBeNull();
  });

  it("returns null for an unknown pack", async () => {
    expect(await getPackDetail("no-such-pack")).toBeNull();
  });
});
