// The OpenAPI 3.1 document served at /api/v1/openapi.json, built from the same field lists as the downloads.
import { makerFields, packFields, resultFields, type Field } from "./fields";
import { ATTRIBUTION_TEXT, DATA_LICENCE_NAME, DATA_LICENCE_URL, DATA_SCHEMA_VERSION } from "./licence";

type Schema = Record<string, unknown>;

function fieldSchema<R>(field: Field<R>): Schema {
  const base = field.type === "date" ? { type: "string", format: "date" } : field.type === "datetime" ? { type: "string", format: "date-time" } : { type: field.type };
  const c = field.constraints ?? {};
  return {
    ...base,
    ...(c.required ? {} : { type: [base.type, "null"] }),
    description: field.description,
    ...(c.enum ? { enum: c.required ? c.enum : [...c.enum, null] } : {}),
    ...(c.minimum !== undefined ? { minimum: c.minimum } : {}),
    ...(c.maximum !== undefined ? { maximum: c.maximum } : {}),
  };
}

function objectSchema<R>(fields: Field<R>[], extra: Record<string, Schema> = {}): Schema {
  return {
    type: "object",
    properties: { ...Object.fromEntries(fields.map((f) => [f.name, fieldSchema(f)])), ...extra },
    required: fields.filter((f) => f.constraints?.required).map((f) => f.name),
  };
}

const METHOD_CARD = new Set(["ambientTemperatureC", "packStartTemperatureC", "loadMode", "loadCurrentA", "loadRateC", "cutoffVPerCell", "stopTemperatureC", "resistanceMethod", "equipment", "sampleRateHz", "cyclesBeforeTest"]);
const RESULT_TOP = new Set(["id", "packId", "groupKey", "testedOn", "publishedAt", "notes"]);

const pageParams = [
  { name: "page", in: "query", schema: { type: "integer", minimum: 1, default: 1 } },
  { name: "size", in: "query", schema: { type: "integer", minimum: 1, maximum: 200, default: 50 } },
];
const packPageParams = [
  { name: "page", in: "query", schema: { type: "integer", minimum: 1, default: 1 } },
  { name: "size", in: "query", schema: { type: "integer", enum: [10, 25, 50, 100], default: 25 } },
  { name: "sort", in: "query", schema: { type: "string" } },
  { name: "dir", in: "query", schema: { type: "string", enum: ["asc", "desc"] } },
  { name: "group", in: "query", description: "Like-for-like group key: adds per-pack medians in that group.", schema: { type: "string" } },
];
const packFilterParams = [
  { name: "maker", in: "query", description: "Maker slug.", schema: { type: "string" } },
  { name: "cells", in: "query", description: "Cells in series (S).", schema: { type: "integer", minimum: 1, maximum: 14 } },
  { name: "connector", in: "query", schema: { type: "string" } },
  { name: "minMah", in: "query", description: "Rated capacity from, mAh.", schema: { type: "number" } },
  { name: "maxMah", in: "query", description: "Rated capacity up to, mAh.", schema: { type: "number" } },
  { name: "minC", in: "query", description: "Labelled continuous C from.", schema: { type: "number" } },
  { name: "maxC", in: "query", description: "Labelled continuous C up to.", schema: { type: "number" } },
  { name: "minG", in: "query", description: "Weight from, g.", schema: { type: "number" } },
  { name: "maxG", in: "query", description: "Weight up to, g.", schema: { type: "number" } },
  { name: "q", in: "query", description: "Text search in maker and model.", schema: { type: "string" } },
];
const listOf = (ref: string) => ({
  type: "object",
  properties: { data: { type: "array", items: { $ref: `#/components/schemas/${ref}` } }, meta: { $ref: "#/components/schemas/PageMeta" }, links: { type: "object" } },
});
const ok = (schema: Schema, description = "OK") => ({
  description,
  headers: { ETag: { schema: { type: "string" } }, "Cache-Control": { schema: { type: "string" } } },
  content: { "application/json": { schema } },
});
const errors = {
  "304": { description: "Not modified (If-None-Match matched the ETag)." },
  "404": { description: "Not found.", content: { "application/json": { schema: { $ref: "#/components/schemas/Error" } } } },
  "422": { description: "A parameter is not valid; fieldErrors says which.", content: { "application/json": { schema: { $ref: "#/components/schemas/Error" } } } },
  "429": { description: "Rate limit reached; wait Retry-After seconds.", headers: { "Retry-After": { schema: { type: "integer" } } } },
};
const get = (summary: string, parameters: Schema[], schema: Schema) => ({ get: { summary, parameters, responses: { "200": ok(schema), ...errors } } });
const pathParam = (name: string, type = "string") => ({ name, in: "path", required: true, schema: { type } });
const data = (ref: string) => ({ type: "object", properties: { data: { $ref: `#/components/schemas/${ref}` } } });

