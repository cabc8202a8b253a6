// The OpenAPI 3.1 document served at /api/v1/openapi.json, built from the same field lists as the downloads.
import {
  CHART_MAX_HEIGHT,
  CHART_MAX_WIDTH,
  CHART_MIN_HEIGHT,
  CHART_MIN_WIDTH,
  DEFAULT_PNG_SCALE,
  MAX_PNG_SIDE,
  PNG_SCALES,
} from "./chart-size";
import { CHART_WIDTH } from "./chart-state";
import { makerFields, packFields, resultFields, type Field } from "./fields";
import { ATTRIBUTION_TEXT, DATA_LICENCE_NAME, DATA_LICENCE_URL, DATA_SCHEMA_VERSION } from "./licence";

type Schema = Record<string, unknown>;

function fieldSchema<R>(field: Field<R>): Schema {
  const base =
    field.type === "date"
      ? { type: "string", format: "date" }
      : field.type === "datetime"
        ? { type: "string", format: "date-time" }
        : { type: field.type };
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

const METHOD_CARD = new Set([
  "ambientTemperatureC",
  "packStartTemperatureC",
  "loadMode",
  "loadCurrentA",
  "loadRateC",
  "cutoffVPerCell",
  "stopTemperatureC",
  "resistanceMethod",
  "equipment",
  "sampleRateHz",
  "cyclesBeforeTest",
]);
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
  {
    name: "group",
    in: "query",
    description: "Like-for-like group key: adds per-pack medians in that group.",
    schema: { type: "string" },
  },
];
const packFilterParams = [
  { name: "maker", in: "query", description: "Maker slug.", schema: { type: "string" } },
  {
    name: "cells",
    in: "query",
    description: "Cells in series (S).",
    schema: { type: "integer", minimum: 1, maximum: 14 },
  },
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
  properties: {
    data: { type: "array", items: { $ref: `#/components/schemas/${ref}` } },
    meta: { $ref: "#/components/schemas/PageMeta" },
    links: { type: "object" },
  },
});
const ok = (schema: Schema, description = "OK") => ({
  description,
  headers: { ETag: { schema: { type: "string" } }, "Cache-Control": { schema: { type: "string" } } },
  content: { "application/json": { schema } },
});
const errors = {
  "304": { description: "Not modified (If-None-Match matched the ETag)." },
  "404": {
    description: "Not found.",
    content: { "application/json": { schema: { $ref: "#/components/schemas/Error" } } },
  },
  "422": {
    description: "A parameter is not valid; fieldErrors says which.",
    content: { "application/json": { schema: { $ref: "#/components/schemas/Error" } } },
  },
  "429": {
    description: "Rate limit reached; wait Retry-After seconds.",
    headers: { "Retry-After": { schema: { type: "integer" } } },
  },
};
const get = (summary: string, parameters: Schema[], schema: Schema) => ({
  get: { summary, parameters, responses: { "200": ok(schema), ...errors } },
});
const pathParam = (name: string, type = "string") => ({ name, in: "path", required: true, schema: { type } });
const data = (ref: string) => ({ type: "object", properties: { data: { $ref: `#/components/schemas/${ref}` } } });

const errorBody = (description: string) => ({
  description,
  content: { "application/json": { schema: { $ref: "#/components/schemas/Error" } } },
});

