// Saved charts: anyone signed in may save one; the public list (/charts, GET /api/v1/charts) shows only the
// ones a moderator featured, newest feature first, a page at a time. /review/charts lists them all.
import "server-only";
import { count, desc, eq, isNotNull } from "drizzle-orm";
import { db } from "@/db";
import { savedCharts, users } from "@/db/schema";

export type SavedChartRow = {
  id: string;
  kind: "label-check" | "curves" | "maker-ranking";
  title: string;
  note: string | null;
  state: Record<string, unknown>;
  createdAt: Date;
  featuredAt: Date | null;
};

const columns = {
  id: savedCharts.id,
  kind: savedCharts.kind,
  title: savedCharts.title,
  note: savedCharts.note,
  state: savedCharts.state,
  createdAt: savedCharts.createdAt,
  featuredAt: savedCharts.featuredAt,
};

export type ChartPage = { rows: SavedChartRow[]; total: number };

const featured = isNotNull(savedCharts.featuredAt);

/** One page of the featured charts (page from 1). */
export async function listFeaturedCharts(page: number, size: number): Promise<ChartPage> {
  const [c] = await db.select({ n: count() }).from(savedCharts).where(featured);
  const rows = await db
    .select(columns)
    .from(savedCharts)
    .where(featured)
    .orderBy(desc(savedCharts.featuredAt), desc(savedCharts.id))
    .limit(size)
    .offset((page - 1) * size);
  return { rows, total: c?.n ?? 0 };
}

export type SavedChartForReview = SavedChartRow & { savedBy: string | null };

/** Every saved chart, newest first, with who saved it (moderators decide which to feature). */
export async function listSavedChartsForReview(
  page: number,
  size: number,
): Promise<{ rows: SavedChartForReview[]; total: number }> {
  const [c] = await db.select({ n: count() }).from(savedCharts);
  const rows = await db
    .select({ ...columns, savedByName: users.displayName, savedByEmail: users.email })
    .from(savedCharts)
    .leftJoin(users, eq(users.id, savedCharts.createdById))
    .orderBy(desc(savedCharts.createdAt), desc(savedCharts.id))
    .limit(size)
    .offset((page - 1) * size);
  return {
    rows: rows.map(({ savedByName, savedByEmail, ...r }) => ({ ...r, savedBy: savedByName ?? savedByEmail })),
    total: c?.n ?? 0,
  };
}

/** One saved chart by id, featured or not (its link is shareable either way). */
export async function getSavedChart(id: string): Promise<SavedChartRow | null> {
  const rows = await db.select(columns).from(savedCharts).where(eq(savedCharts.id, id)).limit(1);
  return rows[0] ?? null;
}
