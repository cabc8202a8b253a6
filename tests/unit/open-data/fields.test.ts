// The one field list (lib/open-data/fields.ts, result-fields.ts) drives the API records, the CSV columns, the Data
// Package's Table Schemas and the OpenAPI schemas; every number leaves rounded to its field's digits.
import { U95_FIGURES, type FigureU95 } from "@/lib/figure-u95";
import { describe, expect, it } from "vitest";
import { makerRecord, packRecord, resultRecord } from "@/lib/api-contract/records";
import { dataPackageDescriptor } from "@/lib/open-data/datapackage";
import { fieldValue, roundTo, type Field } from "@/lib/open-data/field-kit";
import { makerFields, packFields } from "@/lib/open-data/fields";
import { DATA_LICENCE_SPDX, licenceInfo } from "@/lib/open-data/licence";
import { nestedRecord } from "@/lib/open-data/records";
import { resultFields } from "@/lib/open-data/result-fields";
import { analyseOptionsFor, recomputeCommand } from "@/lib/open-data/recompute";
import { execFileSync } from "node:child_process";

const LISTS = { makers: makerFields, packs: packFields, results: resultFields } as Record<string, Field<never>[]>;

describe("rounding to a field's digits", () => {
  it("rounds half away from zero, without float noise and without a negative zero", () => {
    expect(roundTo(89.32431030273438, 3)).toBe(89.324);
    expect(roundTo(3.2999999523162842, 2)).toBe(3.3); // 3.3 stored as a PostgreSQL real (float4)
    expect(roundTo(1249.5, 0)).toBe(1250);
    expect(roundTo(-1249.5, 0)).toBe(-1250);
    expect(roundTo(-0.0004, 3)).toBe(0);
    expect(Object.is(roundTo(-0.0004, 3), -0)).toBe(false);
    expect(String(roundTo(0.1 + 0.2, 3))).toBe("0.3");
  });

  it("gives every number field its digits, and leaves missing or non-finite values empty", () => {
    for (const [name, fields] of Object.entries(LISTS))
      for (const f of fields.filter((x) => x.type === "number")) expect(f.digits, `${name}.${f.name}`).toBeDefined();
    const f = { name: "x", type: "number" as const, description: "", digits: 1, value: (r: { x: number }) => r.x };
    expect(fieldValue(f, { x: Number.NaN })).toBeNull();
    expect(fieldValue(f, { x: 12.34 })).toBe(12.3);
  });

  it("nests a result's fields by section, with the same rounded values as its CSV row", () => {
    const row = {
      id: 7,
      packId: 3,
      packSlug: "p",
      makerSlug: "m",
      groupKey: "dc-step_a15-25_co3.3_r5-10_new",
      testedOn: null,
      publishedAt: "2026-11-01T00:00:00Z",
      notes: null,
      methodCard: {
        ambientTemperatureC: 21.999999,
        packStartTemperatureC: null,
        loadMode: "constant-current" as const,
        loadCurrentA: 13.000001,
        loadRateC: 10.00000238,
        cutoffVPerCell: 3.2999999523162842,
        stopTemperatureC: 60,
        resistanceMethod: "dc-step" as const,
        equipment: "Load",
        sampleRateHz: 1,
        cyclesBeforeTest: 2,
      },
      figures: { capacityMah: 1250.4321, sagLimitedC: 41.26, labelRatio: 0.41263 } as never,
      u95: {
        ...Object.fromEntries(U95_FIGURES.map((n) => [n, null])),
        capacityMah: 29.87,
        labelRatio: 0.04399,
      } as FigureU95,
    };
    const rec = nestedRecord(resultFields, row);
    expect(rec.methodCard).toMatchObject({ ambientTemperatureC: 22, loadCurrentA: 13, cutoffVPerCell: 3.3 });
    expect(rec.figures).toMatchObject({ capacityMah: 1250, sagLimitedC: 41.3, labelRatio: 0.413, energyWh: null });
    // Each figure's U95 sits beside it, one digit finer than the figure; a missing one is null.
    expect(rec.figures).toMatchObject({ capacityMahU95: 29.9, labelRatioU95: 0.044, energyWhU95: null });
    const names = resultFields.map((f) => f.name);
    expect(names.indexOf("capacityMahU95")).toBe(names.indexOf("capacityMah") + 1);
    expect(U95_FIGURES.every((n) => names.includes(`${n}U95`))).toBe(true);
    expect(resultRecord.safeParse(rec).success).toBe(true);
  });
});

