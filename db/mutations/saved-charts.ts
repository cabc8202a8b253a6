// Saving a chart to the curated list (signed-in roles with "chart.save"). The state is stored whole.
import "server-only";
import { db } from "@/db";
import { savedCharts } from "@/db/schema";

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
