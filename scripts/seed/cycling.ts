// A cycling tester: one log per pack holding ten discharge → charge cycles at 2C, written by a logger
// without a header row (so the columns come from a column mapping, kept on the tester's bench profile and
// on each result). Each log gives a retention series of ONE physical pack, which the pack page draws.
import { createHash } from "node:crypto";
import { and, eq } from "drizzle-orm";
import type { NodePgDatabase } from "drizzle-orm/node-postgres";
import * as schema from "@/db/schema";
import { analyseText, type ColumnMapping } from "@/lib/analysis";
import { generateLog, toCsv } from "@/lib/synthetic/equivalent-circuit";
import { logKey, putObject } from "@/server/storage";
import { createRandom } from "./random";
import { figureColumns, seedHistory } from "./result-rows";
import type { DemoPack } from "./scenario";

const TESTER = "tidemill@sagline.localhost";
const PROFILE = "Cycling rig, header-less logger";
/** The logger writes time, current, pack voltage, temperature — and no header row. */
export const CYCLING_MAPPING: ColumnMapping = { time: 0, current: 1, voltage: 2, temperature: 3, hasHeader: false };
const CYCLES = 10;
const C_RATE = 2;
const CUTOFF_V_PER_CELL = 3.3;

export async function seedCycling(db: NodePgDatabase<typeof schema>, packs: DemoPack[]): Promise<number> {
  const rnd = createRandom(4411);
  const [user] = await db.select({ id: schema.users.id }).from(schema.users).where(eq(schema.users.email, TESTER));
  const [moderator] = await db
    .select({ id: schema.users.id })
    .from(schema.users)
    .where(eq(schema.users.email, "moderator2@sagline.localhost"));
  if (!user || !moderator) throw new Error("demo users missing");
  const existing = await db
    .select({ id: schema.benchProfiles.id })
    .from(schema.benchProfiles)
    .where(and(eq(schema.benchProfiles.userId, user.id), eq(schema.benchProfiles.name, PROFILE)));
  const profileId =
    existing[0]?.id ??
    (
      await db
        .insert(schema.benchProfiles)
        .values({
          userId: user.id,
          name: PROFILE,
          loadEquipment: "Bidirectional cycler, 20 A per channel",
          logger: "Cycler's own logger at 1 Hz (no header row)",
          resistanceMethod: "dc-step",
          defaultAmbientC: 22,
          defaultLoadMode: "constant-current",
          defaultCutoffVPerCell: CUTOFF_V_PER_CELL,
          defaultStopTemperatureC: 60,
          defaultSampleRateHz: 1,
          logMapping: CYCLING_MAPPING,
        })
        .returning({ id: schema.benchProfiles.id })
    )[0]?.id;
  const packRows = await db.select({ id: schema.packs.id, slug: schema.packs.slug }).from(schema.packs);
  const packId = new Map(packRows.map((p) => [p.slug, p.id]));
  const today = new Date();
  const start = Date.UTC(today.getUTCFullYear(), today.getUTCMonth(), today.getUTCDate(), 7) - 30 * 86400_000;
  let made = 0;
  const chosen = packs.filter((p, i) => i % 12 === 5 && p.ratedCapacityMah <= 2200);
  for (const [k, pack] of chosen.entries()) {
    const id = packId.get(pack.slug);
    if (id === undefined) continue;
    const ambientC = Math.round(rnd.between(21, 23) * 10) / 10;
    const loadCurrentA = Math.round(C_RATE * (pack.ratedCapacityMah / 1000) * 10) / 10;
    const r0 = pack.truth.r0PerCellMohm;
    const { rows } = generateLog({
      seed: 9000 + k,
      cells: pack.cellsInSeries,
      capacityMah: pack.ratedCapacityMah * pack.truth.capacityFactor,
      r0PerCellMohm: r0 * 0.75,
      r1PerCellMohm: r0 * 0.25,
      loadCurrentA,
      cutoffVPerCell: CUTOFF_V_PER_CELL,
      ambientC,
      startTemperatureC: ambientC + 0.5,
      sampleIntervalS: 1,
      initialRestS: 5,
      finalRestS: 5,
      cycles: CYCLES,
      chargeCurrentA: pack.ratedCapacityMah / 1000,
      chargeRestS: 30,
      // A hard-worked pack (invented): 0.4 % of its capacity lost per cycle.
      fadePerCycle: 0.004,
      noise: { voltageV: 0.002 * pack.cellsInSeries, currentA: 0.006, temperatureC: 0.1 },
    });
    const csv = toCsv(rows, { header: false, columns: ["time", "current", "voltage", "temperature"] });
    const analysis = await analyseText(csv, {
      cells: pack.cellsInSeries,
      ratedMah: pack.ratedCapacityMah,
      labelledC: pack.labelledContinuousC,
      weightG: pack.weightG,
      cutoffVPerCell: CUTOFF_V_PER_CELL,
      stopTemperatureC: 60,
      mapping: CYCLING_MAPPING,
    });
    const sha = createHash("sha256").update(csv).digest("hex");
    const key = logKey(sha);
    await putObject(key, csv, "text/csv");
    const submittedAt = new Date(start + k * 5 * 3600 * 1000);
    const inserted = await db
      .insert(schema.results)
      .values({
        packId: id,
        contributorId: user.id,
        benchProfileId: profileId ?? null,
        status: "approved",
        ambientTemperatureC: ambientC,
        packStartTemperatureC: analysis.figures.startTemperatureC,
        loadMode: "constant-current",
        loadCurrentA,
        cutoffVPerCell: CUTOFF_V_PER_CELL,
        stopTemperatureC: 60,
        resistanceMethod: "dc-step",
        equipment: "Bidirectional cycler, 20 A per channel; cycler's own logger at 1 Hz",
        sampleRateHz: 1,
        cyclesBeforeTest: 0,
        testedOn: new Date(submittedAt.getTime() - 2 * 86400000).toISOString().slice(0, 10),
        notes: `${CYCLES} cycles in one log: discharge at ${C_RATE}C to ${CUTOFF_V_PER_CELL} V per cell, charge at 1C, rest.`,
        logKey: key,
        logSha256: sha,
        logBytes: Buffer.byteLength(csv),
        logFilename: `${pack.slug}-${CYCLES}-cycles.csv`,
        logMapping: CYCLING_MAPPING,
        ...figureColumns(analysis, {
          ambientC,
          cutoffVPerCell: CUTOFF_V_PER_CELL,
          loadCurrentA,
          ratedMah: pack.ratedCapacityMah,
          cyclesBeforeTest: 0,
        }),
        idempotencyKey: `seed-cycling-${k + 1}`,
        submittedAt,
        publishedAt: new Date(submittedAt.getTime() + 20 * 3600 * 1000),
      })
      .onConflictDoNothing()
      .returning({ id: schema.results.id });
    const resultId = inserted[0]?.id;
    if (resultId === undefined) continue;
    made++;
    await seedHistory(db, rnd, {
      resultId,
      outcome: "approved",
      contributorId: user.id,
      moderatorId: moderator.id,
      readerId: null,
      submittedAt,
    });
  }
  return made;
}
