// GET /api/v1/openapi.json — the OpenAPI 3.1 description of the public read API.
import { env } from "@/server/env";
import { apiGet, apiOptions, corsHeaders, API_CACHE_CONTROL } from "@/server/api";
import { openApiDocument } from "@/lib/open-data/openapi";

export const GET = apiGet(async () =>
  Response.json(openApiDocument(env().APP_URL), { headers: { ...corsHeaders, "Cache-Control": API_CACHE_CONTROL } }),
);
export const OPTIONS = apiOptions;
