// GET /data/datapackage.json — the Data Package (v2) descriptor of the complete, dated and versioned dump.
import { dataPackageResponse } from "@/lib/api-contract/service-responses";
import { dataPackageDescriptor } from "@/lib/open-data/datapackage";
import { apiGet, apiOptions, plainJson } from "@/server/api";
import { env } from "@/server/env";

export const GET = apiGet(async (req) => {
  // The day, not the instant: the descriptor (and so its ETag) changes only when the schema or the day does.
  const today = new Date(`${new Date().toISOString().slice(0, 10)}T00:00:00Z`);
  return plainJson(req, dataPackageResponse, dataPackageDescriptor(env().APP_URL, today), {
    "Cache-Control": "public, max-age=300",
  });
});
export const OPTIONS = apiOptions;
