// Builds download files (CSV and JSON) for a dataset, complete or filtered.
import "server-only";
import { listAllMakers, listAllPacks } from "@/db/queries/open-data/packs";
import { listAllResults } from "@/db/queries/open-data/results";
import type { ResultFilters } from "@/lib/validations/open-data";
import { toCsv, type CsvColumn } from "@/lib/open-data/csv";
import { convertColumns, DEFAULT_UNITS, isDefaultUnits, writeUnitsParam, type UnitPrefs } from "@/lib/units";
import { fileName, headerNote, type Dataset } from "@/lib/open-data/datapackage";
import { makerFields, packFields, resultFields } from "@/lib/open-data/fields";
import { licenceInfo } from "@/lib/open-data/licence";

export type DownloadFile = { body: string; contentType: string; fileName: string };

async function rowsOf(dataset: Dataset, filters: ResultFilters) {
  if (dataset === "makers") return { rows: await listAllMakers(), kind: dataset } as const;
  if (dataset === "packs") return { rows: await listAllPacks(filters), kind: dataset } as const;
  return { rows: await listAllResults(filters), kind: dataset } as const;
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
  now = new Date(),
  units: UnitPrefs = DEFAULT_UNITS,
): Promise<DownloadFile> {
  const date = now.toISOString().slice(0, 10);
  const note = headerNote(dataset, date);
  // CSV only: the reader's units, each converted column named with its unit (the JSON and the API stay SI).
  const convert = <R>(columns: CsvColumn<R>[]) => convertColumns<R, CsvColumn<R>>(columns, units, cellsOf);
  if (format === "csv" && !isDefaultUnits(units))
    note.push(
      `Units: ${writeUnitsParam(units)} as asked (units=…); converted columns name their unit; the Data Package describes the SI files.`,
    );
  const filtered = Object.keys(filters).length > 0;
  const data = await rowsOf(dataset, filters);
  if (format === "json") {
    const body = JSON.stringify(
      {
        note,
        licence: licenceInfo,
        filters: filtered ? filters : null,
        exportedAt: now.toISOString(),
        data: data.rows,
      },
      null,
      1,
    );
    return { body, contentType: "application/json; charset=utf-8", fileName: fileName(dataset, "json", date) };
  }
  const body =
    data.kind === "makers"
      ? toCsv(convert(makerFields), data.rows, note)
      : data.kind === "packs"
        ? toCsv(convert(packFields), data.rows, note)
        : toCsv(convert(resultFields), data.rows, note);
  return { body, contentType: "text/csv; charset=utf-8; header=present", fileName: fileName(dataset, "csv", date) };
}
