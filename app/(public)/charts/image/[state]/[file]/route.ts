// GET /charts/image/{state}/chart.svg|chart.png — the chart drawn on the server (licence inside), at the asked
// width/height (and PNG scale); ?download=1 saves it. A bad size answers 400 with what is allowed.
import { z } from "zod";
import { etagOf, ifNoneMatchHits } from "@/server/api";
import { AppError } from "@/lib/errors";
import { clientAddress } from "@/server/client-address";
import { enforceRateLimit, limits } from "@/server/rate-limit";
import { withPermission } from "@/server/route";
import { loadChartData } from "@/server/open-data/load-chart-data";
import { svgToPng } from "@/server/open-data/chart-png";
import { chartSvgMarkup } from "@/components/charts/image/render";
import { parseChartImageSize } from "@/lib/open-data/chart-size";
import { decodeChartState } from "@/lib/open-data/chart-state";
import { DATA_LICENCE_URL } from "@/lib/open-data/licence";

const params = z.object({ state: z.string().min(1).max(4000), file: z.enum(["chart.svg", "chart.png"]) });

export const GET = withPermission<{ params: Promise<{ state: string; file: string }> }>("public", async (req, ctx) => {
  await enforceRateLimit(`api:${clientAddress(req.headers)}`, limits.apiPerIp);
  const p = params.safeParse(await ctx.params);
  const state = p.success ? decodeChartState(p.data.state) : null;
  if (!p.success || !state) throw new AppError("not_found", "No such chart.");
  const png = p.data.file === "chart.png";
  const search = new URL(req.url).searchParams;
  const sized = parseChartImageSize(search, png ? "png" : "svg");
  if (!sized.ok)
    throw new AppError("bad_request", Object.values(sized.fieldErrors).flat().join(" "), sized.fieldErrors);
  const { width, height, scale } = sized.size;
  const svg = chartSvgMarkup(await loadChartData(state), { width, height });
  const slug =
    state.title
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, "-")
      .replace(/^-|-$/g, "")
      .slice(0, 60) || "chart";
  // The drawing carries the size, so its text plus the format and scale is the whole picture: equal tags
  // mean equal bytes, and a 304 skips the PNG render.
  const etag = etagOf(`${png ? `png@${scale}` : "svg"}\n${svg}`);
  const headers: Record<string, string> = {
    "Content-Type": png ? "image/png" : "image/svg+xml; charset=utf-8",
    "Cache-Control": "public, max-age=3600, stale-while-revalidate=86400",
    "Access-Control-Allow-Origin": "*",
    "Access-Control-Expose-Headers": "ETag",
    ETag: etag,
    Link: `<${DATA_LICENCE_URL}>; rel="license"`,
  };
  if (search.get("download") === "1") {
    headers["Content-Disposition"] =
      `attachment; filename="sagline-${slug}-${width * scale}x${height * scale}.${png ? "png" : "svg"}"`;
  }
  if (ifNoneMatchHits(req.headers.get("if-none-match"), etag)) return new Response(null, { status: 304, headers });
  return new Response(png ? new Uint8Array(svgToPng(svg, scale)) : svg, { headers });
});