describe("one field list for every output", () => {
  const desc = dataPackageDescriptor("https://sagline.example", new Date("2026-11-01T00:00:00Z"));

  it("names the same fields, in the same order, in the Table Schemas and the zod records", () => {
    for (const r of desc.resources) {
      const fields = LISTS[r.name] ?? [];
      expect(r.schema.fields.map((f) => f.name)).toEqual(fields.map((f) => f.name));
    }
    expect(Object.keys(makerRecord.shape)).toEqual(makerFields.map((f) => f.name));
    expect(Object.keys(packRecord.shape)).toEqual(packFields.map((f) => f.name));
    const nested = [
      ...Object.keys(resultRecord.shape).filter((k) => k !== "methodCard" && k !== "figures"),
      ...Object.keys(resultRecord.shape.methodCard.shape),
      ...Object.keys(resultRecord.shape.figures.shape),
    ].sort();
    expect(nested).toEqual(resultFields.map((f) => f.name).sort());
  });

  it("states the digits in every published description and uses one licence identifier", () => {
    const capacity = desc.resources
      .find((r) => r.name === "results")
      ?.schema.fields.find((f) => f.name === "capacityMah");
    expect(capacity?.description).toMatch(/mAh.*Rounded to 0 decimal places\./);
    expect(desc.licenses).toEqual([expect.objectContaining({ name: DATA_LICENCE_SPDX })]);
    expect(licenceInfo).toMatchObject({ identifier: "CC-BY-4.0", name: "CC BY 4.0" });
    for (const r of desc.resources) expect(r.licenses[0]?.name).toBe(DATA_LICENCE_SPDX);
  });
});

describe("the recompute command", () => {
  const facts = {
    cells: 4,
    ratedMah: 1300,
    labelledC: 75,
    weightG: null,
    cutoffVPerCell: 3.3,
    stopTemperatureC: 60,
    packStartTemperatureC: 22.5,
  };
  it("passes the CLI every option the server analysed the log with, and nothing it did not", () => {
    expect(analyseOptionsFor(facts)).toEqual({
      cells: 4,
      ratedMah: 1300,
      labelledC: 75,
      cutoffVPerCell: 3.3,
      stopTemperatureC: 60,
      packStartTemperatureC: 22.5,
    });
    expect(recomputeCommand("log.csv", facts)).toBe(
      "npm run analyse -- log.csv --cells 4 --rated-mah 1300 --labelled-c 75 --cutoff-v 3.3 --stop-temp-c 60 --pack-start-temp-c 22.5",
    );
  });
  it("passes a log's column mapping as --map-json, quoted so a POSIX shell (/bin/sh) hands the CLI the JSON back", () => {
    const mapping = { time: "Zeit (s)", voltage: "Tom's V", current: 3, hasHeader: true };
    const command = recomputeCommand("log.csv", { ...facts, mapping });
    expect(analyseOptionsFor({ ...facts, mapping }).mapping).toEqual(mapping);
    const quoted = command.split(" --map-json ")[1] ?? "";
    expect(quoted.startsWith("'")).toBe(true);
    const echoed = execFileSync("/bin/sh", ["-c", `printf %s ${quoted}`], { encoding: "utf8" });
    expect(JSON.parse(echoed)).toEqual(mapping);
    expect(recomputeCommand("log.csv", { ...facts, mapping: null })).not.toContain("--map-json");
  });
});
