import { describe, expect, it } from "vitest";
import { type SampleRow, planColumns } from "@/lib/analysis/columns";
import { LogError } from "@/lib/analysis/errors";

function rows(lines: string[], delimiter = ","): SampleRow[] {
  return lines.map((l, k) => ({ fields: l.split(delimiter), line: k + 1 }));
}

describe("finding the columns", () => {
  it("maps a plain header in any order, ignoring extra columns", () => {
    const plan = planColumns(
      rows([
        "Mode,Current (mA),Capacity (mAh),Voltage (V),Time (ms),Temp (°C)",
        "DCHG,10000,1.2,16.5,1000,25",
        "DCHG,10000,2.4,16.4,2000,25.1",
      ]),
      false,
    );
    expect(plan).toMatchObject({ headerLine: 1, time: 4, voltage: 3, current: 1, temperature: 5, cells: [] });
    expect(plan.timeUnit.symbol).toBe("ms");
    expect(plan.currentUnit.symbol).toBe("mA");
    expect(plan.width).toBe(5);
  });

  it("finds per-cell columns in cell order and works without a pack voltage column", () => {
    const plan = planColumns(rows(["t (s),I (A),Cell 2 (V),Cell 1 (V)", "0,0,4.2,4.2", "1,10,4.1,4.1"]), false);
    expect(plan.cells).toEqual([3, 2]);
    expect(plan.voltage).toBeNull();
  });

  it("skips preamble lines above the header", () => {
    const plan = planColumns(
      rows(["Logger export", "Pack: test 4S", "Time (s),Voltage (V),Current (A)", "0,16.8,0", "1,16.5,10"]),
      false,
    );
    expect(plan.headerLine).toBe(3);
  });

  it("skips a non-numeric candidate (a date-time stamp) for the next time column", () => {
    const plan = planColumns(
      rows(["Timestamp,Time (s),Voltage (V),Current (A)", "2024-01-01 10:00,0,16.8,0", "2024-01-01 10:01,1,16.5,10"]),
      false,
    );
    expect(plan.time).toBe(1);
  });

  it("takes an explicit mapping by name or number, with units", () => {
    const byName = planColumns(rows(["a,b,c", "0,16800,0", "1,16500,10"]), false, {
      time: "a",
      voltage: "b",
      current: "c",
      voltageUnit: "mV",
    });
    expect(byName).toMatchObject({ time: 0, voltage: 1, current: 2 });
    expect(byName.voltageUnit.symbol).toBe("mV");
    const byNumber = planColumns(rows(["No,1.0,x,-30.6,4.1", "No,2.0,x,-30.6,4.0"]), false, {
      time: 1,
      current: 3,
      voltage: 4,
      hasHeader: false,
    });
    expect(byNumber).toMatchObject({ headerLine: 0, time: 1, current: 3, voltage: 4 });
  });

  it("names the header it saw and how to map it when columns cannot be identified", () => {
    try {
      planColumns(rows(["foo,bar,baz", "0,16.8,0", "1,16.5,10"]), false);
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(LogError);
      const e = error as LogError;
      expect(e.code).toBe("columns-not-found");
      expect(e.line).toBe(1);
      expect(e.message).toContain('"foo", "bar", "baz"');
      expect(e.message).toContain("column mapping");
      expect(e.message).toContain('time: "foo"');
    }
  });

  it("says how to map a log that has no header row", () => {
    expect(() => planColumns(rows(["0,16.8,0", "1,16.5,10"]), false)).toThrowError(/hasHeader: false/);
  });

  it("rejects a mapping that names a column the header does not have", () => {
    expect(() =>
      planColumns(rows(["Time (s),Voltage (V),Current (A)", "0,16.8,0"]), false, { voltage: "Volts" }),
    ).toThrowError(/"Volts", which is not in the header/);
    expect(() =>
      planColumns(rows(["0,16.8,0"]), false, { time: "t", voltage: 1, current: 2, hasHeader: false }),
    ).toThrowError(LogError);
  });
});
