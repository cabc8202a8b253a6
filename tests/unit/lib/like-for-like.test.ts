import { describe, expect, it } from "vitest";
import {
  describeGroup,
  exclusionText,
  groupDifferences,
  keyWithoutAge,
  summariseExclusions,
} from "@/lib/like-for-like";

const base = {
  resistanceMethod: "dc-step",
  ambientC: 22,
  cutoffVPerCell: 3.3,
  loadCurrentA: 12,
  ratedMah: 1500,
  cyclesBeforeTest: 0,
};

describe("like-for-like differences", () => {
  it("names the part that differs, in the band's words", () => {
    const target = describeGroup(base);
    expect(groupDifferences(target, describeGroup({ ...base, ambientC: 8 }))).toEqual(["ambient below 15 °C"]);
    expect(
      groupDifferences(target, describeGroup({ ...base, resistanceMethod: "charger-readout", cutoffVPerCell: 3.0 })),
    ).toEqual(["resistance by charger read-out", "3.0 V cut-off"]);
    expect(groupDifferences(target, describeGroup({ ...base, cyclesBeforeTest: 60 }))).toEqual([
      "pack age 50–199 cycles",
    ]);
    expect(groupDifferences(target, target)).toEqual([]);
  });

  it("counts hidden results by reason, most first", () => {
    const target = describeGroup(base);
    const cold = describeGroup({ ...base, ambientC: 10 });
    const fast = describeGroup({ ...base, loadCurrentA: 30 });
    const out = summariseExclusions(target, [cold, fast, cold, cold, fast, cold, target]);
    expect(out.map(exclusionText)).toEqual([
      "4 results hidden: ambient below 15 °C",
      "2 results hidden: load rate 10–20C",
    ]);
  });

  it("drops only the age part for cycling series", () => {
    expect(keyWithoutAge(describeGroup(base))).toBe(keyWithoutAge(describeGroup({ ...base, cyclesBeforeTest: 180 })));
    expect(keyWithoutAge(describeGroup(base))).not.toBe(keyWithoutAge(describeGroup({ ...base, ambientC: 30 })));
  });
});
