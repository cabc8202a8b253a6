// Download files (RFC 4180 CSV or JSON) of a dataset, complete or filtered, and the README beside them. The
// records are the API's (the same field lists, the same pack filter, the same counting rule).
import "server-only";
import { listAllResults } from "@/db/queries/open-data/results";
import type { ResultFilters } from "@/lib/api-contract/queries";
import { makerDownload, packDownload, resultDownload } from "@/lib/api-contract/responses";
import { toCsv } from "@/lib/open-data/csv";
import { fileName, README_FILE, readmeText, type Dataset } from "@/lib/open-data/datapackage";
import type { Field } from "@/lib/open-data/field-kit";
import { makerFields, packFields } from "@/lib/open-data/fields";
import { DATA_LICENCE_URL, DATA_SCHEMA_VERSION, licenceInfo } from "@/lib/open-data/licence";
import { flatRecord, nestedRecord } from "@/lib/open-data/records";
import { resultFields } from "@/lib/open-data/result-fields";
import { convertColumns, DEFAULT_UNITS, type UnitPrefs } from "@/lib/units";
import { toPackParams } from "@/lib/pack-query-params";
import { makerRows, packWhere, requireKnownGroup } from "@/server/open-data/catalogue";
import { findPacks } from "@/server/pack-search";
import type { z } from "zod";

/** A file to send; JSON files also carry their value and response schema, for the contract check. */
export type DownloadFile = {
  body: string;
  contentType: string;
  fileName: string;
  checked: { schema: z.ZodType; value: unknown } | null;
};

async function rowsOf(dataset: Dataset, filters: ResultFilters) {
  if (dataset === "makers") return { kind: dataset, rows: await makerRows() } as const;
  if (dataset === "packs") {
    const list = (await findPacks(toPackParams(filters))).filter((p) => !filters.pack || p.slug === filters.pack);
    return { kind: dataset, rows: list } as const;
  }
  const where = await packWhere(filters);
  return { kind: dataset, rows: await listAllResults({ ...where, pack: filters.pack, group: filters.group }) } as const;
}

function json<R>(
  dataset: Dataset,
  fields: Field<R>[],
  rows: R[],
  filters: ResultFilters,
  baseUrl: string,
  nested = false,
) {
  return {
    data: rows.map((r) => (nested ? nestedRecord(fields, r) : flatRecord(fields, r))),
    meta: { dataset, schemaVersion: DATA_SCHEMA_VERSION, total: rows.length, filters, licence: licenceInfo },
    links: {
      describedby: `${baseUrl}/data/datapackage.json`,
      readme: `${baseUrl}/data/download/${README_FILE}`,
      license: DATA_LICENCE_URL,
    },
  };
}

/** The row's cells in series, where a dataset has them (per-pack columns need it). */
const cellsOf = (r: unknown) =>
  typeof r === "object" && r !== null && "cellsInSeries" in r && typeof r.cellsInSeries === "number"
    ? r.cellsInSeries
    : null;

export async function buildDownload(
  dataset: Dataset,
  format: "csv" | "json",
  filters: ResultFilters,
  baseUrl: string,
  now = new Date(),
  units: UnitPrefs = DEFAULT_UNITS,
): Promise<DownloadFile> {
  await requireKnownGroup(filters.group);
  const date = now.toISOString().slice(0, 10);
  const data = await rowsOf(dataset, filters);
  const name = fileName(dataset, format, date);
  if (format === "json") {
    const [body, schema] =
      data.kind === "makers"
        ? [json(dataset, makerFields, data.rows, filters, baseUrl), makerDownload]
        : data.kind === "packs"
          ? [json(dataset, packFields, data.rows, filters, baseUrl), packDownload]
          : [json(dataset, resultFields, data.rows, filters, baseUrl, true), resultDownload];
    return {
      body: JSON.stringify(body, null, 1),
      contentType: "application/json; charset=utf-8",
      fileName: name,
      checked: { schema, value: body },
    };
  }
  // CSV only: the reader's units (lib/units.ts), each converted column named with its unit; JSON and the API stay SI.
  const convert = <R>(fields: Field<R>[]) => convertColumns<R, Field<R>>(fields, units, cellsOf);
  const body =
    data.kind === "makers"
      ? toCsv(convert(makerFields), data.rows)
      : data.kind === "packs"
        ? toCsv(convert(packFields), data.rows)
        : toCsv(convert(resultFields), data.rows);
  return { body, contentType: "text/csv; charset=utf-8; header=present", fileName: name, checked: null };
}

export function readmeFile(baseUrl: string): DownloadFile {
  return { body: readmeText(baseUrl), contentType: "text/plain; charset=utf-8", fileName: README_FILE, checked: null };
}
