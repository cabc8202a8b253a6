// GET /embed/chart/{state…} — the frameable chart: a static HTML document with no framework script
// (components/charts/embed/embed-document.tsx). The URL carries the whole chart; documents are made on first
// request and kept (force-static, revalidated hourly and by the tags of the reads underneath), so CDNs may cache
// them. proxy.ts has already sent other splits of the state to the canonical one.
import { createElement } from "react";
import { z } from "zod";
import { toMarkup } from "@/components/charts/draw/markup";
import { EmbedDocument } from "@/components/charts/embed/embed-document";
import { AppError } from "@/lib/errors";
import { chartLinks } from "@/lib/open-data/chart-links";
import { decodeChartStateSegments } from "@/lib/open-data/chart-state";
import { loadChartData } from "@/server/open-data/load-chart-data";
import { withPermission } from "@/server/route";

export const revalidate = 3600;
export const dynamic = "force-static";
export async function generateStaticParams(): Promise<{ state: string[] }[]> {
  return [];
}

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
      "Cache-Control": "public, max-age=300, s-maxage=3600, stale-while-revalidate=86400",
    },
  });
});
