// Invented catalogue entries and results for moderation tests (no real brands or people).
import { randomUUID } from "node:crypto";
import { db } from "@/db";
import { makers, packs, results, reviewEvents, type ReviewStatus } from "@/db/schema";
import { sustainedRule, type Figures } from "@/lib/analysis";

function figures(over: Partial<Figures> = {}): Figures {
  return {
    samples: 1000,
    skippedLines: 0,
    durationS: 600,
    cells: 4,
    capacityMah: 1250,
    energyWh: 18.5,
    meanVoltageV: 14.8,
    meanVoltagePerCellV: 3.7,
    minVoltageV: 13.2,
    minVoltagePerCellV: 3.3,
    peakCurrentA: 13,
    startTemperatureC: 22,
    peakTemperatureC: 40,
    temperatureRiseC: 18,
    timeToCutoffS: 590,
    timeToStopTemperatureS: null,
    holdVoltagePerCellV: 3.75,
    dcResistanceMohm: 16,
    dcResistancePerCellMohm: 4,
    dcResistanceMethod: "step",
    resistanceAt25CMohm: 16.5,
    resistanceTemperatureC: 22,
    sagLimitedC: 50,
    capacityRatio: 1250 / 1300,
    labelRatio: 0.5,
    specificEnergyWhKg: 120,
    specificPowerWKg: 900,
    mainDischargeCurrentA: 13,
    mainDischargeDurationS: 590,
    mainDischargeCapacityMah: 1250,
    mainDischargeEnergyWh: 18.5,
    restVoltageV: 16.8,
    minCellVoltageV: null,
    dischargeCurrentSign: "positive",
    cellsSource: "rest-voltage",
    warnings: [],
    reachedCutoff: true,
    cutoffSource: "stated",
    dcResistanceIndicative: false,
    sagLimitedCEstimate: 50,
    sagLimitedCAssumptions: null,
    sustainedCMeasured: null,
    sustainedCReason: "no-temperature",
    sustainedCRule: sustainedRule(3.3, 60),
    sustainedLabelRatio: null,
    cellSpreadV: null,
    sampleIntervalS: 1,
    discharges: [],
    headlineDischarge: 1,
    retention: null,
    warningCodes: [],
    ...over,
  };
}

export async function makePack(
  opts: { makerStatus?: "active" | "proposed"; packStatus?: "active" | "proposed"; cells?: number } = {},
) {
  const tag = randomUUID().slice(0, 8);
  const [maker] = await db
    .insert(makers)
    .values({ slug: `fixmaker-${tag}`, name: `Fixmaker ${tag}`, status: opts.makerStatus ?? "active" })
    .returning();
  if (!maker) throw new Error("no maker");
  const [pack] = await db
    .insert(packs)
    .values({
      slug: `fixmaker-${tag}-1300-4s`,
      makerId: maker.id,
      model: `Fixture 1300 ${opts.cells ?? 4}S 100C`,
      cellsInSeries: opts.cells ?? 4,
      ratedCapacityMah: 1300,
      labelledContinuousC: 100,
      connector: "XT60",
      status: opts.packStatus ?? "active",
    })
    .returning();
  if (!pack) throw new Error("no pack");
  return { maker, pack };
}

export async function makeResult(p: {
  packId: number;
  contributorId: string;
  status?: ReviewStatus;
  groupKey?: string;
  figures?: Partial<Figures>;
  ambientTemperatureC?: number;
  cutoffVPerCell?: number;
  logSha256?: string;
  submittedAt?: Date;
}) {
  const f = figures(p.figures);
  const [row] = await db
    .insert(results)
    .values({
      packId: p.packId,
      contributorId: p.contributorId,
      status: p.status ?? "pending",
      ambientTemperatureC: p.ambientTemperatureC ?? 21,
      loadMode: "constant-current",
      loadCurrentA: 13,
      cutoffVPerCell: p.cutoffVPerCell ?? 3.3,
      stopTemperatureC: 60,
      resistanceMethod: "dc-step",
      equipment: "Fixture bench load",
      logKey: `logs/${randomUUID()}.csv`,
      logSha256: p.logSha256 ?? randomUUID().replace(/-/g, ""),
      logBytes: 1000,
      logFilename: "log.csv",
      figures: f,
      curve: [],
      capacityMah: f.capacityMah,
      dcResistanceMohm: f.dcResistanceMohm,
      sagLimitedC: f.sagLimitedC,
      labelRatio: f.labelRatio,
      capacityRatio: f.capacityRatio,
      loadRateC: 10,
      groupKey: p.groupKey ?? `fixture-group-${randomUUID().slice(0, 8)}`,
      publishedAt: p.status === "approved" ? new Date() : null,
      ...(p.submittedAt ? { submittedAt: p.submittedAt } : {}),
    })
    .returning();
  if (!row) throw new Error("no result");
  await db
    .insert(reviewEvents)
    .values({ resultId: row.id, actorId: p.contributorId, fromStatus: null, toStatus: "pending", note: "Submitted." });
  return row;
}
