// Catalogue proposals: a new maker and/or pack made with a submission (status 'proposed', inside the
// submission's transaction), and what becomes of them when a moderator approves the result (inside the
// decision's transaction): they go live with short slugs, or merge into an existing entry.
import "server-only";
import { and, eq, like, ne, sql } from "drizzle-orm";
import type { Executor, Transaction } from "@/db";
import type { PackLabelFields } from "@/lib/catalogue";
import { auditEvents, makers, packs } from "@/db/schema";
import { AppError } from "@/lib/errors";
import { freeSlugFrom, makerSlug, packSlug } from "@/lib/slug";
import { movePackInto } from "./catalogue-admin";

export type PackProposal = { makerId: number | null; makerName: string | null; model: string } & PackLabelFields;

/** A slug not yet used in the table, made by `make` (shortened by words when a number must be added). */
async function freeSlug(
  tx: Executor,
  table: typeof makers | typeof packs,
  make: (max: number) => string,
  exceptId?: number,
): Promise<string> {
  // Every candidate starts with the slug's first word (the maker's), so those are the slugs to avoid.
  const first = make(60).split("-")[0] ?? "";
  const rows = await tx
    .select({ slug: table.slug })
    .from(table)
    .where(and(like(table.slug, `${first}%`), exceptId === undefined ? undefined : ne(table.id, exceptId)));
  return freeSlugFrom(make, new Set(rows.map((r) => r.slug)));
}

/** An existing maker by name (any case), or a new proposed one. */
async function makerFor(tx: Executor, name: string, proposedById: string): Promise<number> {
  const existing = await tx
    .select({ id: makers.id })
    .from(makers)
    .where(sql`lower(${makers.name}) = lower(${name})`)
    .limit(1);
  if (existing[0]) return existing[0].id;
  const slug = await freeSlug(tx, makers, (max) => makerSlug(name, max));
  const [row] = await tx
    .insert(makers)
    .values({ slug, name, status: "proposed", proposedById })
    .returning({ id: makers.id });
  if (!row) throw new Error("maker insert returned nothing");
  return row.id;
}

export async function createProposedPack(
  tx: Executor,
  proposal: PackProposal,
  proposedById: string,
): Promise<{ packId: number; makerId: number }> {
  const makerId = proposal.makerId ?? (await makerFor(tx, proposal.makerName ?? "", proposedById));
  const [maker] = await tx.select({ name: makers.name }).from(makers).where(eq(makers.id, makerId)).limit(1);
  const facts = { ...proposal, makerName: maker?.name ?? proposal.makerName ?? "" };
  const slug = await freeSlug(tx, packs, (max) => packSlug(facts, max));
  const [row] = await tx
    .insert(packs)
    .values({
      slug,
      makerId,
      model: proposal.model,
      cellsInSeries: proposal.cellsInSeries,
      ratedCapacityMah: proposal.ratedCapacityMah,
      labelledContinuousC: proposal.labelledContinuousC,
      labelledBurstC: proposal.labelledBurstC,
      weightG: proposal.weightG,
      connector: proposal.connector,
      status: "proposed",
      proposedById,
    })
    .returning({ id: packs.id });
  if (!row) throw new Error("pack insert returned nothing");
  return { packId: row.id, makerId };
}

/** What a moderator decided about a result's proposed catalogue entry when approving it. */
export type CatalogueChoice = { intoPackId: number | null; intoMakerId: number | null };

/** Where the approved result's pack ended up, and the old slugs whose cached pages must be dropped. */
export type SettledPack = { packId: number; packSlug: string; makerSlug: string; title: string; oldSlugs: string[] };

async function lockPack(tx: Transaction, packId: number) {
  const [row] = await tx
    .select({ pack: packs, maker: makers })
    .from(packs)
    .innerJoin(makers, eq(makers.id, packs.makerId))
    .where(eq(packs.id, packId))
    .for("update");
  if (!row) throw new AppError("not_found", "That pack does not exist.");
  return row;
}

const sameLabel = (a: PackLabelFields, b: PackLabelFields) =>
  a.cellsInSeries === b.cellsInSeries &&
  a.ratedCapacityMah === b.ratedCapacityMah &&
  a.labelledContinuousC === b.labelledContinuousC;

