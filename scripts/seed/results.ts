// Demo results: for each invented test, a synthetic log from the equivalent-circuit generator (the pack's
// hidden truth, aged by its cycle count), stored in the upload bucket and analysed by lib/analysis — so
// every figure is computed, never typed. Testers work in "campaigns" (a fixed method), which is what
// fills the like-for-like groups.
import { createHash } from "node:crypto";
import type { NodePgDatabase } from "drizzle-orm/node-postgres";
import * as schema from "@/db/schema";
import { analyseText } from "@/lib/analysis";
import { generateLog, toCsv, type CsvDialect } from "@/lib/synthetic/equivalent-circuit";
import { logKey, putObject } from "@/server/storage";
import { createRandom } from "./random";
import { agreementCampaigns, demoBenchId } from "./benches";
import { figureColumns, outcomeFor, seedHistory, type Outcome } from "./result-rows";
import type { DemoPack } from "./scenario";

type ResistanceMethod = (typeof schema.resistanceMethods)[number];
export type Campaign = {
  contributor: string;
  method: ResistanceMethod;
  ambientC: [number, number];
  cutoffVPerCell: number;
  cRate: number;
  cycles: number[];
  /** Which packs (by catalogue position) this tester owns. */
  owns: (i: number) => boolean;
  equipment: string;
  dialect: CsvDialect;
  /** Spread of capacity and resistance from one test to the next (default ±2 % and ±7 %). */
  spread?: number;
  /** The bench's current reading ÷ the true current (1.04: its sensor reads 4 % high). */
  currentGain?: number;
  /** A fixed outcome (the agreement demo) instead of a random one. */
  outcome?: (packIndex: number, cycles: number) => Outcome;
};

const campaigns: Campaign[] = [
  {
    contributor: "ridgeline@sagline.localhost",
    method: "dc-step",
    ambientC: [20, 24],
    cutoffVPerCell: 3.3,
    cRate: 8,
    cycles: [0, 1],
    owns: () => true,
    equipment: "Electronic load 600 W, USB logger at 2 Hz, thermocouple on the pack face",
    dialect: {},
  },
  {
    contributor: "coldframe@sagline.localhost",
    method: "iec-61960-two-level",
    ambientC: [21, 23],
    cutoffVPerCell: 3.0,
    cRate: 3,
    cycles: [0],
    owns: (i) => i % 2 === 0,
    equipment: "Programmable load with two-level pulse script, 4-wire sense, NTC on the pack",
    dialect: { delimiter: ";", decimalComma: true, voltageUnit: "mV", currentUnit: "mA", timeUnit: "ms" },
  },
  {
    contributor: "marsh@sagline.localhost",
    method: "dc-step",
    ambientC: [19, 24],
    cutoffVPerCell: 3.5,
    cRate: 15,
    cycles: [0, 2],
    owns: (i) => i % 2 === 1,
    equipment: "Carbon-pile load with shunt and data logger, IR thermometer",
    dialect: { delimiter: "\t", dischargeNegative: true },
  },
  {
    contributor: "quarry@sagline.localhost",
    method: "charger-readout",
    ambientC: [6, 12],
    cutoffVPerCell: 3.3,
    cRate: 8,
    cycles: [0],
    owns: (i) => i % 3 === 0,
    equipment: "Hobby charger in discharge mode with its logging output (unheated shed)",
    dialect: { headerStyle: "snake" },
  },
  {
    contributor: "slipway@sagline.localhost",
    method: "dc-step",
    ambientC: [20, 24],
    cutoffVPerCell: 3.3,
    cRate: 8,
    cycles: [60, 120, 180],
    owns: (i) => i % 3 === 1,
    equipment: "Electronic load 1 kW with logger at 1 Hz, pack in a fire-safe box",
    dialect: { crlf: true, bom: true },
  },
  {
    contributor: "anon@sagline.localhost",
    method: "dc-step",
    ambientC: [26, 31],
    cutoffVPerCell: 3.3,
    cRate: 8,
    cycles: [0],
    owns: (i) => i % 3 === 2,
    equipment: "Electronic load, summer workshop, no air conditioning",
    dialect: { headerStyle: "brackets" },
  },
  ...agreementCampaigns,
];

