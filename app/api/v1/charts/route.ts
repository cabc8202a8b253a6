// GET /api/v1/charts — the featured charts (chosen by moderators), newest feature first, a page at a time, with
// their full state and links. POST /api/v1/charts — save a chart (signed-in, "chart.save", limited per
// account): it gets an id whose link anyone can open; moderators decide whether it is listed.
import { randomBytes } from "node:crypto";
import { z } from "zod";
import { insertSavedChart } from "@/db/mutations/saved-charts";
import { AppError } from "@/lib/errors";
import { chartListQuery } from "@/lib/api-contract/queries";
import { chartList } from "@/lib/api-contract/responses";
import { apiGet, apiJson, apiOptions, pageOf, parseQuery } from "@/server/api";
import { savedChartJson } from "@/lib/open-data/chart-links";
import { chartState } from "@/lib/open-data/chart-state";
import { cachedFeaturedCharts } from "@/server/public-data";
import { enforceRateLimit, limits } from "@/server/rate-limit";
import { withPermission } from "@/server/route";

export const GET = apiGet(async (req) => {
  const q = parseQuery(req, chartListQuery);
  const { rows, total } = await cachedFeaturedCharts(q.page, q.size);
  const page = pageOf(req, q, total);
  return apiJson(req, chartList, { data: rows.map(savedChartJson), meta: page.meta, links: page.links }, page.headers);
});
const saveBody = z.object({ state: chartState });

export const POST = withPermission("chart.save", async (req, _ctx, user) => {
  if (!user) throw new AppError("unauthenticated", "Please sign in first.");
  await enforceRateLimit(`chart-save:user:${user.id}`, limits.chartSavePerUser);
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
  return Response.json(
    {
      data: savedChartJson({
        ...row,
        kind: state.kind,
        title: state.title,
        note: state.note ?? null,
        state,
        featuredAt: null,
      }),
    },
    { status: 201 },
  );
});

export const OPTIONS = apiOptions;
