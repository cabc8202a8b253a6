// Catalogue slugs: maker, model, cells and capacity, each said once, at most 60 characters, and a numbered
// variant shortened by whole words when the plain one is taken. (The rules are ours; no outside source.)
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { freeSlugFrom, makerSlug, packSlug } from "@/lib/slug";

const pack = (makerName: string, model: string, cellsInSeries = 4, ratedCapacityMah = 1300) => ({
  makerName,
  model,
  cellsInSeries,
  ratedCapacityMah,
});

describe("pack slugs", () => {
  it("says cells and capacity once: kept from the model, added when the model lacks them", () => {
    expect(packSlug(pack("Volta Ridge", "1300 4S 75C"))).toBe("volta-ridge-1300-4s-75c");
    expect(packSlug(pack("Volta Ridge", "Racing", 6, 5000))).toBe("volta-ridge-racing-6s-5000mah");
    expect(packSlug(pack("Volta Ridge", "Skua 1300mAh 75C"))).toBe("volta-ridge-skua-1300mah-75c-4s");
  });

  it("drops a maker name the model repeats, and accents", () => {
    expect(packSlug(pack("Volta Ridge", "Volta Ridge Skua 1300 4S"))).toBe("volta-ridge-skua-1300-4s");
    expect(packSlug(pack("Énergie Sûre", "Pétrel 1300 4S"))).toBe("energie-sure-petrel-1300-4s");
  });

  it("keeps maker, cells and capacity when too long, and as many model words as fit, in order", () => {
    const s = packSlug(
      pack("Ternwick Proposal Cells", "Stormpetrel Competition Series Ultra High Discharge Graphene 1300 4S 75C"),
    );
    expect(s).toBe("ternwick-proposal-cells-stormpetrel-competition-4s-1300mah");
    expect(s.length).toBeLessThanOrEqual(60);
  });

  it("is never longer than its limit, never empty and only lower-case letters, digits and single hyphens", () => {
    fc.assert(
      fc.property(
        fc.string({ maxLength: 120 }),
        fc.string({ maxLength: 200 }),
        fc.integer({ min: 1, max: 14 }),
        fc.integer({ min: 50, max: 100_000 }),
        fc.integer({ min: 20, max: 60 }),
        (maker, model, cells, mah, max) => {
          const s = packSlug(pack(maker, model, cells, mah), max);
          expect(s.length).toBeGreaterThan(0);
          expect(s.length).toBeLessThanOrEqual(max);
          expect(s).toMatch(/^[a-z0-9]+(-[a-z0-9]+)*$/);
        },
      ),
    );
  });
});

describe("free slugs", () => {
  it("numbers a taken slug, shortening the words rather than cutting one", () => {
    const short = (max: number) => packSlug(pack("Volta Ridge", "Twin 1300 4S 75C"), max);
    expect(freeSlugFrom(short, new Set())).toBe("volta-ridge-twin-1300-4s-75c");
    expect(freeSlugFrom(short, new Set(["volta-ridge-twin-1300-4s-75c"]))).toBe("volta-ridge-twin-1300-4s-75c-2");
    // 59 characters as it is; with "-2" it must lose a whole model word, never half of one.
    const long = (max: number) => packSlug(pack("Abcdefghij Klmnopqrst", "Uvwxyzabc Defghijkl Mnopqrstu 1300 4S"), max);
    const base = long(60);
    expect(base).toBe("abcdefghij-klmnopqrst-uvwxyzabc-defghijkl-mnopqrstu-1300-4s");
    const taken = new Set([base]);
    const second = freeSlugFrom(long, taken);
    expect(second).toBe("abcdefghij-klmnopqrst-uvwxyzabc-defghijkl-4s-1300mah-2");
    expect(second.length).toBeLessThanOrEqual(60);
    taken.add(second);
    expect(freeSlugFrom(long, taken)).toBe("abcdefghij-klmnopqrst-uvwxyzabc-defghijkl-4s-1300mah-3");
  });

  it("makes maker slugs within 60 characters", () => {
    expect(makerSlug("Kestrelmoor Cells")).toBe("kestrelmoor-cells");
    expect(makerSlug("x".repeat(100)).length).toBe(60);
  });
});