export async function seedResults(
  db: NodePgDatabase<typeof schema>,
  packs: DemoPack[],
  log: (s: string) => void,
): Promise<number> {
  const rnd = createRandom(7331);
  const users = await db.select({ id: schema.users.id, email: schema.users.email }).from(schema.users);
  const userId = new Map(users.map((u) => [u.email, u.id]));
  const moderatorId = userId.get("moderator@sagline.localhost");
  // Reader flags come from signed-in readers: a demo account other than the result's contributor.
  const readers = ["anon@sagline.localhost", "slipway@sagline.localhost"].map((e) => userId.get(e));
  const packRows = await db.select({ id: schema.packs.id, slug: schema.packs.slug }).from(schema.packs);
  const packId = new Map(packRows.map((p) => [p.slug, p.id]));
  let made = 0;
  let n = 0;
  // The demo's clock ends a few days before the day it is seeded (09:00 UTC that day, so a re-seed the same
  // day gives the same times): submissions every 3.7 hours, so the queue's oldest waits about six weeks and
  // the newest a few days, as on a live site. Nothing depends on the calendar date itself.
  const today = new Date();
  const start = Date.UTC(today.getUTCFullYear(), today.getUTCMonth(), today.getUTCDate(), 9) - 42 * 86400_000;

  for (const campaign of campaigns) {
    const contributorId = userId.get(campaign.contributor);
    if (!contributorId || !moderatorId) throw new Error("demo users missing");
    // Each tester owns a subset of the catalogue; together they cover every pack at least once.
    const benchProfileId = await demoBenchId(db, campaign.contributor, contributorId);
    const share = packs.flatMap((p, i) => (campaign.owns(i) ? [{ pack: p, index: i }] : []));
    for (const { pack, index } of share) {
      for (const cycles of campaign.cycles) {
        n++;
        const idempotencyKey = `seed-${n}`;
        const id = packId.get(pack.slug);
        if (id === undefined) continue;
        const ambientC = Math.round(rnd.between(...campaign.ambientC) * 10) / 10;
        const loadCurrentA = Math.round(campaign.cRate * (pack.ratedCapacityMah / 1000) * 10) / 10;
        // Ageing (from memory, typical hobby LiPo): ~0.07 % capacity lost and ~0.3 % resistance gained per cycle.
        const capacityMah =
          pack.ratedCapacityMah *
          pack.truth.capacityFactor *
          (1 - 0.0007 * cycles) *
          rnd.between(1 - (campaign.spread ?? 0.02), 1 + (campaign.spread ?? 0.02));
        const r0 =
          pack.truth.r0PerCellMohm *
          (1 + 0.003 * cycles) *
          rnd.between(1 - (campaign.spread ?? 0.07), 1 + (campaign.spread ?? 0.07));
        const { rows } = generateLog({
          seed: 1000 + n,
          cells: pack.cellsInSeries,
          capacityMah,
          r0PerCellMohm: r0 * 0.75,
          r1PerCellMohm: r0 * 0.25,
          loadCurrentA,
          cutoffVPerCell: campaign.cutoffVPerCell,
          ambientC,
          startTemperatureC: ambientC + rnd.between(-0.5, 1.5),
          sampleIntervalS: campaign.cRate >= 10 ? 0.5 : 1,
          iecPrelude: campaign.method === "iec-61960-two-level",
          initialRestS: 5,
          finalRestS: 5,
          // The two-level campaign uses a 4-wire sense and a quiet load, so its readings are far less
          // noisy: at 1 It the step is only a few mV per cell.
          noise:
            campaign.method === "iec-61960-two-level"
              ? { voltageV: 0.0005 * pack.cellsInSeries, currentA: 0.005, temperatureC: 0.05 }
              : { voltageV: 0.002 * pack.cellsInSeries, currentA: 0.006, temperatureC: 0.1 },
        });
        const gain = campaign.currentGain ?? 1;
        const csv = toCsv(
          gain === 1 ? rows : rows.map((row) => ({ ...row, currentA: row.currentA * gain })),
          campaign.dialect,
        );
        const analysis = await analyseText(csv, {
          cells: pack.cellsInSeries,
          ratedMah: pack.ratedCapacityMah,
          labelledC: pack.labelledContinuousC,
          weightG: pack.weightG,
          cutoffVPerCell: campaign.cutoffVPerCell,
          stopTemperatureC: 60,
        });
        const f = analysis.figures;
        const sha = createHash("sha256").update(csv).digest("hex");
        const key = logKey(sha);
        await putObject(key, csv, "text/csv");
        const submittedAt = new Date(start + n * 3.7 * 3600 * 1000);
        const outcome = campaign.outcome ? campaign.outcome(index, cycles) : outcomeFor(rnd);
        const published = outcome === "approved" || outcome === "flagged";
        const inserted = await db
          .insert(schema.results)
          .values({
            packId: id,
            contributorId,
            benchProfileId,
            status: outcome === "flagged" ? "approved" : outcome,
            ambientTemperatureC: ambientC,
            packStartTemperatureC: f.startTemperatureC,
            loadMode: "constant-current",
            loadCurrentA,
            cutoffVPerCell: campaign.cutoffVPerCell,
            stopTemperatureC: 60,
            resistanceMethod: campaign.method,
            equipment: campaign.equipment,
            sampleRateHz: campaign.cRate >= 10 ? 2 : 1,
            cyclesBeforeTest: cycles,
            testedOn: new Date(submittedAt.getTime() - 86400000).toISOString().slice(0, 10),
            logKey: key,
            logSha256: sha,
            logBytes: Buffer.byteLength(csv),
            logFilename: `${pack.slug}-c${cycles}.csv`,
            ...figureColumns(analysis, {
              ambientC,
              cutoffVPerCell: campaign.cutoffVPerCell,
              loadCurrentA,
              ratedMah: pack.ratedCapacityMah,
              cyclesBeforeTest: cycles,
            }),
            idempotencyKey,
            submittedAt,
            publishedAt: published ? new Date(submittedAt.getTime() + 20 * 3600 * 1000) : null,
          })
          .onConflictDoNothing()
          .returning({ id: schema.results.id });
        const resultId = inserted[0]?.id;
        if (resultId === undefined) continue;
        made++;
        const readerId = readers.find((r) => r !== undefined && r !== contributorId) ?? null;
        await seedHistory(db, rnd, { resultId, outcome, contributorId, moderatorId, readerId, submittedAt });
      }
    }
  }
  log(`sagline: ${made} demo results analysed and stored`);
  return made;
}
