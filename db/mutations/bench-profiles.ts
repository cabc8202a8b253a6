// Bench profile writes. Every write names the owner explicitly and puts it in the WHERE clause, so a user
// can only change their own profiles; when nothing matched the answer is 404 whether the profile is missing
// or someone else's, so nobody learns which ids exist.
import "server-only";
import { and, count, eq, sql } from "drizzle-orm";
import { db } from "@/db";
import { benchProfiles } from "@/db/schema";
import { AppError } from "@/lib/errors";
import type { BenchProfileInput } from "@/lib/validations/bench-profile";

const MAX_BENCH_PROFILES_PER_USER = 50;

function notFound(): never {
  throw new AppError("not_found", "That bench profile does not exist (any more).");
}

export async function createBenchProfile(userId: string, input: BenchProfileInput): Promise<{ id: number }> {
  return db.transaction(async (tx) => {
    // Serialise creates per user so the cap holds under concurrent submits.
    await tx.execute(sql`select pg_advisory_xact_lock(hashtext(${`bench-profiles:${userId}`}))`);
    const [c] = await tx.select({ n: count() }).from(benchProfiles).where(eq(benchProfiles.userId, userId));
    if ((c?.n ?? 0) >= MAX_BENCH_PROFILES_PER_USER) {
      throw new AppError(
        "conflict",
        `You already have ${MAX_BENCH_PROFILES_PER_USER} bench profiles; delete one you no longer use first.`,
      );
    }
    const [row] = await tx
      .insert(benchProfiles)
      .values({ ...input, userId })
      .returning({ id: benchProfiles.id });
    if (!row) throw new Error("bench profile insert returned nothing");
    return row;
  });
}

export async function updateBenchProfile(
  userId: string,
  id: number,
  input: BenchProfileInput,
): Promise<{ id: number }> {
  const [row] = await db
    .update(benchProfiles)
    .set({ ...input, updatedAt: new Date() })
    .where(and(eq(benchProfiles.id, id), eq(benchProfiles.userId, userId)))
    .returning({ id: benchProfiles.id });
  return row ?? notFound();
}

export async function deleteBenchProfile(userId: string, id: number): Promise<{ id: number }> {
  const [row] = await db
    .delete(benchProfiles)
    .where(and(eq(benchProfiles.id, id), eq(benchProfiles.userId, userId)))
    .returning({ id: benchProfiles.id });
  return row ?? notFound();
}
