// The query behind /packs/[slug]: figures per group, sustained C, the cycling series and its trend.
import { beforeAll, describe, expect, it } from "vitest";
import { getPackDetail } from "@/db/queries/pack-detail";
import { retentionTrend } from "@/lib/analysis";
import { emptyCatalogue, makeMaker, makePack, makeResult, makeUser, openReaderCase } from "../helpers/fixtures";

let slug = "";

beforeAll(async () => {
  await emptyCatalogue();
  const tester = await makeUser();
  const m = await makeMaker("Elder Test Cells");
  const pack = await makePack(m.id, { ratedCapacityMah: 2000, labelledContinuousC: 60 });
  slug = pack.slug;
  // Sustained C candidates (all new packs, warm, 3.3 V; rate bands differ so groups differ too).
  await makeResult(pack, tester.id, { rateC: 5, sagLimitedC: 30 });
  await makeResult(pack, tester.id, { rateC: 8, sagLimitedC: 32 }); // completed, cool enough
  await makeResult(pack, tester.id, { rateC: 15, passedStop: true }); // passed the stop temperature
  // The answer: completed and cool enough; an open reader case leaves it published, so it counts.
  await openReaderCase((await makeResult(pack, tester.id, { rateC: 20 })).id, tester.id);
  await makeResult(pack, tester.id, { rateC: 25, status: "rejected" }); // not published
  await makeResult(pack, tester.id, { rateC: 12, reachedCutoff: false }); // stopped before cut-off
  await makeResult(pack, tester.id, { rateC: 30, loadMode: "constant-power" }); // not constant current
  await makeResult(pack, tester.id, { rateC: 40, status: "pending" }); // not public
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

  it("takes sustained C from approved constant-current results completed to cut-off below the stop temperature", async () => {
    const d = await getPackDetail(slug);
    expect(d?.sustained?.rateC).toBe(20);
  });

  it("builds the cycling series from results differing only by age, with the retention trend", async () => {
    const d = await getPackDetail(slug);
    expect(d?.cycles?.points.map((p) => p.cycles)).toEqual([0, 60, 120, 180]);
    const expected = retentionTrend(
      [
        { cycles: 0, capacityMah: 1900 },
        { cycles: 60, capacityMah: 1880 },
        { cycles: 120, capacityMah: 1800 },
        { cycles: 180, capacityMah: 1720 },
      ],
      2000,
    );
    expect(d?.cycles?.trend?.cyclesTo80).toBeCloseTo(expected?.cyclesTo80 ?? Number.NaN, 6);
    expect(d?.cycles?.trend?.slopePerCycle).toBeLessThan(0);
  });

  it("returns null for an unknown pack", async () => {
    expect(await getPackDetail("no-such-pack")).toBeNull();
  });
});
