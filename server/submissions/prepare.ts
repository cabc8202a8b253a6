// The server's side of a submission before anything is written: the pack (chosen or proposed), the
// uploaded files (the contributor's own, still stored), and the figures — always recomputed here from the
// stored log with the stated method card, never taken from the client.
import "server-only";
import { getMakerChoice, getPackChoice, listResultIdsWithLog } from "@/db/queries/submissions";
import type { ResultFields } from "@/db/mutations/results";
import type { PackProposal } from "@/db/mutations/catalogue";
import {
  checkAgainstCard,
  groupKeyForAnalysis,
  type Analysis,
  type CardCheck,
  type ColumnMapping,
} from "@/lib/analysis";
import { AppError } from "@/lib/errors";
import { env } from "@/server/env";
import { isOwnIncomingLogKey, isOwnIncomingPhotoKey, objectBytes } from "@/server/storage";
import { analyseOptionsFor } from "@/lib/open-data/recompute";
import { analyseStored } from "@/server/uploads/log-upload";
import { isRecordIdText } from "@/lib/validations/ids";
import type { MethodCard, PackStep } from "@/lib/validations/result";

export type PackFacts = { title: string; cells: number; ratedMah: number; labelledC: number; weightG: number | null };
export type PackTarget = { packId: number } | { proposal: PackProposal };

export async function resolvePack(step: PackStep, userId: string): Promise<{ target: PackTarget; facts: PackFacts }> {
  if (step.mode === "existing") {
    const pack = await getPackChoice(Number(step.packId), userId);
    if (!pack) {
      throw new AppError("validation", "That pack is not in the catalogue.", {
        "pack.packId": [
          "That pack is not in the catalogue (it may have been merged or removed). Choose it again, or propose it.",
        ],
      });
    }
    const facts = {
      title: `${pack.makerName} ${pack.model}`,
      cells: pack.cellsInSeries,
      ratedMah: pack.ratedCapacityMah,
      labelledC: pack.labelledContinuousC,
      weightG: pack.weightG,
    };
    return { target: { packId: pack.id }, facts };
  }
  let makerName = step.makerName;
  let makerId: number | null = null;
  if (step.makerId !== "") {
    const maker = isRecordIdText(step.makerId) ? await getMakerChoice(Number(step.makerId), userId) : null;
    if (!maker)
      throw new AppError("validation", "That maker is not in the catalogue.", {
        "pack.makerId": ["That maker is not in the catalogue. Choose it again, or give a new maker's name."],
      });
    makerId = maker.id;
    makerName = maker.name;
  }
  // The schema has already required these for a proposal; the checks here keep the types honest.
  if (
    !step.model ||
    !step.cellsInSeries ||
    !step.ratedCapacityMah ||
    !step.labelledContinuousC ||
    !step.connector ||
    !makerName
  ) {
    throw new AppError("validation", "The new pack needs its label figures.", {
      "pack.model": ["Fill in the new pack's label figures."],
    });
  }
  const proposal: PackProposal = {
    makerId,
    makerName,
    model: step.model,
    cellsInSeries: step.cellsInSeries,
    ratedCapacityMah: step.ratedCapacityMah,
    labelledContinuousC: step.labelledContinuousC,
    labelledBurstC: step.labelledBurstC,
    weightG: step.weightG,
    connector: step.connector,
  };
  const facts = {
    title: `${makerName} ${step.model}`,
    cells: step.cellsInSeries,
    ratedMah: step.ratedCapacityMah,
    labelledC: step.labelledContinuousC,
    weightG: step.weightG,
  };
  return { target: { proposal }, facts };
}

/** The log and photos must be this contributor's uploads and still be stored. */
export async function checkFiles(logKey: string | null, photoKeys: string[], userId: string): Promise<void> {
  if (logKey !== null && (!isOwnIncomingLogKey(logKey, userId) || (await objectBytes(logKey)) === null)) {
    throw new AppError("validation", "The uploaded log is no longer stored.", {
      log: ["The uploaded log is no longer stored: please upload it again."],
    });
  }
  for (const key of photoKeys) {
    if (!isOwnIncomingPhotoKey(key, userId) || (await objectBytes(key)) === null) {
      throw new AppError("validation", "A photo is no longer stored.", {
        photoKeys: ["A photo is no longer stored: remove it and add it again."],
      });
    }
  }
}

