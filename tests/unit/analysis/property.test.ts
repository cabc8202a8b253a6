import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { type Analysis, type ColumnMapping, LogError, analyseLog } from "@/lib/analysis";
import { type CsvColumn, type CsvDialect, generateLog, toCsv } from "../../helpers/ecm";

// Property: for any log, however mangled, the reader returns figures in which every number is
// finite (or null), or throws a LogError with a message — never anything else.

const dialectArb: fc.Arbitrary<CsvDialect> = fc.record({
  delimiter: fc.constantFrom(",", ";", "\t"),
  decimalComma: fc.boolean(),
  timeUnit: fc.constantFrom("s", "ms", "min"),
  voltageUnit: fc.constantFrom("V", "mV"),
  currentUnit: fc.constantFrom("A", "mA"),
  dischargeNegative: fc.boolean(),
  bom: fc.boolean(),
  crlf: fc.boolean(),
  header: fc.constantFrom(true, true, true, true, false),
  headerStyle: fc.constantFrom("parens", "brackets", "snake", "slash"),
  // Mostly the columns a log needs, sometimes not (then the reader must say so).
  columns: fc.oneof(
    {
      weight: 4,
      arbitrary: fc
        .shuffledSubarray(["temperature", "cells", "extra"] as const)
        .chain((extra) =>
          fc.shuffledSubarray(["time", "voltage", "current", ...extra] as CsvColumn[], { minLength: 3 + extra.length }),
        )
        .map((c) => [...c]),
    },
    {
      weight: 1,
      arbitrary: fc
        .shuffledSubarray(["time", "voltage", "current", "temperature", "cells", "extra"] as CsvColumn[], {
          minLength: 1,
        })
        .map((c) => [...c]),
    },
  ),
});

/** For a header-less log, the mapping a caller would pass (column numbers and units). */
function mappingFor(d: CsvDialect, cells: number): ColumnMapping | undefined {
  if (d.header !== false) return undefined;
  const at: Record<string, number> = {};
  let k = 0;
  for (const c of d.columns ?? []) {
    at[c] = k;
    k += c === "cells" ? cells : c === "extra" ? 3 : 1;
  }
  return {
    time: at.time,
    voltage: at.voltage,
    current: at.current,
    temperature: at.temperature,
    hasHeader: false,
    timeUnit: d.timeUnit,
    voltageUnit: d.voltageUnit,
    currentUnit: d.currentUnit,
  };
}

// A small pool of realistic logs (circuit-generated), each a few dozen samples.
const pool = [1, 2, 3, 4].map(
  (seed) =>
    generateLog({
      seed,
      cells: seed,
      capacityMah: 60,
      cRate: 10 + seed * 5,
      sampleIntervalS: 4,
      initialRestS: 8,
      finalRestS: 8,
      iecPrelude: seed % 2 === 0,
      noise: { voltageV: 0.003, currentA: 0.002 },
    }).rows,
);

const randomRowsArb = fc.array(
  fc.record({
    timeS: fc.oneof(fc.double({ min: -10, max: 1e5, noNaN: true }), fc.constant(0)),
    voltageV: fc.oneof(fc.double({ min: -5, max: 60, noNaN: true }), fc.constantFrom(4.2, 16.8, 0)),
    currentA: fc.oneof(fc.double({ min: -200, max: 200, noNaN: true }), fc.constantFrom(0, 0.019, -0.021, 5)),
    temperatureC: fc.double({ min: -50, max: 150, noNaN: true }),
    cellVoltagesV: fc.array(fc.double({ min: 0, max: 5, noNaN: true }), { minLength: 2, maxLength: 2 }),
  }),
  { minLength: 0, maxLength: 30 },
);

type Mutation = {
  kind: "delete" | "insert" | "replace" | "dupLine" | "dropLine" | "truncate" | "swapLines";
  at: number;
  text: string;
};
const mutationArb: fc.Arbitrary<Mutation> = fc.record({
  kind: fc.constantFrom("delete", "insert", "replace", "dupLine", "dropLine", "truncate", "swapLines"),
  at: fc.nat(),
  text: fc.oneof(
    fc.string({ maxLength: 4 }),
    fc.constantFrom(
      ",",
      ";",
      "\t",
      "\n",
      "\r\n",
      '"',
      "-",
      ".",
      "e",
      "1e308",
      "NaN",
      "Infinity",
      "°",
      "\uFEFF",
      "\u0000",
    ),
  ),
});

