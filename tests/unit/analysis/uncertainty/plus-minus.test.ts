import { describe, expect, it } from "vitest";
import { formatPlusMinus, uncertaintyDecimals } from "@/lib/analysis/uncertainty/plus-minus";

// JCGM 100:2008 7.2.6: U with at most two significant digits, the value rounded to match. One or two digits by the
// Particle Data Group's rule (Review of Particle Physics, Introduction; from memory): leading three digits of U
// 100–354 → two digits, 355–949 → one, 950–999 → round up to 1000 and keep two.
describe("formatPlusMinus", () => {
  it.each([
    [19.31, 0.6, "mΩ", "19.3 ± 0.6 mΩ"], // 600 → one digit (the issue's own example)
    [19.31, 0.25, "mΩ", "19.31 ± 0.25 mΩ"], // 250 → two digits
    [19.31, 0.354, "", "19.31 ± 0.35"], // 354: last of the two-digit band
    [19.31, 0.355, "", "19.3 ± 0.4"], // 355: first of the one-digit band
    [19.31, 0.97, "", "19.3 ± 1.0"], // 970 → 1000, two digits
    [4833.3, 115.1, "mAh", "4830 ± 120 mAh"], // 115 → two digits, rounded to tens
    [4833.3, 57.5, "mAh", "4830 ± 60 mAh"], // 575 → one digit, rounded to tens
  ])("%f ± %f", (value, U, unit, text) => {
    expect(formatPlusMinus(value, U, unit)?.text).toBe(text);
  });

  it("rounds at decades above 1 and handles leading digits a hair off an integer logarithm", () => {
    expect(uncertaintyDecimals(1234)).toBe(-2);
    expect(formatPlusMinus(52_345, 1234)?.text).toBe("52300 ± 1200");
    expect(uncertaintyDecimals(0.001)).toBe(4); // 100 → two digits: 0.0010
    expect(formatPlusMinus(3.91234, 0.001)?.text).toBe("3.9123 ± 0.0010");
    expect(formatPlusMinus(3.91234, 0.09996)?.text).toBe("3.91 ± 0.10");
  });

  it("no ± for a missing or zero uncertainty", () => {
    expect(formatPlusMinus(1, 0)).toBeNull();
    expect(formatPlusMinus(Number.NaN, 1)).toBeNull();
  });
});
