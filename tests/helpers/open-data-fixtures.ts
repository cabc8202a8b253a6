// Invented makers, packs and results for the open-data tests. Slugs carry a prefix so files sharing the
// throwaway database never collide.
import { db } from "@/db";
import { makers, packs, results, users, type ReviewStatus } from "@/db/schema";
import { sustainedRule, type Figures } from "@/lib/analysis";

function figures(over: Partial<Figures> = {}): Figures {
  return {
    samples: 100,
    skippedLines: 0,
    durationS: 600,
    cells: 4,
    // Float noise as a double sum leaves it: the published figures must come out rounded (1250, 18.2, 3.652).
    capacityMah: 1250.4321,
    energyWh: 18.2049999,
    meanVoltageV: 14.6,
    meanVoltagePerCellV: 3.652431030273438,
    minVoltageV: 13.2,
    minVoltagePerCellV: 3.3,
    peakCurrentA: 30,
    startTemperatureC: 24,
    peakTemperatureC: 44,
    temperatureRiseC: 20,
    timeToCutoffS: 590,
    timeToStopTemperatureS: null,
    holdVoltagePerCellV: 3.7,
    dcResistanceMohm: 14,
    dcResistancePerCellMohm: 3.5,
    dcResistanceMethod: "step",
    resistanceAt25CMohm: 13.8,
    resistanceTemperatureC: 24,
    sagLimitedC: 40,
    capacityRatio: 0.96,
    labelRatio: 0.53,
    specificEnergyWhKg: 120,
    specificPowerWKg: 2000,
    mainDischargeCurrentA: 26,
    mainDischargeDurationS: 580,
    mainDischargeCapacityMah: 1240,
    mainDischargeEnergyWh: 18,
    restVoltageV: 16.8,
    minCellVoltageV: 3.28,
    dischargeCurrentSign: "positive",
    cellsSource: "given",
    warnings: [],
    reachedCutoff: true,
    cutoffSource: "stated",
    dcResistanceIndicative: false,
    sagLimitedCEstimate: 40,
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

/** A moderator named after the test file's prefix (the user the decisions in these files are made by). */
export async function makeModerator(prefix: string): Promise<string> {
  const [mod] = await db
    .insert(users)
    .values({ email: `${prefix}-mod@example.test`, displayName: `${prefix} moderator`, role: "moderator" })
    .returning();
  if (!mod) throw new Error("no moderator");
  return mod.id;
}

export async function seedOpenData(prefix: string) {
  const [user] = await db
    .insert(users)
    .values({ email: `${prefix}@example.test`, displayName: `${prefix} tester` })
    .returning();
  if (!user) throw new Error("no user");
  const [m1, m2] = await db
    .insert(makers)
    .values([
      { slug: `${prefix}-voltwren`, name: `${prefix} Voltwren` },
      { slug: `${prefix}-pikecell`, name: `${prefix} Pikecell` },
    ])
    .returning();
  if (!m1 || !m2) throw new Error("no makers");
  const packRows = await db
    .insert(packs)
    .values([
      {
        slug: `${prefix}-voltwren-1300-4s`,
        makerId: m1.id,
        model: "Kestrel 1300 4S 100C",
        cellsInSeries: 4,
        ratedCapacityMah: 1300,
        labelledContinuousC: 100,
        connector: "XT60",
      },
      {
        slug: `${prefix}-voltwren-2200-3s`,
        makerId: m1.id,
        model: "Kestrel 2200 3S 50C",
        cellsInSeries: 3,
        ratedCapacityMah: 2200,
        labelledContinuousC: 50,
        connector: "XT60",
      },
      {
        slug: `${prefix}-pikecell-1300-4s`,
        makerId: m2.id,
        model: "=Formula 1300 4S 75C",
        cellsInSeries: 4,
        ratedCapacityMah: 1300,
        labelledContinuousC: 75,
        connector: "XT60",
      },
    ])
    .returning();
  const [p1, p2, p3] = packRows;
  if (!p1 || !p2 || !p3) throw new Error("no packs");
  const group = `${prefix}_grp`;
  const base = {
    contributorId: user.id,
    ambientTemperatureC: 22,
    loadMode: "constant-current" as const,
    loadCurrentA: 13,
    cutoffVPerCell: 3.3,
    stopTemperatureC: 60,
    resistanceMethod: "dc-step" as const,
    equipment: "Bench load, 30 A",
    cyclesBeforeTest: 2,
    logKey: "k",
    logSha256: "s",
    logBytes: 1,
    logFilename: "log.csv",
    curve: [],
    loadRateC: 10,
    groupKey: group,
  };
  const r = (packId: number, status: ReviewStatus, sagLimitedC: number, notes: string | null = null) => ({
    ...base,
    packId,
    status,
    notes,
    sagLimitedC,
    labelRatio: sagLimitedC / 100,
    capacityMah: 1250,
    figures: figures({ sagLimitedC, labelRatio: sagLimitedC / 100 }),
    publishedAt: status === "approved" ? new Date("2026-11-01T00:00:00Z") : null,
  });
  const rows = await db
    .insert(results)
    .values([
      r(p1.id, "approved", 40),
      r(p1.id, "approved", 44),
      r(p1.id, "pending", 90),
      r(p1.id, "rejected", 95),
      r(p2.id, "approved", 30, "@SUM(A1) warm room"),
      r(p3.id, "approved", 50, "=cmd|' /C calc'!A0"),
      r(p3.id, "withdrawn", 99),
      r(p3.id, "awaiting_answer", 98),
    ])
    .returning({ id: results.id, status: results.status });
  return { makers: [m1, m2], packs: [p1, p2, p3], group, results: rows };
}
