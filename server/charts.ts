// Featuring saved charts: the write and its audit event in one transaction (db/mutations/saved-charts.ts),
// then the public list (/charts, GET /api/v1/charts) is refreshed by its tag.
import "server-only";
import { writeChartFeatured } from "@/db/mutations/saved-charts";
import { cacheTags } from "@/server/cache-tags";
import { revalidateTags } from "@/server/revalidate";

export async function setChartFeatured(
  actorId: string,
  chartId: string,
  featured: boolean,
): Promise<{ chartId: string; featured: boolean; changed: boolean }> {
  const out = await writeChartFeatured(actorId, chartId, featured);
  if (out.changed) revalidateTags([cacheTags.charts]);
  return out;
}
