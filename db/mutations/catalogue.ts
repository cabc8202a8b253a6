// Catalogue proposals made with a submission: a new maker and/or pack, status 'proposed', waiting for
// moderation together with the result. They run inside the submission's transaction.
import "server-only";
import { eq, like, or, sql } from "drizzle-orm";
import type { Executor } from "@/db";
import type { PackLabelFields } from "@/lib/catalogue";
import { makers, packs } from "@/db/schema";
import { slugify } from "@/lib/slug";

export type PackProposal = { makerId: number | null; makerName: string | null; model: string } & PackLabelFields;

/** The first free slug among base, base-2, base-3 … in a table's slug column. */
async function freeSlug(tx: Executor, table: typeof makers | typeof packs, base: string): Promise<string> {
  const taken = new Set(
    (
      await tx
        .select({ slug: table.slug })
        .from(table)
        .where(or(eq(table.slug, base), like(table.slug, `${base}-%`)))
    ).map((r) => r.slug),
  );
  if (!taken.has(base)) return base;
  for (let n = 2; ; n++) if (!taken.has(`${base}-${n}`)) return `${base}-${n}`;
}

/** An existing maker by name (any case), or a new proposed one. */
async function makerFor(tx: Executor, name: string, proposedById: string): Promise<number> {
  const existing = await tx
    .select({ id: makers.id })
    .from(makers)
    .where(sql`lower(${makers.name}) = lower(${name})`)
    .limit(1);
  if (existing[0]) return existing[0].id;
  const slug = await freeSlug(tx, makers, slugify(name));
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
  const [maker] = await tx.select({ slug: makers.slug }).from(makers).where(eq(makers.id, makerId)).limit(1);
  const slug = await freeSlug(tx, packs, `${maker?.slug ?? "maker"}-${slugify(proposal.model)}`.slice(0, 110));
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
