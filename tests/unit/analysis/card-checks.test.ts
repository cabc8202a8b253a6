import { describe, expect, it } from "vitest";
import { analyseText, checkAgainstCard, toPublicFigures, warningsBesideChecks } from "@/lib/analysis";
import { sampleLog } from "@/tests/helpers/logs";

describe("checks of a log against the method card", () => {
  it("passes a log that matches its card (4S, 13 A, 3.3 V cut-off)", async () => {
    const { figures } = await analyseText(sampleLog().csv, { cells: 4, ratedMah: 1300, cutoffVPerCell: 3.3 });
    expect(
      checkAgainstCard(figures, { packCells: 4, cutoffVPerCell: 3.3, loadCurrentA: 13, stopTemperatureC: 60 }),
    ).toEqual([]);
  });

  it("says when the lowest voltage is above the stated cut-off, and drops the core's shorter warning", async () => {
    const { figures } = await analyseText(sampleLog({ cutoffVPerCell: 3.6 }).csv, { cells: 4, cutoffVPerCell: 3.3 });
    const checks = checkAgainstCard(figures, { packCells: 4, cutoffVPerCell: 3.3 });
    expect(checks.map((c) => c.code)).toEqual(["cutoff-not-reached"]);
    expect(checks[0]?.message).toMatch(
      /lowest voltage \(3\.\d\d V per cell\) is above your stated cut-off of 3\.30 V per cell/,
    );
    expect(figures.warnings.some((w) => w.startsWith("The main discharge never reached the cut-off"))).toBe(true);
    expect(
      warningsBesideChecks(figures.warnings, checks).some((w) => w.startsWith("The main discharge never reached")),
    ).toBe(false);
  });

  it("says when the log looks like 6S but the pack is 4S (cells from the rest voltage, common practice)", async () => {
    const { figures } = await analyseText(sampleLog({ cells: 6 }).csv, { cells: 4 });
    const checks = checkAgainstCard(figures, { packCells: 4, cutoffVPerCell: 3.3 });
    expect(checks.find((c) => c.code === "cells-mismatch")?.message).toMatch(/inferred as 6S .* but the pack is 4S/);
  });

  it("says when the main discharge current is far from the stated load, and when the pack passed its stop temperature", async () => {
    const { figures } = await analyseText(sampleLog().csv, { cells: 4 });
    const checks = checkAgainstCard(figures, {
      packCells: 4,
      cutoffVPerCell: 3.3,
      loadCurrentA: 20,
      loadMode: "constant-current",
      stopTemperatureC: 23,
    });
    expect(checks.map((c) => c.code).sort()).toEqual(["load-mismatch", "stop-temperature-passed"]);
    // Constant power runs do not hold a constant current, so no load check.
    expect(
      checkAgainstCard(figures, { packCells: 4, cutoffVPerCell: 3.3, loadCurrentA: 20, loadMode: "constant-power" }),
    ).toEqual([]);
  });
});

describe("the public JSON shape", () => {
  it("puts every figure at the top level with the parameters used, and copies the warnings", async () => {
    const analysis = await analyseText(sampleLog().csv, { cells: 4, ratedMah: 1300 });
    const out = toPublicFigures(analysis);
    expect(out.capacityMah).toBe(analysis.figures.capacityMah);
    expect(out.parameters.holdDelayS).toBe(10);
    out.warnings.push("x");
    expect(analysis.figures.warnings).not.toContain("x");
    expect(JSON.parse(JSON.stringify(out))).toEqual(out);
  });
});
