// Per-pack aggregates of one group's published results (lib/open-data/aggregate.ts), as GET /api/v1/groups/{key}
// publishes them: one entry per pack in the order packs first appear, each figure's median (type 7, the mean of the
// two middle values for an even count), n, min and max over the results that have it.
import { describe, expect, it } from "vitest";
import { AGGREGATE_FIGURES, aggregateByPack } from "@/lib/open-data/aggregate";

type Sample = Parameters<typeof aggregateByPack>[0][number];
const sample = (packId: number, o: Partial<Sample> = {}): Sample => ({
  packId,
  packSlug: `pack-${packId}`,
  makerSlug: "wrenfield",
  makerName: "Wrenfield",
  model: `Plume ${packId}`,
  cellsInSeries: 4,
  ratedCapacityMah: 1500,
  labelledContinuousC: 50,
  ...(Object.fromEntries(AGGREGATE_FIGURES.map((f) => [f, null])) as Record<(typeof AGGREGATE_FIGURES)[number], null>),
  ...o,
});

describe("aggregateByPack", () => {
  it("groups samples by pack in first-seen order with median, n, min and max per figure", () => {
    const out = aggregateByPack([
      sample(2, { capacityMah: 1400 }),
      sample(1, { capacityMah: 1500, sagLimitedC: 40 }),
      sample(2, { capacityMah: 1450 }),
      sample(2, { capacityMah: 1300 }),
      sample(1, { capacityMah: 1510, sagLimitedC: 44 }),
      sample(2, { capacityMah: 1420 }),
    ]);
    expect(out.map((p) => [p.packSlug, p.resultCount])).toEqual([
      ["pack-2", 4],
      ["pack-1", 2],
    ]);
    // 1300, 1400, 1420, 1450: the median of an even count is the mean of the middle two.
    expect(out[0]?.figures.capacityMah).toEqual({ median: 1410, n: 4, min: 1300, max: 1450 });
    expect(out[0]?.figures.sagLimitedC).toBeNull();
    expect(out[1]?.figures.sagLimitedC).toEqual({ median: 42, n: 2, min: 40, max: 44 });
  });

  it("keeps every sample of a large group (20,000 results over 400 packs)", () => {
    const samples = Array.from({ length: 20_000 }, (_, i) => sample(i % 400, { capacityMah: 1000 + (i % 7) }));
    const out = aggregateByPack(samples);
    expect(out).toHaveLength(400);
    expect(out.reduce((n, p) => n + p.resultCount, 0)).toBe(20_000);
  });
});
