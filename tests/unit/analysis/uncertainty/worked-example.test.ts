import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { scoreParticipants } from "@/lib/analysis/agreement/scores";
import {
  ACCURACY_CLASSES,
  capacityUncertainty,
  compareMedianIntervals,
  currentChannel,
  dcResistanceUncertainty,
  energyUncertainty,
  formatPlusMinus,
  labelRatioUncertainty,
  meanVoltageUncertainty,
  medianInterval,
  resistanceAt25CUncertainty,
  resolveAccuracy,
  sagLimitedCUncertainty,
  temperatureChannel,
  voltageChannel,
  type FigureUncertainty,
} from "@/lib/analysis/uncertainty";

// The method page's worked example (content/methods/uncertainty.md) must be what the functions produce: every
// number quoted there is recomputed here and looked up in the page's text.
const raw = fs.readFileSync(path.join(process.cwd(), "content/methods/uncertainty.md"), "utf8");
const doc = raw.replace(/\s+/g, " "); // line breaks in the Markdown do not matter

function pm(m: FigureUncertainty | null, unit = ""): string {
  if (!m) throw new Error("no uncertainty");
  const t = formatPlusMinus(m.value, m.U95, unit);
  if (!t) throw new Error("no ± text");
  return t.text;
}

describe("content/methods/uncertainty.md worked example", () => {
  it("starts with a heading whose anchor is #uncertainty", () => {
    expect(raw.split("\n")[0]).toBe("## Uncertainty {#uncertainty}");
  });

  it("an invented 4S 5,000 mAh pack at 50 A on a bench that states nothing (hobby read-out assumed)", () => {
    const { accuracy: a, assumptions } = resolveAccuracy(null);
    expect(assumptions).toHaveLength(11);
    const v = voltageChannel(a.voltage);
    const i = currentChannel(a.current);
    const durationS = (4712 * 3.6) / 50;
    const samples = Math.round(durationS);
    const d = { meanCurrentA: 50, durationS, samples, samplingIntervalS: 1 };
    const r = dcResistanceUncertainty({ resistanceMohm: 19.3, currentStepA: 50, samplingIntervalS: 1 }, v, i);
    if (!r) throw new Error("no resistance");
    const sag = sagLimitedCUncertainty({
      resistance: r,
      cells: 4,
      ratedMah: 5000,
      nominalVPerCell: 3.7,
      floorVPerCell: 3.3,
    });
    if (!sag) throw new Error("no sag-limited C");
    const quoted = [
      pm(capacityUncertainty(4712, d, i), "mAh"),
      pm(energyUncertainty(4.712 * 14.62, 14.62, d, v, i), "Wh"),
      pm(
        meanVoltageUncertainty(14.62, samples, v, {
          samplingIntervalS: 1,
          durationS,
          startVoltageV: 15.6,
          endVoltageV: 14,
        }),
        "V",
      ),
      pm(r, "mΩ"),
      pm(
        resistanceAt25CUncertainty({
          resistance: r,
          temperatureC: 22,
          temperature: temperatureChannel(a.temperature),
          activationEnergyKJPerMol: 17.1,
        }),
        "mΩ",
      ),
      pm(sag, "C"),
      pm(labelRatioUncertainty(sag, 25)),
    ];
    expect(quoted).toEqual([
      "4710 ± 110 mAh",
      "68.9 ± 1.7 Wh",
      "14.62 ± 0.09 V",
      "19.3 ± 0.7 mΩ",
      "18.0 ± 1.3 mΩ",
      "16.6 ± 0.6 C",
      "0.663 ± 0.025",
    ]);
    for (const text of quoted) expect(doc).toContain(text);
  });

  it("the same pack on a bench multimeter-class logger", () => {
    const b = ACCURACY_CLASSES["bench-meter-logger"].accuracy;
    const durationS = (4712 * 3.6) / 50;
    const d = { meanCurrentA: 50, durationS, samples: Math.round(durationS / 0.5), samplingIntervalS: 0.5 };
    const cap = pm(capacityUncertainty(4712, d, currentChannel(b.current)), "mAh");
    const r = pm(
      dcResistanceUncertainty(
        { resistanceMohm: 19.3, currentStepA: 50, samplingIntervalS: 0.5 },
        voltageChannel(b.voltage),
        currentChannel(b.current),
      ),
      "mΩ",
    );
    expect([cap, r]).toEqual(["4712 ± 12 mAh", "19.30 ± 0.28 mΩ"]);
    for (const text of [cap, r]) expect(doc).toContain(text);
  });

  it("median intervals of packs A, B, C", () => {
    const a = medianInterval([4712, 4688, 4745, 4701, 4730, 4695, 4722, 4760]);
    const b = medianInterval([4805, 4790, 4828, 4770, 4812, 4799, 4840]);
    const c = medianInterval([4740, 4702, 4775, 4731, 4758, 4719]);
    expect([a?.median, a?.lower, a?.upper]).toEqual([4717, 4688, 4760]);
    expect([b?.median, b?.lower, b?.upper]).toEqual([4805, 4770, 4840]);
    expect([c?.median, c?.lower, c?.upper]).toEqual([4735.5, 4702, 4775]);
    expect(compareMedianIntervals(b, a).verdict).toBe("higher");
    expect(compareMedianIntervals(c, a).verdict).toBe("not distinguishable");
    for (const text of [
      "median 4717 mAh, interval 4688–4760 mAh",
      "median 4805 mAh, interval 4770–4840 mAh",
      "median 4736 mAh, interval 4702–4775 mAh",
    ]) {
      expect(doc).toContain(text);
    }
    expect(medianInterval([1, 2, 3, 4, 5])?.words).toMatch(/93\.8 %/);
    expect(doc).toContain("5 results: 93.8 %; 3 results: 75 %");
  });

  it("six benches on one pack", () => {
    const r = scoreParticipants([4712, 4690, 4735, 4705, 4720, 4905].map((value, k) => ({ benchId: `b${k}`, value })));
    expect(Math.round(r.consensus?.x ?? 0)).toBe(4722);
    expect(Math.round(r.consensus?.s ?? 0)).toBe(31);
    const zs = r.scores.map((s) => Number((s.z ?? Number.NaN).toFixed(1)));
    expect(zs[5]).toBe(6);
    expect(Math.min(...zs.slice(0, 5))).toBe(-1);
    expect(Math.max(...zs.slice(0, 5))).toBe(0.4);
    expect(doc).toContain(
      "The consensus is 4722 mAh with a spread of 31 mAh; the last bench scores z = 6.0 and is flagged, the others lie between −1.0 and +0.4.",
    );
  });
});
