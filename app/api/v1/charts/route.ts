// GET /api/v1/charts — saved (curated) charts with their full state and links, paged.
// POST /api/v1/charts — add a chart to the curated list (signed-in, "chart.save"); anyone can publish a permalink without it.
import { randomBytes } from "node:crypto";
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { listSavedCharts } from "@/db/queries/open-data/charts";
import { insertSavedChart } from "@/db/mutations/saved-charts";
import { AppError } from "@/lib/errors";
import { pageQuery } from "@/lib/api-contract/queries";
import { chartList } from "@/lib/api-contract/responses";
import { apiGet, apiJson, apiOptions, pageOf, parseQuery } from "@/server/api";
import { savedChartJson } from "@/lib/open-data/chart-links";
import { chartState } from "@/lib/open-data/chart-state";
import { withPermission } from "@/server/route";

export const GET = apiGet(async (req) => {
  const q = parseQuery(req, pageQuery);
  const charts = await listSavedCharts();
  const page = pageOf(req, q, charts.length);
  const data = charts.slice((q.page - 1) * q.size, q.page * q.size).map(savedChartJson);
  return apiJson(req, chartList, { data, meta: page.meta, links: page.links }, page.headers);
});
const saveBody = z.object({ state: chartState });

export const POST = withPermission("chart.save", async (req, _ctx, user) => {
  if (!user) throw new AppError("unauthenticated", "Please sign in first.");
  const body: unknown = await req.json().catch(() => null);
  const { state } = saveBody.parse(body);
  const slug =
    state.title
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, "-")
      .replace(/^-|-$/g, "")
      .slice(0, 40) || "chart";
  const id = `${slug}-${randomBytes(4).toString("hex")}`;
  const row = await insertSavedChart({
    id,
    kind: state.kind,
    title: state.title,
    note: state.note ?? null,
    state,
    createdById: user.id,
  });
  try {
    revalidatePath("/charts");
  } catch {
    // Outside a Next request (tests, scripts) there is no cache to revalidate.
  }
  return Response.json(
    { data: savedChartJson({ ...row, kind: state.kind, title: state.title, note: state.note ?? null, state }) },
    { status: 201 },
  );
});

export const OPTIONS = apiOptions;