export function openApiDocument(serverUrl: string) {
  return {
    openapi: "3.1.0",
    info: {
      title: "Sagline open data API",
      version: DATA_SCHEMA_VERSION,
      description: `Read-only access to approved, independently measured LiPo pack results with their method cards. ${ATTRIBUTION_TEXT} Every response carries the licence in meta.licence. Rate limit: 600 requests per minute per IP (429 with Retry-After). Responses carry an ETag; send If-None-Match for a 304. CORS is open for GET.`,
      license: { name: DATA_LICENCE_NAME, identifier: DATA_LICENCE_NAME, url: DATA_LICENCE_URL },
    },
    servers: [{ url: serverUrl }],
    paths: {
      "/api/v1/makers": get("Makers", pageParams, listOf("Maker")),
      "/api/v1/makers/{slug}": get("One maker", [pathParam("slug")], data("Maker")),
      "/api/v1/packs": get("Packs, filtered, searched and sorted like the packs table", [...packPageParams, ...packFilterParams], { type: "object", properties: { data: { type: "array", items: { type: "object" } }, page: { type: "integer" }, pageSize: { type: "integer" }, pageCount: { type: "integer" }, total: { type: "integer" }, licence: { type: "object" } } }),
      "/api/v1/packs/{slug}": get("One pack", [pathParam("slug")], data("Pack")),
      "/api/v1/results": get("Approved results with method cards and figures", [...pageParams, ...packFilterParams, { name: "pack", in: "query", schema: { type: "string" } }, { name: "group", in: "query", description: "Like-for-like group key.", schema: { type: "string" } }], listOf("Result")),
      "/api/v1/results/{id}": get("One approved result", [pathParam("id", "integer")], data("Result")),
      "/api/v1/groups": get("Like-for-like groups", [...pageParams, { name: "minResults", in: "query", schema: { type: "integer", minimum: 1 } }], listOf("GroupSummary")),
      "/api/v1/groups/{key}": get("One group with per-pack medians", [pathParam("key"), ...packFilterParams], data("Group")),
      "/api/v1/charts": get("Saved charts", [], { type: "object", properties: { data: { type: "array", items: { $ref: "#/components/schemas/Chart" } } } }),
      "/api/v1/charts/{id}": get("One saved chart", [pathParam("id")], data("Chart")),
    },
    components: {
      schemas: {
        Maker: objectSchema(makerFields),
        Pack: objectSchema(packFields, { makerSlug: { type: "string" }, makerName: { type: "string" } }),
        Result: objectSchema(resultFields.filter((f) => RESULT_TOP.has(f.name)), {
          packSlug: { type: "string" },
          makerSlug: { type: "string" },
          status: { type: "string", enum: ["approved"] },
          methodCard: objectSchema(resultFields.filter((f) => METHOD_CARD.has(f.name))),
          figures: { ...objectSchema(resultFields.filter((f) => !METHOD_CARD.has(f.name) && !RESULT_TOP.has(f.name))), required: [], additionalProperties: true, description: "Figures computed from the log (lib/analysis); units in the names." },
        }),
        GroupSummary: { type: "object", properties: { key: { type: "string" }, resultCount: { type: "integer" }, packCount: { type: "integer" } } },
        Summary: { type: ["object", "null"], properties: { median: { type: "number" }, n: { type: "integer" }, min: { type: "number" }, max: { type: "number" } } },
        Group: {
          type: "object",
          properties: {
            key: { type: "string" }, label: { type: "string" }, resultCount: { type: "integer" }, packCount: { type: "integer" },
            packs: { type: "array", items: { type: "object", properties: { packSlug: { type: "string" }, resultCount: { type: "integer" }, figures: { type: "object", additionalProperties: { $ref: "#/components/schemas/Summary" } } } } },
          },
        },
        Chart: { type: "object", properties: { id: { type: "string" }, kind: { type: "string", enum: ["label-check", "curves", "maker-ranking"] }, title: { type: "string" }, note: { type: ["string", "null"] }, state: { type: "object" }, links: { type: ["object", "null"] } } },
        PageMeta: { type: "object", properties: { page: { type: "integer" }, pageSize: { type: "integer" }, pageCount: { type: "integer" }, total: { type: "integer" }, licence: { type: "object" } } },
        Error: { type: "object", properties: { error: { type: "object", properties: { code: { type: "string" }, message: { type: "string" }, fieldErrors: { type: "object" } } } } },
      },
    },
  };
}
