import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { db } from "@/db";
import { benchProfiles } from "@/db/schema";

export type BenchProfile = typeof benchProfiles.$inferSelect;

/** A contributor's bench profiles, by name. */
export async function listBenchProfilesForUser(userId: string): Promise<BenchProfile[]> {
  return db
    .select()
    .from(benchProfiles)
    .where(eq(benchProfiles.userId, userId))
    .orderBy(asc(benchProfiles.name), asc(benchProfiles.id));
}

/** One of the user's own profiles; null when it does not exist or belongs to someone else. */
export async function getBenchProfileForUser(userId: string, id: number): Promise<BenchProfile | null> {
  const rows = await db
    .select()
    .from(benchProfiles)
    .where(and(eq(benchProfiles.id, id), eq(benchProfiles.userId, userId)))
    .limit(1);
  return rows[0] ?? null;
}

/** A bench profile's stated accuracy columns, for reads that left-join the result's bench (lib/bench-accuracy.ts). */
export const benchAccuracyColumns = {
  voltageAccuracyPct: benchProfiles.voltageAccuracyPct,
  voltageOffsetV: benchProfiles.voltageOffsetV,
  voltageResolutionV: benchProfiles.voltageResolutionV,
  currentAccuracyPct: benchProfiles.currentAccuracyPct,
  currentOffsetA: benchProfiles.currentOffsetA,
  currentResolutionA: benchProfiles.currentResolutionA,
  temperatureAccuracyPct: benchProfiles.temperatureAccuracyPct,
  temperatureOffsetC: benchProfiles.temperatureOffsetC,
  temperatureResolutionC: benchProfiles.temperatureResolutionC,
  samplingIntervalS: benchProfiles.samplingIntervalS,
};
