// The Data Package (v2) descriptor of the complete dump — one tabular resource per file, each with its Table
// Schema (types, units in descriptions, constraints, primary and foreign keys) — the licence, how to credit, and
// the counting rule; and the README served beside the files. Built from the same field lists as the files.
import { describeField, type Field } from "./field-kit";
import { makerFields, packFields } from "./fields";
import {
  ATTRIBUTION,
  ATTRIBUTION_TEXT,
  DATA_LICENCE_LABEL,
  DATA_LICENCE_SPDX,
  DATA_LICENCE_TITLE,
  DATA_LICENCE_URL,
  DATA_SCHEMA_VERSION,
  PUBLISHED_RULE,
} from "./licence";
import { resultFields } from "./result-fields";

export const DATASETS = ["makers", "packs", "results"] as const;
export type Dataset = (typeof DATASETS)[number];

/** The README served beside the files (GET /data/download/README.txt). */
export const README_FILE = "README.txt";

const licenses = [{ name: DATA_LICENCE_SPDX, path: DATA_LICENCE_URL, title: DATA_LICENCE_TITLE }];

type ForeignKey = { fields: string[]; reference: { resource: string; fields: string[] } };

function tableSchema<R>(fields: Field<R>[], foreignKeys: ForeignKey[]) {
  return {
    $schema: "https://datapackage.org/profiles/2.0/tableschema.json",
    fields: fields.map((f) => ({
      name: f.name,
      type: f.type,
      description: describeField(f),
      ...(f.type === "date" ? { format: "default" } : {}),
      ...(f.constraints ? { constraints: f.constraints } : {}),
    })),
    missingValues: [""],
    primaryKey: ["id"],
    ...(foreignKeys.length ? { foreignKeys } : {}),
  };
}

const DATASET_DESCRIPTIONS: Record<Dataset, string> = {
  makers: "Makers: the brands on pack labels, with their numbers of packs and published results.",
  packs: "Packs as sold: maker, model, cells in series, rated capacity and labelled C ratings.",
  results: "Published results: one test of one pack each, with its method card and the figures computed from the log.",
};

export function fileName(dataset: Dataset, ext: "csv" | "json", date: string): string {
  return `sagline-${dataset}-${date}-v${DATA_SCHEMA_VERSION}.${ext}`;
}

/** RFC 4180 as the Data Package's CSV dialect says it: comma, double quotes doubled, CRLF, a header row. */
const dialect = {
  $schema: "https://datapackage.org/profiles/2.0/tabledialect.json",
  delimiter: ",",
  doubleQuote: true,
  lineTerminator: "\r\n",
  quoteChar: '"',
  header: true,
};

export function dataPackageDescriptor(baseUrl: string, createdAt: Date) {
  const resource = <R>(name: Dataset, fields: Field<R>[], fks: ForeignKey[]) => ({
    name,
    type: "table",
    profile: "tabular-data-resource",
    $schema: "https://datapackage.org/profiles/2.0/dataresource.json",
    path: `${baseUrl}/data/download/${name}.csv`,
    title: `Sagline ${name}`,
    description: DATASET_DESCRIPTIONS[name],
    format: "csv",
    mediatype: "text/csv",
    encoding: "utf-8",
    licenses,
    dialect,
    schema: tableSchema(fields, fks),
  });
  return {
    $schema: "https://datapackage.org/profiles/2.0/datapackage.json",
    profile: "tabular-data-package",
    name: "sagline",
    id: `${baseUrl}/data/datapackage.json`,
    title: "Sagline — independently measured LiPo pack results",
    description: `Independent measurements of lithium-polymer packs against their labels, each with its method card. ${PUBLISHED_RULE} Each published result's raw log is downloadable under the same licence at /api/v1/results/{id}/log. ${ATTRIBUTION_TEXT} Read ${baseUrl}/data/download/${README_FILE} first.`,
    homepage: `${baseUrl}/data`,
    version: DATA_SCHEMA_VERSION,
    created: createdAt.toISOString(),
    keywords: ["lithium-polymer", "battery", "RC", "measurements", "open data"],
    licenses,
    contributors: [{ title: ATTRIBUTION, roles: ["creator"], path: baseUrl }],
    sources: [{ title: "Sagline", path: baseUrl }],
    resources: [
      resource("makers", makerFields, []),
      resource("packs", packFields, [{ fields: ["makerId"], reference: { resource: "makers", fields: ["id"] } }]),
      resource("results", resultFields, [{ fields: ["packId"], reference: { resource: "packs", fields: ["id"] } }]),
    ],
  };
}

/** The README beside the files: what they are, the licence and how to credit, the counting rule, the logs. */
export function readmeText(baseUrl: string): string {
  const files = DATASETS.map(
    (d) => `  ${d}.csv, ${d}.json   ${DATASET_DESCRIPTIONS[d]}\n    ${baseUrl}/data/download/${d}.csv`,
  );
  return [
    `Sagline open data — schema version ${DATA_SCHEMA_VERSION}`,
    "",
    "Files",
    ...files,
    `  datapackage.json    The Data Package descriptor: every field's type, unit, digits and constraints, keys.`,
    `    ${baseUrl}/data/datapackage.json`,
    "",
    "Format",
    "  CSV per RFC 4180: UTF-8, comma-separated, fields with commas, quotes or line breaks in double quotes",
    "  (a quote inside doubled), CRLF line ends, the first row is the header. Empty field = no value.",
    "  Numbers are rounded to the decimal places each field states. Free-text cells that could start a",
    "  spreadsheet formula (= + - @ tab) begin with a single quote (').",
    "  JSON files hold the same records as { data, meta, links }.",
    "",
    "Uncertainty",
    "  A results field ending in U95 (capacityMahU95 beside capacityMah, and so on) is that figure's expanded",
    "  uncertainty, same unit: k = 2, about 95 %, by the GUM (JCGM 100:2008) from the bench's stated instrument",
    "  accuracy, or Sagline's stated default where none is stated. An estimate, not a measurement.",
    `  How it is worked out: ${baseUrl}/methods#uncertainty`,
    "",
    "Which results count",
    `  ${PUBLISHED_RULE}`,
    "",
    "Raw logs",
    `  Each published result's log, as uploaded: ${baseUrl}/api/v1/results/{id}/log (ETag = its SHA-256).`,
    "  Recompute its figures with the open command-line tool: npm run analyse -- <log> --cells … --rated-mah …",
    "  (the result's page shows the exact command).",
    "",
    "Licence and credit",
    `  ${DATA_LICENCE_TITLE} (${DATA_LICENCE_LABEL}, SPDX ${DATA_LICENCE_SPDX}), ${DATA_LICENCE_URL}`,
    `  You may copy, adapt and publish the data, commercially too, if you credit ${ATTRIBUTION} and link the licence.`,
    `  Suggested credit: ${ATTRIBUTION_TEXT}`,
    "",
  ].join("\r\n");
}