export type Figured = {
  sha256: string;
  bytes: number;
  analysis: Analysis;
  checks: CardCheck[];
  /** The column mapping the log was read with (null: detected). */
  mapping: ColumnMapping | null;
};

export async function analyseForCard(
  logKey: string,
  facts: PackFacts,
  card: MethodCard,
  mapping: ColumnMapping | null = null,
): Promise<Figured> {
  // The same options a result's page gives the open CLI to recompute the figures (lib/open-data/recompute.ts).
  const { sha256, bytes, analysis } = await analyseStored(
    logKey,
    analyseOptionsFor({
      cells: facts.cells,
      ratedMah: facts.ratedMah,
      labelledC: facts.labelledC,
      weightG: facts.weightG,
      cutoffVPerCell: card.cutoffVPerCell,
      stopTemperatureC: card.stopTemperatureC,
      packStartTemperatureC: card.packStartTemperatureC,
      mapping,
    }),
    env().LOG_MAX_BYTES,
    "log",
  );
  const checks = checkAgainstCard(analysis.figures, {
    packCells: facts.cells,
    cutoffVPerCell: card.cutoffVPerCell,
    loadCurrentA: card.loadCurrentA,
    loadMode: card.loadMode,
    stopTemperatureC: card.stopTemperatureC,
  });
  return { sha256, bytes, analysis, checks, mapping };
}

/**
 * Method card, file references, figures, headline columns, like-for-like key and plausibility flags. The key's
 * resistance part is the method the analysis used on the log (groupKeyForAnalysis), not the one on the card.
 */
export async function resultFields(
  card: MethodCard,
  facts: PackFacts,
  f: Figured,
  files: { logKey: string; logFilename: string; photoKeys: string[] },
  excludeResultId?: number,
): Promise<ResultFields> {
  const fig = f.analysis.figures;
  const same = (await listResultIdsWithLog(f.sha256)).filter((id) => id !== excludeResultId);
  const flags = [
    ...f.checks.map((c) => ({ code: c.code, message: c.message })),
    ...(same.length > 0
      ? [
          {
            code: "duplicate-log",
            message: `The same log file is already on result${same.length > 1 ? "s" : ""} ${same.map((id) => `#${id}`).join(", ")}.`,
            resultIds: same,
          },
        ]
      : []),
  ];
  return {
    benchProfileId: card.benchProfileId,
    ambientTemperatureC: card.ambientTemperatureC,
    packStartTemperatureC: card.packStartTemperatureC,
    loadMode: card.loadMode,
    loadCurrentA: card.loadCurrentA,
    cutoffVPerCell: card.cutoffVPerCell,
    stopTemperatureC: card.stopTemperatureC,
    resistanceMethod: card.resistanceMethod,
    equipment: card.equipment,
    sampleRateHz: card.sampleRateHz,
    cyclesBeforeTest: card.cyclesBeforeTest,
    testedOn: card.testedOn,
    notes: card.notes,
    logKey: files.logKey,
    logSha256: f.sha256,
    logBytes: f.bytes,
    logFilename: files.logFilename,
    photoKeys: files.photoKeys,
    logMapping: f.mapping,
    figures: fig,
    curve: f.analysis.curve,
    capacityMah: fig.capacityMah,
    energyWh: fig.energyWh,
    dcResistanceMohm: fig.dcResistanceMohm,
    resistanceAt25CMohm: fig.resistanceAt25CMohm,
    holdVoltagePerCellV: fig.holdVoltagePerCellV,
    temperatureRiseC: fig.temperatureRiseC,
    sagLimitedC: fig.sagLimitedC,
    labelRatio: fig.labelRatio,
    sustainedCMeasured: fig.sustainedCMeasured,
    sustainedLabelRatio: fig.sustainedLabelRatio,
    capacityRatio: fig.capacityRatio,
    loadRateC: card.loadCurrentA / (facts.ratedMah / 1000),
    groupKey: groupKeyForAnalysis(fig.dcResistanceMethod, {
      ambientC: card.ambientTemperatureC,
      cutoffVPerCell: card.cutoffVPerCell,
      loadCurrentA: card.loadCurrentA,
      ratedMah: facts.ratedMah,
      cyclesBeforeTest: card.cyclesBeforeTest,
    }).key,
    flags,
  };
}
