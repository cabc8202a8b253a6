// GET /charts/image/{state}/chart.svg|chart.png — the chart drawn on the server (licence inside); ?download=1 saves it.
import { z } from "zod";
import { AppError } from "@/lib/errors";
import { clientIp, enforceRateLimit, limits } from "@/lib/rate-limit";
import { withPermission } from "@/lib/route";
import { loadChartData } from "@/lib/open-data/chart-data";
import { svgToPng } from "@/lib/open-data/chart-png";
import { decodeChartState } from "@/lib/open-data/chart-state";
import { renderChartSvg } from "@/lib/open-data/chart-svg";
import { DATA_LICENCE_URL } from "@/lib/open-data/licence";

const params = z.object({ state: z.string().min(1).max(4000), file: z.enum(["chart.svg", "chart.png"]) });

export const GET = withPermission<{ params: Promise<{ state: string; file: string }> }>("public", async (req, ctx) => {
  await enforceRateLimit(`api:${clientIp(req.headers)}`, limits.apiPerIp);
  const p = params.safeParse(await ctx.params);
  const state = p.success ? decodeChartState(p.data.state) : null;
  if (!p.success || !state) throw new AppError("not_found", "No such chart.");
  const svg = renderChartSvg(await loadChartData(state));
  const png = p.data.file === "chart.png";
  const slug = state.title.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "").slice(0, 60) || "chart";
  const headers: Record<string, string> = {
    "Content-Type": png ? "image/png" : "image/svg+xml; charset=utf-8",
    "Cache-Control": "public, max-age=3600, stale-while-revalidate=86400",
    "Access-Control-Allow-Origin": "*",
    Link: `<${DATA_LICENCE_URL}>; rel="license"`,
  };
  if (new URL(req.url).searchParams.get("download") === "1") headers["Content-Disposition"] = `attachment; filename="sagline-${slug}.${png ? "png" : "svg"}"`;
  return new Response(png ? new Uint8Array(svgToPng(svg)) : svg, { headers });
});
