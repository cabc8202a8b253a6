import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { lookUpUnit, parseClock, parseField } from "@/lib/analysis/units";

describe("reading numbers from log fields", () => {
  it("the fast path gives exactly the double that Number() gives (ECMAScript's correctly rounded conversion is the reference)", () => {
    fc.assert(
      fc.property(
        fc.integer({ min: -999_999_999, max: 999_999_999 }),
        fc.integer({ min: 0, max: 6 }),
        (mantissa, decimals) => {
          const digits = Math.abs(mantissa)
            .toString()
            .padStart(decimals + 1, "0");
          const text = `${mantissa < 0 ? "-" : ""}${digits.slice(0, digits.length - decimals)}${decimals > 0 ? `.${digits.slice(-decimals)}` : ""}`;
          expect(parseField(text, false)).toBe(Number(text));
          expect(parseField(text.replace(".", ","), true)).toBe(Number(text));
        },
      ),
      { numRuns: 20_000 },
    );
  });

  it("agrees with Number() on doubles printed by JavaScript itself", () => {
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), (x) => {
        const text = String(x);
        expect(parseField(text, false)).toBe(Number(text));
      }),
      { numRuns: 5000 },
    );
  });

  it.each([
    ["12.5", false, 12.5],
    ["12,5", true, 12.5],
    ["-0.25", false, -0.25],
    ["+3", false, 3],
    [" 4.2 ", false, 4.2],
    ['"4,2"', true, 4.2],
    ["1e3", false, 1000],
    ["12.", false, 12],
    [".5", false, 0.5],
  ])("%j (decimal comma: %s) reads as %f", (text, decimalComma, expected) => {
    expect(parseField(text, decimalComma)).toBe(expected);
  });

  it.each(["", " ", "-", ".", "abc", "1.2.3", "Infinity", "NaN", "12,5", "1 2"])(
    "%j is not a number in a decimal-point log",
    (text) => {
      expect(parseField(text, false)).toBeNaN();
    },
  );

  it("reads clock times hh:mm:ss(.s) as seconds", () => {
    expect(parseField("01:02:03.5", false)).toBe(3723.5);
    expect(parseClock("02:30")).toBe(150);
    expect(parseClock("1:2:3:4")).toBeNaN();
  });

  it("knows the unit spellings testers use", () => {
    expect(lookUpUnit("mV")?.scale).toBe(0.001);
    expect(lookUpUnit("ms")?.scale).toBe(0.001);
    expect(lookUpUnit("min")?.scale).toBe(60);
    expect(lookUpUnit("mA")?.dimension).toBe("current");
    expect(lookUpUnit("°C")?.dimension).toBe("temperature");
    expect(lookUpUnit("mAh")).toBeNull();
  });

  it("converts °F and K to °C (exact SI definitions)", () => {
    const f = lookUpUnit("°F");
    const k = lookUpUnit("K");
    expect((f?.scale ?? 0) * 212 + (f?.offset ?? 0)).toBeCloseTo(100, 12);
    expect((k?.scale ?? 0) * 273.15 + (k?.offset ?? 0)).toBeCloseTo(0, 12);
  });
});
