// GET /data/datapackage.json — the Data Package (v2) descriptor of the complete, dated and versioned dump.
import { env } from "@/server/env";
import { apiGet, corsHeaders } from "@/server/api";
import { dataPackageDescriptor } from "@/lib/open-data/datapackage";

export const GET = apiGet(async () =>
  Response.json(dataPackageDescriptor(env().APP_URL, new Date()), {
    headers: { ...corsHeaders, "Cache-Control": "public, max-age=300" },
  }),
);
