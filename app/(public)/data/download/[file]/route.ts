// GET /data/download/{makers|packs|results}.{csv|json} and README.txt — complete or filtered downloads (the packs
// table's filters; results also by pack and group), with ETags (304) and the licence beside them.
import { downloadPath, downloadQuery } from "@/lib/api-contract/queries";
import { DATASETS } from "@/lib/open-data/datapackage";
import { DATA_LICENCE_URL } from "@/lib/open-data/licence";
import { parseUnitsParam } from "@/lib/units";
import { apiGet, apiOptions, checkContract, parsePath, parseQuery, sendCached } from "@/server/api";
import { env } from "@/server/env";
import { buildDownload, readmeFile } from "@/server/open-data/downloads";

export const GET = apiGet<{ file: string }>(async (req, params) => {
  const { file } = parsePath(
    params,
    downloadPath,
    "No such file: makers, packs or results as .csv or .json, or README.txt.",
  );
  const { units, ...filters } = parseQuery(req, downloadQuery);
  const [name, ext] = file.split(".");
  const dataset = DATASETS.find((d) => d === name);
  const out = dataset
    ? await buildDownload(
        dataset,
        ext === "json" ? "json" : "csv",
        filters,
        env().APP_URL,
        new Date(),
        parseUnitsParam(units),
      )
    : readmeFile(env().APP_URL);
  if (out.checked) checkContract(out.checked.schema, out.checked.value);
  return sendCached(req, {
    body: out.body,
    contentType: out.contentType,
    headers: {
      "Content-Disposition": `attachment; filename="${out.fileName}"`,
      "Cache-Control": "public, max-age=300",
      Link: `<${DATA_LICENCE_URL}>; rel="license", </data/datapackage.json>; rel="describedby", </data/download/README.txt>; rel="help"`,
    },
  });
});
export const OPTIONS = apiOptions;
