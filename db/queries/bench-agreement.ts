// Reads behind bench agreement (lib/bench-agreement.ts): published results tested on a bench profile, with the
// figures compared and, for benches that state their accuracy in full, each figure's U95 (for Eₙ); and one bench's
// public facts. A bench is public only through its published results: one with none is "not found".
import "server-only";
import { and, count, eq, isNotNull } from "drizzle-orm";
import { db, type Executor } from "@/db";
import { benchProfiles, makers, packs, results, users } from "@/db/schema";
import type { Figures } from "@/lib/analysis";
import { resolveAccuracy } from "@/lib/analysis/uncertainty";
import { pickBenchAccuracy, statedAccuracyOf, type BenchAccuracyColumns } from "@/lib/bench-accuracy";
import type { AgreementRow } from "@/lib/bench-agreement";
import type { ResistanceMethod } from "@/lib/enums";
import { figureU95 } from "@/lib/figure-u95";
import { nameOnResults } from "@/lib/user-name";
import { benchAccuracyColumns } from "./bench-profiles";
import { isPublished, makerOfPack, packOfResult } from "./published";

const rowColumns = {
  resultId: results.id,
  benchId: results.benchProfileId,
  packId: results.packId,
  groupKey: results.groupKey,
  resistanceMethod: results.resistanceMethod,
  figures: results.figures,
  cellsInSeries: packs.cellsInSeries,
  ratedCapacityMah: packs.ratedCapacityMah,
  labelledContinuousC: packs.labelledContinuousC,
  ...benchAccuracyColumns,
};

type RawRow = BenchAccuracyColumns & {
  resultId: number;
  benchId: number | null;
  packId: number;
  groupKey: string;
  resistanceMethod: ResistanceMethod;
  figures: Figures;
  cellsInSeries: number;
  ratedCapacityMah: number;
  labelledContinuousC: number;
};

/** The compared figures of one result and, when its bench states every accuracy value, their U95. */
export function toAgreementRow(r: RawRow & { benchId: number }): AgreementRow {
  const f = r.figures;
  const resolved = resolveAccuracy(statedAccuracyOf(pickBenchAccuracy(r), r.resistanceMethod));
  const values = {
    capacityMah: f.capacityMah,
    energyWh: f.energyWh,
    meanVoltageV: f.meanVoltageV,
    holdVoltagePerCellV: f.holdVoltagePerCellV,
    dcResistanceMohm: f.dcResistanceMohm,
    resistanceAt25CMohm: f.resistanceAt25CMohm,
  };
  if (resolved.assumptions.length > 0)
    return { resultId: r.resultId, benchId: r.benchId, packId: r.packId, groupKey: r.groupKey, values };
  const u = figureU95(f, resolved.accuracy, {
    cells: r.cellsInSeries,
    ratedMah: r.ratedCapacityMah,
    labelledC: r.labelledContinuousC,
  });
  const cells = f.cells ?? r.cellsInSeries;
  return {
    resultId: r.resultId,
    benchId: r.benchId,
    packId: r.packId,
    groupKey: r.groupKey,
    values,
    u95: {
      capacityMah: u.capacityMah,
      energyWh: u.energyWh,
      meanVoltageV: u.meanVoltagePerCellV === null ? null : u.meanVoltagePerCellV * cells,
      holdVoltagePerCellV: u.holdVoltagePerCellV,
      dcResistanceMohm: u.dcResistanceMohm,
      resistanceAt25CMohm: u.resistanceAt25CMohm,
    },
  };
}

function withBench(r: RawRow): (RawRow & { benchId: number }) | null {
  return r.benchId === null ? null : { ...r, benchId: r.benchId };
}

/** Every published result tested on a bench profile (the input of the comparison), or those of one pack and group. */
export async function listAgreementRows(
  only?: { packId: number; groupKey: string },
  exec: Executor = db,
): Promise<AgreementRow[]> {
  const rows = await exec
    .select(rowColumns)
    .from(results)
    .innerJoin(packs, packOfResult)
    .innerJoin(makers, makerOfPack)
    .innerJoin(benchProfiles, eq(benchProfiles.id, results.benchProfileId))
    .where(
      and(
        isPublished,
        isNotNull(results.benchProfileId),
        ...(only ? [eq(results.packId, only.packId), eq(results.groupKey, only.groupKey)] : []),
      ),
    );
  return rows.flatMap((r) => {
    const b = withBench(r);
    return b ? [toAgreementRow(b)] : [];
  });
}

/** One result (any status) as the comparison sees it; null when it has no bench profile or does not exist. */
export async function getAgreementRow(resultId: number, exec: Executor = db): Promise<AgreementRow | null> {
  const [row] = await exec
    .select(rowColumns)
    .from(results)
    .innerJoin(packs, packOfResult)
    .innerJoin(benchProfiles, eq(benchProfiles.id, results.benchProfileId))
    .where(eq(results.id, resultId))
    .limit(1);
  const b = row ? withBench(row) : null;
  return b ? toAgreementRow(b) : null;
}

export type PublicBench = BenchAccuracyColumns & {
  id: number;
  loadEquipment: string;
  resistanceMethod: ResistanceMethod;
  calibratedOn: string | null;
  contributor: string;
  publishedResults: number;
};

/** A bench's public facts; null unless it has at least one published result. */
export async function getPublicBench(id: number): Promise<PublicBench | null> {
  const [row] = await db
    .select({
      id: benchProfiles.id,
      loadEquipment: benchProfiles.loadEquipment,
      resistanceMethod: benchProfiles.resistanceMethod,
      calibratedOn: benchProfiles.calibratedOn,
      displayName: users.displayName,
      anonymous: users.anonymous,
      ...benchAccuracyColumns,
    })
    .from(benchProfiles)
    .innerJoin(users, eq(users.id, benchProfiles.userId))
    .where(eq(benchProfiles.id, id))
    .limit(1);
  if (!row) return null;
  const [n] = await db
    .select({ n: count() })
    .from(results)
    .innerJoin(packs, packOfResult)
    .innerJoin(makers, makerOfPack)
    .where(and(isPublished, eq(results.benchProfileId, id)));
  const publishedResults = n?.n ?? 0;
  if (publishedResults === 0) return null;
  const { displayName, anonymous, ...rest } = row;
  return { ...rest, contributor: nameOnResults({ displayName, anonymous }), publishedResults };
}