function mutate(text: string, mutations: Mutation[]): string {
  let out = text;
  for (const m of mutations) {
    const at = out.length === 0 ? 0 : m.at % out.length;
    const lines = out.split("\n");
    const li = lines.length === 0 ? 0 : m.at % lines.length;
    switch (m.kind) {
      case "delete":
        out = out.slice(0, at) + out.slice(at + 1 + (m.at % 5));
        break;
      case "insert":
        out = out.slice(0, at) + m.text + out.slice(at);
        break;
      case "replace":
        out = out.slice(0, at) + m.text + out.slice(at + m.text.length);
        break;
      case "dupLine":
        lines.splice(li, 0, lines[li] ?? "");
        out = lines.join("\n");
        break;
      case "dropLine":
        lines.splice(li, 1);
        out = lines.join("\n");
        break;
      case "truncate":
        out = out.slice(0, at);
        break;
      case "swapLines": {
        const j = (li + 1) % lines.length;
        const a = lines[li] ?? "";
        lines[li] = lines[j] ?? "";
        lines[j] = a;
        out = lines.join("\n");
        break;
      }
    }
  }
  return out;
}

/** Plain checks, one expect at the end: expect() per value would dominate the run time. */
function checkFinite(a: Analysis): void {
  const bad: string[] = [];
  // Every number anywhere in the figures (discharges, assumptions, retention included) is finite.
  const visit = (key: string, value: unknown): void => {
    if (typeof value === "number") {
      if (!Number.isFinite(value)) bad.push(`${key} = ${value}`);
    } else if (Array.isArray(value)) value.forEach((v, k) => visit(`${key}[${k}]`, v));
    else if (value !== null && typeof value === "object")
      for (const [k, v] of Object.entries(value)) visit(`${key}.${k}`, v);
    else if (value !== null && typeof value !== "string" && typeof value !== "boolean") bad.push(key);
  };
  visit("figures", a.figures);
  if (!a.figures.warnings.every((w) => typeof w === "string")) bad.push("warnings");
  for (const p of a.curve) {
    if (![p.timeS, p.voltageV, p.currentA, p.capacityMah].every(Number.isFinite))
      bad.push(`curve point ${JSON.stringify(p)}`);
    if (p.temperatureC !== null && !Number.isFinite(p.temperatureC)) bad.push("curve temperature");
  }
  if (a.curve.length > 400) bad.push(`curve has ${a.curve.length} points`);
  expect(bad).toEqual([]);
}

const outcomes = new Map<string, number>();
const count = (key: string) => outcomes.set(key, (outcomes.get(key) ?? 0) + 1);

async function property(
  text: string,
  chunkSize: number,
  asBytes: boolean,
  mapping: ColumnMapping | undefined,
): Promise<void> {
  const bytes = asBytes ? new TextEncoder().encode(text) : null;
  const chunks: (string | Uint8Array)[] = [];
  const whole = bytes ?? text;
  for (let k = 0; k < whole.length; k += chunkSize) chunks.push(whole.slice(k, k + chunkSize));
  try {
    checkFinite(await analyseLog(chunks, { maxBytes: 1_000_000, mapping }));
    count("figures");
  } catch (error) {
    if (!(error instanceof LogError)) throw error;
    count(error.code);
    expect(error.code).not.toBe("internal");
    expect(error.message.length).toBeGreaterThan(10);
    if (error.line !== undefined) expect(Number.isInteger(error.line) && error.line >= 1).toBe(true);
  }
}

describe("property: 10,000 generated and mutated logs give figures or a LogError, never NaN/Infinity or another error", () => {
  it("holds for mutated circuit logs and random logs in random dialects", async () => {
    let figures = 0;
    await fc.assert(
      fc.asyncProperty(
        fc.oneof(
          fc.nat({ max: pool.length - 1 }).map((k) => pool[k] ?? []),
          randomRowsArb,
        ),
        dialectArb,
        fc.array(mutationArb, { maxLength: 4 }),
        fc.integer({ min: 1, max: 4096 }),
        fc.boolean(),
        async (rows, dialect, mutations, chunkSize, asBytes) => {
          const text = mutate(toCsv(rows, dialect), mutations);
          await property(text, chunkSize, asBytes, mappingFor(dialect, rows[0]?.cellVoltagesV.length ?? 0));
          figures++;
        },
      ),
      { numRuns: 10_000, seed: 20240611 },
    );
    expect(figures).toBe(10_000);
    // Not a vacuous pass: a good share of the mangled logs still yields figures.
    console.log("property outcomes:", Object.fromEntries([...outcomes].sort((a, b) => b[1] - a[1])));
    expect(outcomes.get("figures") ?? 0).toBeGreaterThan(2000);
  });
});
