// GET /data/download/{makers|packs|results}.{csv|json} — complete or filtered downloads (pack filters; results also by pack and group).
import { z } from "zod";
import { DATASETS } from "@/lib/open-data/datapackage";
import { buildDownload } from "@/server/open-data/downloads";
import { apiGet, corsHeaders, parseQuery } from "@/server/api";
import { DATA_LICENCE_URL } from "@/lib/open-data/licence";
import { resultFilters } from "@/lib/validations/open-data";
import { parseUnitsParam } from "@/lib/units";

const unitsQuery = z.object({
  units: z
    .string()
    .regex(
      /^(C|F|g|oz|cell|pack)(,(C|F|g|oz|cell|pack))*$/,
      "units takes C or F, g or oz, cell or pack, comma-separated.",
    )
    .optional(),
});

const fileParam = z.object({
  file: z
    .string()
    .regex(new RegExp(`^(${DATASETS.join("|")})\\.(csv|json)$`), "Ask for makers, packs or results as .csv or .json."),
});

export const GET = apiGet<{ file: string }>(async (req, params) => {
  const { file } = fileParam.parse(params);
  const [name, ext] = file.split(".");
  const dataset = z.enum(DATASETS).parse(name);
  const format = z.enum(["csv", "json"]).parse(ext);
  const filters = parseQuery(req, resultFilters);
  // The reader's units for CSV (lib/units.ts): "units=F,oz,pack"; anything else is refused with 422.
  const units = parseUnitsParam(parseQuery(req, unitsQuery).units);
  const out = await buildDownload(dataset, format, filters, new Date(), units);
  return new Response(out.body, {
    headers: {
      ...corsHeaders,
      "Content-Type": out.contentType,
      "Content-Disposition": `attachment; filename="${out.fileName}"`,
      "Cache-Control": "public, max-age=300",
      Link: `<${DATA_LICENCE_URL}>; rel="license", </data/datapackage.json>; rel="describedby"`,
    },
  });
});
