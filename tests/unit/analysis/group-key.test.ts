import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  NO_DC_RESISTANCE_KEY,
  ageBand,
  ambientBand,
  cutoffBand,
  groupKey,
  groupKeyForAnalysis,
  labelForGroupKey,
  rateBand,
  resistanceBand,
} from "@/lib/analysis/group-key";

// Band edges are Sagline's own rules, published in content/methods/figures.md and content/methods/like-for-like.md.
describe("like-for-like group key", () => {
  it("builds the documented key and label", () => {
    const g = groupKey({
      resistanceMethod: "dc-step",
      ambientC: 21,
      cutoffVPerCell: 3.3,
      loadCurrentA: 75,
      ratedMah: 5000,
      cyclesBeforeTest: 2,
    });
    expect(g.key).toBe("dc-step_a15-25_co3.3_r10-20_new");
    expect(g.label).toBe("DC step · 15–25 °C · 3.3 V cut-off · 10–20C · new");
    expect(g.parts).toEqual({ resistance: "dc-step", ambient: "a15-25", cutoff: "co3.3", rate: "r10-20", age: "new" });
  });

  it("keys are URL-safe", () => {
    for (const method of ["iec-61960-two-level", "dc-step", "ac-1khz", "charger-readout", "Home made / 4-wire?"]) {
      for (const ambientC of [-5, 15, 24.9, 25, 35, 50]) {
        const { key } = groupKey({
          resistanceMethod: method,
          ambientC,
          cutoffVPerCell: 3.05,
          loadCurrentA: 3,
          ratedMah: 1300,
          cyclesBeforeTest: 300,
        });
        expect(encodeURIComponent(key)).toBe(key);
      }
    }
  });

  it("ambient bands are [lower, upper): 25 °C is in 25–35", () => {
    expect(ambientBand(14.9).key).toBe("alt15");
    expect(ambientBand(15).key).toBe("a15-25");
    expect(ambientBand(25).key).toBe("a25-35");
    expect(ambientBand(35).key).toBe("agt35");
  });

  it("cut-off is rounded to 0.1 V", () => {
    expect(cutoffBand(3.25).key).toBe("co3.3");
    expect(cutoffBand(3.0).key).toBe("co3.0");
    expect(cutoffBand(3.449).key).toBe("co3.4");
  });

  it("rate bands are (lower, upper] in C from load current ÷ rated Ah: 10C exactly is in 5–10", () => {
    expect(rateBand(50, 5000).key).toBe("r5-10");
    expect(rateBand(10, 5000).key).toBe("r0-2");
    expect(rateBand(10.1, 5000).key).toBe("r2-5");
    expect(rateBand(10.01, 5000).key).toBe("r0-2"); // 2.002C rounds to 2.00C
    expect(rateBand(33 * 1.3, 1300).key).toBe("r20-40");
    expect(rateBand(300, 5000).key).toBe("r40-up");
    expect(rateBand(0, 5000).key).toBe("r-unknown");
  });

  it("rate bands survive floating-point noise (0.3 × 3 A is 0.9 A, not 0.8999…)", () => {
    expect(rateBand(0.1 * 3 * 100, 3000).key).toBe("r5-10");
  });

  it("age bands: 0–4 new, 5–49, 50–199, 200+", () => {
    expect(ageBand(0).key).toBe("new");
    expect(ageBand(4).key).toBe("new");
    expect(ageBand(5).key).toBe("c5-49");
    expect(ageBand(199).key).toBe("c50-199");
    expect(ageBand(200).key).toBe("c200-up");
  });

  it("names unknown resistance methods without breaking the key", () => {
    expect(resistanceBand("ac-1khz").label).toBe("AC 1 kHz");
    expect(resistanceBand("My Meter!").key).toBe("other-my-meter");
  });
});

