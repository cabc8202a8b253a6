// The Data Package (v2) descriptor of the complete dump: one tabular resource per file, each with its
// Table Schema (types, units in descriptions, constraints, primary and foreign keys), the licence and
// how to attribute. Built from the same field lists as the files themselves.
import { makerFields, packFields, resultFields, type Field } from "./fields";
import {
  ATTRIBUTION,
  ATTRIBUTION_TEXT,
  DATA_LICENCE_NAME,
  DATA_LICENCE_TITLE,
  DATA_LICENCE_URL,
  DATA_SCHEMA_VERSION,
} from "./licence";

export const DATASETS = ["makers", "packs", "results"] as const;
export type Dataset = (typeof DATASETS)[number];

const licenses = [{ name: DATA_LICENCE_NAME, path: DATA_LICENCE_URL, title: DATA_LICENCE_TITLE }];

function tableSchema<R>(
  fields: Field<R>[],
  foreignKeys: { fields: string[]; reference: { resource: string; fields: string[] } }[],
) {
  return {
    $schema: "https://datapackage.org/profiles/2.0/tableschema.json",
    fields: fields.map((f) => ({
      name: f.name,
      type: f.type,
      description: f.description,
      ...(f.type === "date" ? { format: "default" } : {}),
      ...(f.constraints ? { constraints: f.constraints } : {}),
    })),
    missingValues: [""],
    primaryKey: ["id"],
    ...(foreignKeys.length ? { foreignKeys } : {}),
  };
}

const descriptions: Record<Dataset, string> = {
  makers: "Makers: the brands on pack labels.",
  packs: "Packs as sold: maker, model, cells in series, rated capacity and labelled C ratings.",
  results:
    "Approved results: one test of one pack each, with its method card and the figures Sagline computed from the log.",
};

export function fileName(dataset: Dataset, ext: "csv" | "json", date: string): string {
  return `sagline-${dataset}-${date}-v${DATA_SCHEMA_VERSION}.${ext}`;
}

/** Header note lines written at the top of every CSV (as # comments) and into every JSON file. */
export function headerNote(dataset: Dataset, date: string): string[] {
  return [
    `Sagline open data: ${descriptions[dataset]} Schema version ${DATA_SCHEMA_VERSION}, exported ${date}.`,
    `Licence: ${DATA_LICENCE_TITLE} (${DATA_LICENCE_NAME}), ${DATA_LICENCE_URL}. Attribution: ${ATTRIBUTION_TEXT}`,
    "Field definitions, units and keys: datapackage.json (Table Schema). Lines starting with # are comments.",
  ];
}

export function dataPackageDescriptor(baseUrl: string, createdAt: Date) {
  const date = createdAt.toISOString().slice(0, 10);
  const resource = <R>(name: Dataset, fields: Field<R>[], fks: Parameters<typeof tableSchema>[1]) => ({
    name,
    type: "table",
    profile: "tabular-data-resource",
    $schema: "https://datapackage.org/profiles/2.0/dataresource.json",
    path: `${baseUrl}/data/download/${name}.csv`,
    title: `Sagline ${name}`,
    description: `${descriptions[name]} ${headerNote(name, date)[1]}`,
    format: "csv",
    mediatype: "text/csv",
    encoding: "utf-8",
    licenses,
    dialect: {
      $schema: "https://datapackage.org/profiles/2.0/tabledialect.json",
      delimiter: ",",
      doubleQuote: true,
      lineTerminator: "\r\n",
      quoteChar: '"',
      header: true,
      commentChar: "#",
    },
    schema: tableSchema(fields, fks),
  });
  return {
    $schema: "https://datapackage.org/profiles/2.0/datapackage.json",
    profile: "tabular-data-package",
    name: "sagline",
    id: `${baseUrl}/data/datapackage.json`,
    title: "Sagline — independently measured LiPo pack results",
    description: `Independent measurements of lithium-polymer packs against their labels, each with its method card. Only approved results are included. ${ATTRIBUTION_TEXT}`,
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
