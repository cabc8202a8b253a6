// GET /api/oembed — oEmbed for Sagline charts: JSON only (501 otherwise), 404 for URLs that are not charts.
import { oembedResponse as oembedSchema } from "@/lib/api-contract/service-responses";
import { AppError } from "@/lib/errors";
import { oembedQuery, oembedResponse } from "@/lib/open-data/oembed";
import { apiGet, apiOptions, corsHeaders, parseQuery, plainJson } from "@/server/api";
import { env } from "@/server/env";

export const GET = apiGet(async (req) => {
  const q = parseQuery(req, oembedQuery);
  if (q.format !== undefined && q.format !== "json") {
    return new Response("Only the json format is available.", {
      status: 501,
      headers: { ...corsHeaders, "Content-Type": "text/plain; charset=utf-8" },
    });
  }
  const body = oembedResponse(q.url, env().APP_URL, q.maxwidth, q.maxheight);
  if (!body) throw new AppError("not_found", "That URL is not a Sagline chart.");
  return plainJson(req, oembedSchema, body, { "Cache-Control": "public, max-age=3600" });
});
export const OPTIONS = apiOptions;
