// Saved charts: anyone signed in saves one (never listed by itself); a moderator features or unfeatures it
// for the public list, in one transaction with its audit event.
import "server-only";
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { auditEvents, savedCharts } from "@/db/schema";
import { AppError } from "@/lib/errors";

export type NewSavedChart = {
  id: string;
  kind: "label-check" | "curves" | "maker-ranking";
  title: string;
  note: string | null;
  state: Record<string, unknown>;
  createdById: string;
};

export async function insertSavedChart(chart: NewSavedChart): Promise<{ id: string; createdAt: Date }> {
  const [row] = await db
    .insert(savedCharts)
    .values(chart)
    .returning({ id: savedCharts.id, createdAt: savedCharts.createdAt });
  if (!row) throw new Error("saved chart not returned");
  return row;
}

/** Features (or unfeatures) a saved chart; the audit log says who, when and which way. */
export async function writeChartFeatured(
  actorId: string,
  chartId: string,
  featured: boolean,
): Promise<{ chartId: string; featured: boolean; changed: boolean }> {
  return db.transaction(async (tx) => {
    const [row] = await tx
      .select({ featuredAt: savedCharts.featuredAt, title: savedCharts.title })
      .from(savedCharts)
      .where(eq(savedCharts.id, chartId))
      .for("update");
    if (!row) throw new AppError("not_found", "That chart does not exist.");
    if ((row.featuredAt !== null) === featured) return { chartId, featured, changed: false };
    await tx
      .update(savedCharts)
      .set(featured ? { featuredAt: new Date(), featuredById: actorId } : { featuredAt: null, featuredById: null })
      .where(eq(savedCharts.id, chartId));
    await tx.insert(auditEvents).values({
      actorId,
      action: featured ? "chart.feature" : "chart.unfeature",
      entityType: "saved_chart",
      entityId: chartId,
      data: { title: row.title },
    });
    return { chartId, featured, changed: true };
  });
}
