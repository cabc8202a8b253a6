// GET /embed/chart/{state…} — the frameable chart: a static HTML document with no framework script
// (components/charts/embed/embed-document.tsx). The URL carries the whole chart, and anyone can make up a new
// one, so the document is drawn per request and nothing is stored per link; its data comes from the tagged cached
// reads of one like-for-like group (bounded keys), and shared caches may keep it (Cache-Control below, as
// next.config.mjs sends for chart pages). proxy.ts has already sent other splits of the state to the canonical one.
import { createElement } from "react";
import { z } from "zod";
import { toMarkup } from "@/components/charts/draw/markup";
import { EmbedDocument } from "@/components/charts/embed/embed-document";
import { AppError } from "@/lib/errors";
import { chartLinks } from "@/lib/open-data/chart-links";
import { decodeChartStateSegments } from "@/lib/open-data/chart-state";
import { loadChartData } from "@/server/open-data/load-chart-data";
import { withPermission } from "@/server/route";

export const dynamic = "force-dynamic";

const params = z.object({ state: z.array(z.string().max(200)).min(1).max(40) });

export const GET = withPermission<{ params: Promise<{ state: string[] }> }>("public", async (_req, ctx) => {
  const p = params.safeParse(await ctx.params);
  const state = p.success ? decodeChartStateSegments(p.data.state) : null;
  if (!state) throw new AppError("not_found", "No such chart.");
  const data = await loadChartData(state);
  const html = `<!DOCTYPE html>${toMarkup(createElement(EmbedDocument, { data, permalink: chartLinks(state).permalink }))}`;
  return new Response(html, {
    headers: {
      "Content-Type": "text/html; charset=utf-8",
      "Cache-Control": "public, max-age=0, s-maxage=3600, stale-while-revalidate=86400",
    },
  });
});