/** The server-drawn chart images (not JSON, so described on their own). */
const chartImage = {
  get: {
    summary: "A chart drawn on the server as SVG or PNG, licence and source inside",
    description: `The state is the encoded chart state: a chart permalink's path after /charts/view/ with its slashes removed. Without size parameters the chart is ${CHART_WIDTH} × 500 CSS pixels and the PNG is drawn at scale ${DEFAULT_PNG_SCALE} (1600 × 1000 pixels). Below 560 pixels of width the layout turns narrow: titles wrap, legends stack and text stays at least 10 px.`,
    parameters: [
      {
        name: "state",
        in: "path",
        required: true,
        description: "The chart's state, base64url-encoded JSON (from a permalink).",
        schema: { type: "string", pattern: "^[A-Za-z0-9_-]{1,4000}$" },
      },
      { name: "file", in: "path", required: true, schema: { type: "string", enum: ["chart.svg", "chart.png"] } },
      {
        name: "width",
        in: "query",
        description:
          "Width of the drawing in CSS pixels (the SVG's width and viewBox; the PNG's width before scaling). A plain whole number.",
        schema: { type: "integer", minimum: CHART_MIN_WIDTH, maximum: CHART_MAX_WIDTH, default: CHART_WIDTH },
      },
      {
        name: "height",
        in: "query",
        description: `Height in CSS pixels. Default: 5/8 of the width, at least 400. Allowed: from max(${CHART_MIN_HEIGHT}, 0.4 × width) to min(${CHART_MAX_HEIGHT}, 1.5 × width).`,
        schema: { type: "integer", minimum: CHART_MIN_HEIGHT, maximum: CHART_MAX_HEIGHT },
      },
      {
        name: "scale",
        in: "query",
        description: `chart.png only (400 for SVG): device pixels per CSS pixel, so the PNG is width × scale by height × scale pixels; no side may exceed ${MAX_PNG_SIDE}.`,
        schema: { type: "integer", enum: [...PNG_SCALES], default: DEFAULT_PNG_SCALE },
      },
      {
        name: "download",
        in: "query",
        description: "1: sent as an attachment named sagline-<title>-<width>x<height>.<ext>.",
        schema: { type: "string", enum: ["1"] },
      },
    ],
    responses: {
      "200": {
        description: "The image. Cached publicly for an hour; the ETag covers the size and scale.",
        headers: { ETag: { schema: { type: "string" } }, "Cache-Control": { schema: { type: "string" } } },
        content: {
          "image/svg+xml": { schema: { type: "string" } },
          "image/png": { schema: { type: "string", contentMediaType: "image/png", contentEncoding: "binary" } },
        },
      },
      "304": { description: "Not modified (If-None-Match matched the ETag)." },
      "400": errorBody(
        "width, height or scale is malformed or out of range; the message and fieldErrors say what is allowed.",
      ),
      "404": errorBody("The state is not a chart."),
      "429": errors["429"],
    },
  },
};

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
      "/api/v1/packs": get(
        "Packs, filtered, searched and sorted like the packs table",
        [...packPageParams, ...packFilterParams],
        {
          type: "object",
          properties: {
            data: { type: "array", items: { type: "object" } },
            page: { type: "integer" },
            pageSize: { type: "integer" },
            pageCount: { type: "integer" },
            total: { type: "integer" },
            licence: { type: "object" },
          },
        },
      ),
      "/api/v1/packs/{slug}": get("One pack", [pathParam("slug")], data("Pack")),
      "/api/v1/results": get(
        "Approved results with method cards and figures",
        [
          ...pageParams,
          ...packFilterParams,
          { name: "pack", in: "query", schema: { type: "string" } },
          { name: "group", in: "query", description: "Like-for-like group key.", schema: { type: "string" } },
        ],
        listOf("Result"),
      ),
      "/api/v1/results/{id}": get("One approved result", [pathParam("id", "integer")], data("Result")),
      "/api/v1/groups": get(
        "Like-for-like groups",
        [...pageParams, { name: "minResults", in: "query", schema: { type: "integer", minimum: 1 } }],
        listOf("GroupSummary"),
      ),
      "/api/v1/groups/{key}": get(
        "One group with per-pack medians",
        [pathParam("key"), ...packFilterParams],
        data("Group"),
      ),
      "/api/v1/charts": get(
        "Featured charts (saved charts a moderator chose), newest feature first",
        [
          { name: "page", in: "query", schema: { type: "integer", minimum: 1, default: 1 } },
          { name: "size", in: "query", schema: { type: "integer", minimum: 1, maximum: 50, default: 20 } },
        ],
        listOf("Chart"),
      ),
      "/api/v1/charts/{id}": get("One saved chart", [pathParam("id")], data("Chart")),
      "/charts/image/{state}/{file}": chartImage,
    },
    components: {
      schemas: {
        Maker: objectSchema(makerFields),
        Pack: objectSchema(packFields, { makerSlug: { type: "string" }, makerName: { type: "string" } }),
        Result: objectSchema(
          resultFields.filter((f) => RESULT_TOP.has(f.name)),
          {
            packSlug: { type: "string" },
            makerSlug: { type: "string" },
            status: { type: "string", enum: ["approved"] },
            methodCard: objectSchema(resultFields.filter((f) => METHOD_CARD.has(f.name))),
            figures: {
              ...objectSchema(resultFields.filter((f) => !METHOD_CARD.has(f.name) && !RESULT_TOP.has(f.name))),
              required: [],
              additionalProperties: true,
              description: "Figures computed from the log (lib/analysis); units in the names.",
            },
          },
        ),
        GroupSummary: {
          type: "object",
          properties: { key: { type: "string" }, resultCount: { type: "integer" }, packCount: { type: "integer" } },
        },
        Summary: {
          type: ["object", "null"],
          properties: {
            median: { type: "number" },
            n: { type: "integer" },
            min: { type: "number" },
            max: { type: "number" },
          },
        },
        Group: {
          type: "object",
          properties: {
            key: { type: "string" },
            label: { type: "string" },
            resultCount: { type: "integer" },
            packCount: { type: "integer" },
            packs: {
              type: "array",
              items: {
                type: "object",
                properties: {
                  packSlug: { type: "string" },
                  resultCount: { type: "integer" },
                  figures: { type: "object", additionalProperties: { $ref: "#/components/schemas/Summary" } },
                },
              },
            },
          },
        },
        Chart: {
          type: "object",
          properties: {
            id: { type: "string" },
            kind: { type: "string", enum: ["label-check", "curves", "maker-ranking"] },
            title: { type: "string" },
            note: { type: ["string", "null"] },
            state: { type: "object" },
            featuredAt: { type: ["string", "null"], format: "date-time" },
            links: { type: ["object", "null"] },
          },
        },
        PageMeta: {
          type: "object",
          properties: {
            page: { type: "integer" },
            pageSize: { type: "integer" },
            pageCount: { type: "integer" },
            total: { type: "integer" },
            licence: { type: "object" },
          },
        },
        Error: {
          type: "object",
          properties: {
            error: {
              type: "object",
              properties: { code: { type: "string" }, message: { type: "string" }, fieldErrors: { type: "object" } },
            },
          },
        },
      },
    },
  };
}
