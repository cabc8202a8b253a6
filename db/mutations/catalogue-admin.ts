// Admin catalogue writes: a pack's label figures, and merges of duplicate makers or packs. Each write and
// its audit_events row share one transaction; merged entries are kept (status "merged", merged_into_id) so
// old links and the audit trail still resolve, and the results move with the merge — nothing is deleted.
// Each write returns the slugs and packs it touched; the service (server/catalogue-admin.ts) revalidates.
import "server-only";
import { and, eq, inArray, ne, sql } from "drizzle-orm";
import { db, type Transaction } from "@/db";
import { auditEvents, makers, packEmails, packs, results } from "@/db/schema";
import { AppError } from "@/lib/errors";
import type { PackLabelInput } from "@/lib/validations/catalogue-admin";

/** The catalogue entries a write touched: their pages (and their groups') need refreshing. */
export type Touched = { packSlugs: string[]; makerSlugs: string[]; packIds: number[] };

/** Edits a pack's label; the label-dependent ratios of its results are rescaled in the same transaction. */
export async function writePackLabel(actorId: string, input: PackLabelInput): Promise<Touched> {
  const { note, packId, ...label } = input;
  return db.transaction(async (tx) => {
    const [before] = await tx
      .select({ pack: packs, makerSlug: makers.slug })
      .from(packs)
      .innerJoin(makers, eq(makers.id, packs.makerId))
      .where(eq(packs.id, packId))
      .for("update", { of: packs });
    if (!before) throw new AppError("not_found", "That pack does not exist.");
    if (before.pack.status === "merged")
      throw new AppError("conflict", "This pack was merged into another; edit that one.");
    await tx
      .update(packs)
      .set({ ...label, updatedAt: new Date() })
      .where(eq(packs.id, packId));
    // Capacity ratio = delivered ÷ rated mAh; label ratio = measured C ÷ labelled C (definitions on /methods).
    const cFactor = before.pack.labelledContinuousC / label.labelledContinuousC;
    await tx
      .update(results)
      .set({
        capacityRatio: sql`${results.capacityMah} / ${label.ratedCapacityMah}::real`,
        labelRatio: sql`${results.labelRatio} * ${cFactor}::real`,
        figures: sql`${results.figures} || jsonb_build_object(
          'capacityRatio', ${results.capacityMah} / ${label.ratedCapacityMah}::real,
          'labelRatio', (${results.figures}->>'labelRatio')::real * ${cFactor}::real)`,
      })
      .where(eq(results.packId, packId));
    const { id: _id, createdAt: _c, updatedAt: _u, ...from } = before.pack;
    await tx.insert(auditEvents).values({
      actorId,
      action: "pack.edit-label",
      entityType: "pack",
      entityId: String(packId),
      data: { from, to: label, note },
    });
    return { packSlugs: [before.pack.slug], makerSlugs: [before.makerSlug], packIds: [packId] };
  });
}

/**
 * Moves a pack into another inside a transaction the caller holds (both rows locked): its results and new-result
 * e-mail requests move, the pack is kept as "merged" pointing at the survivor, and an audit event says so.
 */
export async function movePackInto(
  tx: Transaction,
  actorId: string,
  sourceId: number,
  targetId: number,
  action: "pack.merge" | "pack.merge-proposal",
  about: Record<string, unknown> = {},
): Promise<number[]> {
  const moved = await tx
    .update(results)
    .set({ packId: targetId, updatedAt: new Date() })
    .where(eq(results.packId, sourceId))
    .returning({ id: results.id });
  await tx.execute(sql`insert into ${packEmails} (user_id, pack_id, created_at)
    select user_id, ${targetId}, created_at from ${packEmails} where pack_id = ${sourceId} on conflict do nothing`);
  await tx.delete(packEmails).where(eq(packEmails.packId, sourceId));
  await tx
    .update(packs)
    .set({ status: "merged", mergedIntoId: targetId, updatedAt: new Date() })
    .where(eq(packs.id, sourceId));
  const movedResultIds = moved.map((m) => m.id);
  await tx.insert(auditEvents).values({
    actorId,
    action,
    entityType: "pack",
    entityId: String(sourceId),
    data: { into: targetId, ...about, movedResultIds },
  });
  return movedResultIds;
}

/** Merges a duplicate pack into another: its results and new-result e-mail requests move, the duplicate is kept as "merged". */
export async function mergePackRows(
  actorId: string,
  sourceId: number,
  targetId: number,
): Promise<{ movedResults: number; touched: Touched }> {
  if (sourceId === targetId) throw new AppError("bad_request", "Choose two different packs.");
  return db.transaction(async (tx) => {
    const rows = await tx
      .select({
        id: packs.id,
        slug: packs.slug,
        status: packs.status,
        cells: packs.cellsInSeries,
        makerSlug: makers.slug,
      })
      .from(packs)
      .innerJoin(makers, eq(makers.id, packs.makerId))
      .where(inArray(packs.id, [sourceId, targetId]))
      .orderBy(packs.id)
      .for("update", { of: packs });
    const source = rows.find((r) => r.id === sourceId);
    const target = rows.find((r) => r.id === targetId);
    if (!source || !target) throw new AppError("not_found", "One of those packs does not exist.");
    if (source.status === "merged" || target.status === "merged")
      throw new AppError("conflict", "One of those packs has already been merged.");
    if (source.cells !== target.cells)
      throw new AppError("conflict", "Those packs have different cell counts; they are not the same product.");
    const moved = await movePackInto(tx, actorId, sourceId, targetId, "pack.merge", {
      sourceSlug: source.slug,
      targetSlug: target.slug,
    });
    const touched = {
      packSlugs: [source.slug, target.slug],
      makerSlugs: [source.makerSlug, target.makerSlug],
      packIds: [targetId],
    };
    return { movedResults: moved.length, touched };
  });
}

/** Merges a duplicate maker into another: its packs (and so their results) move, the duplicate is kept as "merged". */
export async function mergeMakerRows(
  actorId: string,
  sourceId: number,
  targetId: number,
): Promise<{ movedPacks: number; touched: Touched }> {
  if (sourceId === targetId) throw new AppError("bad_request", "Choose two different makers.");
  return db.transaction(async (tx) => {
    const rows = await tx
      .select()
      .from(makers)
      .where(inArray(makers.id, [sourceId, targetId]))
      .orderBy(makers.id)
      .for("update");
    const source = rows.find((r) => r.id === sourceId);
    const target = rows.find((r) => r.id === targetId);
    if (!source || !target) throw new AppError("not_found", "One of those makers does not exist.");
    if (source.status === "merged" || target.status === "merged")
      throw new AppError("conflict", "One of those makers has already been merged.");
    const moved = await tx
      .update(packs)
      .set({ makerId: targetId, updatedAt: new Date() })
      .where(eq(packs.makerId, sourceId))
      .returning({ id: packs.id, slug: packs.slug });
    await tx
      .update(makers)
      .set({ status: "merged", mergedIntoId: targetId })
      .where(and(eq(makers.id, sourceId), ne(makers.status, "merged")));
    await tx.insert(auditEvents).values({
      actorId,
      action: "maker.merge",
      entityType: "maker",
      entityId: String(sourceId),
      data: { into: targetId, sourceSlug: source.slug, targetSlug: target.slug, movedPackIds: moved.map((m) => m.id) },
    });
    const touched = {
      packSlugs: moved.map((p) => p.slug),
      makerSlugs: [source.slug, target.slug],
      packIds: moved.map((p) => p.id),
    };
    return { movedPacks: moved.length, touched };
  });
}