/** A proposed maker with no live pack left is merged into the maker its pack went to. */
async function retireMaker(tx: Transaction, actorId: string, makerId: number, intoId: number): Promise<void> {
  const [left] = await tx
    .select({ n: sql<number>`count(*)::int` })
    .from(packs)
    .where(and(eq(packs.makerId, makerId), ne(packs.status, "merged")));
  if ((left?.n ?? 0) > 0) return;
  await tx.update(makers).set({ status: "merged", mergedIntoId: intoId }).where(eq(makers.id, makerId));
  await tx.insert(auditEvents).values({
    actorId,
    action: "maker.merge-proposal",
    entityType: "maker",
    entityId: String(makerId),
    data: { into: intoId },
  });
}

/**
 * Approving a result settles its pack, in the decision's transaction: an active pack stays as it is; a
 * proposed pack either merges into an existing active pack with the same label (its results and e-mail
 * requests move) or goes live with a short slug — under its proposed maker (which goes live too) or under an
 * existing maker it is said to be the same as. Each step is an audit event.
 */
export async function settleProposedPack(
  tx: Transaction,
  actorId: string,
  packId: number,
  choice: CatalogueChoice,
): Promise<SettledPack> {
  const { pack, maker } = await lockPack(tx, packId);
  const title = (makerName: string, model: string) => `${makerName} ${model}`;
  if (pack.status === "active" && maker.status === "active") {
    return { packId, packSlug: pack.slug, makerSlug: maker.slug, title: title(maker.name, pack.model), oldSlugs: [] };
  }
  if (pack.status === "merged") throw new AppError("conflict", "This result's pack was merged; reload the page.");
  if (choice.intoPackId !== null) {
    if (pack.status !== "proposed") throw new AppError("conflict", "Only a proposed pack can be merged here.");
    const target = await lockPack(tx, choice.intoPackId);
    if (target.pack.status !== "active" || target.maker.status !== "active")
      throw new AppError("conflict", "Merge a proposal only into a pack that is in the catalogue.");
    if (!sameLabel(pack, target.pack))
      throw new AppError(
        "conflict",
        "That pack's label differs (cells, rated capacity or labelled C), so the figures would not hold. Ask the contributor instead.",
      );
    await movePackInto(tx, actorId, packId, choice.intoPackId, "pack.merge-proposal");
    if (maker.status === "proposed") await retireMaker(tx, actorId, maker.id, target.maker.id);
    return {
      packId: target.pack.id,
      packSlug: target.pack.slug,
      makerSlug: target.maker.slug,
      title: title(target.maker.name, target.pack.model),
      oldSlugs: [pack.slug, maker.slug],
    };
  }
  let live = maker;
  if (choice.intoMakerId !== null && choice.intoMakerId !== maker.id) {
    if (maker.status !== "proposed") throw new AppError("conflict", "Only a proposed maker can be merged here.");
    const [target] = await tx.select().from(makers).where(eq(makers.id, choice.intoMakerId)).for("update");
    if (!target || target.status !== "active")
      throw new AppError("conflict", "Merge a proposed maker only into a maker that is in the catalogue.");
    await tx.update(packs).set({ makerId: target.id, updatedAt: new Date() }).where(eq(packs.id, packId));
    await retireMaker(tx, actorId, maker.id, target.id);
    live = target;
  } else if (maker.status === "proposed") {
    const slug = await freeSlug(tx, makers, (max) => makerSlug(maker.name, max), maker.id);
    await tx.update(makers).set({ status: "active", slug }).where(eq(makers.id, maker.id));
    await tx.insert(auditEvents).values({
      actorId,
      action: "maker.activate",
      entityType: "maker",
      entityId: String(maker.id),
      data: { slug, proposedSlug: maker.slug },
    });
    live = { ...maker, slug, status: "active" };
  }
  let slug = pack.slug;
  if (pack.status === "proposed") {
    const facts = { ...pack, makerName: live.name };
    slug = await freeSlug(tx, packs, (max) => packSlug(facts, max), pack.id);
    await tx.update(packs).set({ status: "active", slug, updatedAt: new Date() }).where(eq(packs.id, packId));
    await tx.insert(auditEvents).values({
      actorId,
      action: "pack.activate",
      entityType: "pack",
      entityId: String(packId),
      data: { slug, proposedSlug: pack.slug, makerId: live.id },
    });
  }
  return {
    packId,
    packSlug: slug,
    makerSlug: live.slug,
    title: title(live.name, pack.model),
    oldSlugs: [pack.slug, maker.slug].filter((s) => s !== slug && s !== live.slug),
  };
}
