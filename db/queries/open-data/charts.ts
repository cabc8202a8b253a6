// Saved (curated) charts.
import "server-only";
import { desc, eq } from "drizzle-orm";
import { db } from "@/db";
import { savedCharts } from "@/db/schema";

export type SavedChartRow = {
  id: string;
  kind: "label-check" | "curves" | "maker-ranking";
  title: string;
  note: string | null;
  state: Record<string, unknown>;
  createdAt: Date;
};

const columns = {
  id: savedCharts.id,
  kind: savedCharts.kind,
  title: savedCharts.title,
  note: savedCharts.note,
  state: savedCharts.state,
  createdAt: savedCharts.createdAt,
};

export async function listSavedCharts(): Promise<SavedChartRow[]> {
  return db.select(columns).from(savedCharts).orderBy(desc(savedCharts.createdAt), desc(savedCharts.id));
}

export async function getSavedChart(id: string): Promise<SavedChartRow | null> {
  const rows = await db.select(columns).from(savedCharts).where(eq(savedCharts.id, id)).limit(1);
  return rows[0] ?? null;
}