describe("labelForGroupKey", () => {
  it("reads back the label of a known key", () => {
    const g = groupKey({
      resistanceMethod: "dc-step",
      ambientC: 22,
      cutoffVPerCell: 3.3,
      loadCurrentA: 13,
      ratedMah: 1300,
      cyclesBeforeTest: 0,
    });
    expect(g.key).toBe("dc-step_a15-25_co3.3_r5-10_new");
    expect(labelForGroupKey(g.key)).toBe("DC step · 15–25 °C · 3.3 V cut-off · 5–10C · new");
  });

  it("gives the same label as groupKey for any method card (property, 2,000 cards)", () => {
    const method = fc.constantFrom(
      "dc-step",
      "iec-61960-two-level",
      "ac-1khz",
      "charger-readout",
      "Home-made Shunt 2",
      "",
      "??",
    );
    const num = (min: number, max: number) => fc.oneof(fc.double({ min, max, noNaN: true }), fc.constant(Number.NaN));
    fc.assert(
      fc.property(
        method,
        num(-30, 80),
        num(2, 4.3),
        num(0.1, 400),
        fc.double({ min: 100, max: 30_000, noNaN: true }),
        num(0, 2000),
        (m, a, co, i, mah, cyc) => {
          const g = groupKey({
            resistanceMethod: m,
            ambientC: a,
            cutoffVPerCell: co,
            loadCurrentA: i,
            ratedMah: mah,
            cyclesBeforeTest: cyc,
          });
          // A method outside the list keeps only its slug in the key, so its label reads back as the slug in words.
          const expected = g.key.startsWith("other-") || g.key.startsWith("unknown") ? null : g.label;
          if (expected !== null) expect(labelForGroupKey(g.key)).toBe(expected);
          else expect(labelForGroupKey(g.key)).toMatch(/ · /);
        },
      ),
      { numRuns: 2000 },
    );
  });

  it("refuses strings that are not keys", () => {
    for (const bad of [
      "",
      "dc-step",
      "dc-step_a15-25_co3.3_r5-10",
      "dc-step_a15-26_co3.3_r5-10_new",
      "dc-step_a15-25_co3.33_r5-10_new",
      "dc-step_a15-25_co3.3_r5-9_new",
      "dc-step_a15-25_co3.3_r5-10_old",
      "x_y_z_w_v",
    ]) {
      expect(labelForGroupKey(bad), bad).toBeNull();
    }
  });
});

describe("group key from what the log shows (the analysis's resistance method, not the card's)", () => {
  const card = { ambientC: 22, cutoffVPerCell: 3.3, loadCurrentA: 13, ratedMah: 1300, cyclesBeforeTest: 0 };

  it("a card that says 'charger read-out' but whose log gave a step resistance is grouped as DC step", () => {
    const typed = groupKey({ ...card, resistanceMethod: "charger-readout" });
    const shown = groupKeyForAnalysis("step", card);
    expect(typed.parts.resistance).toBe("charger-readout");
    expect(shown.key).toBe("dc-step_a15-25_co3.3_r5-10_new");
    expect(groupKeyForAnalysis("iec-61960-two-level", card).parts.resistance).toBe("iec-61960-two-level");
  });

  it("a log with no DC resistance gets its own readable part", () => {
    const g = groupKeyForAnalysis(null, card);
    expect(g.key).toBe(`${NO_DC_RESISTANCE_KEY}_a15-25_co3.3_r5-10_new`);
    expect(labelForGroupKey(g.key)).toBe("no DC resistance in the log · 15–25 °C · 3.3 V cut-off · 5–10C · new");
    // A typed method that happens to be spelt like it stays an "other" method.
    expect(groupKey({ ...card, resistanceMethod: "dc-none" }).parts.resistance).toBe("other-dc-none");
  });

  it("labelForGroupKey reads back every analysed key (property, 1,000 cards)", () => {
    const num = (min: number, max: number) => fc.oneof(fc.double({ min, max, noNaN: true }), fc.constant(Number.NaN));
    fc.assert(
      fc.property(
        fc.constantFrom("iec-61960-two-level" as const, "step" as const, null),
        num(-30, 80),
        num(2, 4.3),
        num(0.1, 400),
        fc.double({ min: 100, max: 30_000, noNaN: true }),
        num(0, 2000),
        (m, a, co, i, mah, cyc) => {
          const g = groupKeyForAnalysis(m, {
            ambientC: a,
            cutoffVPerCell: co,
            loadCurrentA: i,
            ratedMah: mah,
            cyclesBeforeTest: cyc,
          });
          expect(labelForGroupKey(g.key)).toBe(g.label);
        },
      ),
      { numRuns: 1000 },
    );
  });
});
