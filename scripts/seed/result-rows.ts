// The parts every seeded result shares: the columns computed from an analysis (figures, both ratings, the
// like-for-like key from what the log shows) and the review history its outcome implies.
import type { NodePgDatabase } from "drizzle-orm/node-postgres";
import * as schema from "@/db/schema";
import { groupKeyForAnalysis, type Analysis } from "@/lib/analysis";
import type { Random } from "./random";

// "flagged": approved, with a reader's open flag (a case for moderators; the result stays published and counted).
export type Outcome = "approved" | "pending" | "awaiting_answer" | "rejected" | "withdrawn" | "flagged";

export function outcomeFor(r: Random): Outcome {
  const x = r.next();
  if (x < 0.8) return "approved";
  if (x < 0.88) return "pending";
  if (x < 0.92) return "awaiting_answer";
  if (x < 0.96) return "rejected";
  if (x < 0.98) return "withdrawn";
  return "flagged";
}

/** Figures, curve and headline columns of an analysed log, with the group key its resistance reading implies. */
export function figureColumns(
  analysis: Analysis,
  card: { ambientC: number; cutoffVPerCell: number; loadCurrentA: number; ratedMah: number; cyclesBeforeTest: number },
) {
  const f = analysis.figures;
  return {
    figures: f,
    curve: analysis.curve,
    capacityMah: f.capacityMah,
    energyWh: f.energyWh,
    dcResistanceMohm: f.dcResistanceMohm,
    resistanceAt25CMohm: f.resistanceAt25CMohm,
    holdVoltagePerCellV: f.holdVoltagePerCellV,
    temperatureRiseC: f.temperatureRiseC,
    sagLimitedC: f.sagLimitedCEstimate,
    labelRatio: f.labelRatio,
    sustainedCMeasured: f.sustainedCMeasured,
    sustainedLabelRatio: f.sustainedLabelRatio,
    capacityRatio: f.capacityRatio,
    loadRateC: card.loadCurrentA / (card.ratedMah / 1000),
    groupKey: groupKeyForAnalysis(f.dcResistanceMethod, card).key,
  };
}

const rejectReasons = ["incomplete-method", "wrong-data", "not-a-measurement"] as const;

/** The review events (and the reader's open flag of a flagged result) that lead to `outcome`. */
export async function seedHistory(
  db: NodePgDatabase<typeof schema>,
  rnd: Random,
  r: {
    resultId: number;
    outcome: Outcome;
    contributorId: string;
    moderatorId: string;
    readerId: string | null;
    submittedAt: Date;
  },
): Promise<void> {
  const { resultId, outcome, contributorId, moderatorId, readerId, submittedAt } = r;
  const later = (h: number) => new Date(submittedAt.getTime() + h * 3600 * 1000);
  const events: (typeof schema.reviewEvents.$inferInsert)[] = [
    {
      resultId,
      actorId: contributorId,
      fromStatus: null,
      toStatus: "pending",
      note: "Submitted.",
      createdAt: submittedAt,
    },
  ];
  if (outcome === "approved" || outcome === "flagged")
    events.push({ resultId, actorId: moderatorId, fromStatus: "pending", toStatus: "approved", createdAt: later(20) });
  if (outcome === "rejected")
    events.push({
      resultId,
      actorId: moderatorId,
      fromStatus: "pending",
      toStatus: "rejected",
      reason: rnd.pick(rejectReasons),
      note: "The method card does not match the log.",
      createdAt: later(20),
    });
  if (outcome === "awaiting_answer")
    events.push({
      resultId,
      actorId: moderatorId,
      fromStatus: "pending",
      toStatus: "awaiting_answer",
      note: "Please state where the temperature probe sat.",
      createdAt: later(20),
    });
  if (outcome === "withdrawn")
    events.push({
      resultId,
      actorId: contributorId,
      fromStatus: "pending",
      toStatus: "withdrawn",
      note: "Wrong pack selected.",
      createdAt: later(5),
    });
  await db.insert(schema.reviewEvents).values(events);
  if (outcome === "flagged") {
    await db.insert(schema.readerFlags).values({
      resultId,
      reporterId: readerId,
      reason: "wrong-figures",
      note: "Capacity looks high for this pack.",
      createdAt: later(60),
    });
  }
}
