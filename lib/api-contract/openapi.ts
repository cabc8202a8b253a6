// The OpenAPI 3.1 document served at /api/v1/openapi.json, generated from the contract's zod schemas with zod 4's
// own z.toJSONSchema (JSON Schema 2020-12, which OpenAPI 3.1 uses): components from the named response schemas,
// parameters from the query schemas, one operation per entry of the route table (./routes.ts).
import { z } from "zod";
import {
  ATTRIBUTION_TEXT,
  DATA_LICENCE_LABEL,
  DATA_LICENCE_SPDX,
  DATA_SCHEMA_VERSION,
  PUBLISHED_RULE,
} from "@/lib/open-data/licence";
import { makerRecord, packRecord, resultRecord } from "./records";
import * as r from "./responses";
import { ROUTES, type RouteResponse, type RouteSpec } from "./routes";
import * as s from "./service-responses";

type Schema = Record<string, unknown>;

/** Every schema a response names, by its component name. */
const NAMED: Record<string, z.ZodType> = {
  Licence: r.licenceSchema,
  ListMeta: r.listMeta,
  ListLinks: r.listLinks,
  Maker: makerRecord,
  Pack: packRecord,
  PackListItem: r.packListItem,
  Result: resultRecord,
  GroupSummary: r.groupSummary,
  PackAggregate: r.packAggregate,
  Group: r.groupDetail,
  Chart: r.savedChart,
  MakerList: r.makerList,
  MakerItem: r.makerItem,
  PackList: r.packList,
  PackItem: r.packItem,
  ResultList: r.resultList,
  ResultItem: r.resultItem,
  GroupList: r.groupList,
  GroupItem: r.groupItem,
  ChartList: r.chartList,
  ChartItem: r.chartItem,
  MakerDownload: r.makerDownload,
  PackDownload: r.packDownload,
  ResultDownload: r.resultDownload,
  Download: r.downloadBody,
  Error: r.errorBody,
  AnalyseFigures: s.analyseResponse,
  OEmbed: s.oembedResponse,
  FlagCreated: s.flagCreated,
  Me: s.meResponse,
  DataPackage: s.dataPackageResponse,
  OpenApiDocument: s.openApiResponse,
};
const nameOf = new Map(Object.entries(NAMED).map(([name, schema]) => [schema, name]));
const ref = (name: string) => `#/components/schemas/${name}`;

function clean(js: Schema): Schema {
  const { $schema: _s, $id: _i, ...rest } = js;
  return rest;
}

function components(): Record<string, Schema> {
  const registry = z.registry<{ id: string }>();
  for (const [id, schema] of Object.entries(NAMED)) registry.add(schema, { id });
  const out = z.toJSONSchema(registry, { uri: ref, io: "output", unrepresentable: "any" });
  return Object.fromEntries(Object.entries(out.schemas).map(([k, v]) => [k, clean(v as Schema)]));
}

function inputSchema(schema: z.ZodType): Schema {
  return clean(z.toJSONSchema(schema, { io: "input", unrepresentable: "any" }) as Schema);
}

function parameters(route: RouteSpec): Schema[] {
  const from = (obj: z.ZodObject | undefined, where: "path" | "query") =>
    Object.entries(obj?.shape ?? {}).map(([name, field]) => {
      const { description, ...schema } = inputSchema(field as z.ZodType);
      const required = where === "path" || !(field as z.ZodType).safeParse(undefined).success;
      return { name, in: where, required, ...(description ? { description } : {}), schema };
    });
  return [...from(route.pathParams, "path"), ...(route.extraParameters ?? []), ...from(route.query, "query")];
}

const HEADERS = {
  ETag: { description: "Strong validator; send it back in If-None-Match.", schema: { type: "string" } },
  "Cache-Control": { schema: { type: "string" } },
  "X-Total-Count": { description: "Lists: items in the whole list.", schema: { type: "integer" } },
  "Retry-After": { description: "Seconds to wait.", schema: { type: "integer" } },
};

function response(status: string, res: RouteResponse, etag: boolean): Schema {
  const content: Record<string, Schema> = {};
  if (res.json) {
    const name = nameOf.get(res.json);
    if (!name) throw new Error(`OpenAPI: a response schema has no component name (${res.description})`);
    content["application/json"] = { schema: { $ref: ref(name) } };
  }
  for (const [media, m] of Object.entries(res.media ?? {}))
    content[media] = {
      schema: {
        type: "string",
        ...(media === "image/png" ? { contentMediaType: media } : {}),
        ...(m.description ? { description: m.description } : {}),
      },
    };
  const headers =
    status === "429"
      ? { "Retry-After": HEADERS["Retry-After"] }
      : status.startsWith("2") && etag
        ? { ETag: HEADERS.ETag, "Cache-Control": HEADERS["Cache-Control"], "X-Total-Count": HEADERS["X-Total-Count"] }
        : undefined;
  return {
    description: res.description,
    ...(headers ? { headers } : {}),
    ...(Object.keys(content).length ? { content } : {}),
  };
}

function operation(route: RouteSpec): Schema {
  const responses: Schema = {};
  for (const [status, res] of Object.entries(route.responses)) responses[status] = response(status, res, !!route.etag);
  if (route.etag) responses["304"] = { description: "Not modified (If-None-Match matched the ETag)." };
  const body = route.body
    ? {
        requestBody: {
          required: route.body.required,
          content: Object.fromEntries(
            Object.entries(route.body.content).map(([media, c]) => [
              media,
              {
                schema: {
                  ...(c.schema
                    ? inputSchema(c.schema)
                    : media === "multipart/form-data"
                      ? { type: "object", properties: { file: { type: "string", contentMediaType: "text/csv" } } }
                      : { type: "string" }),
                  ...(c.description ? { description: c.description } : {}),
                },
              },
            ]),
          ),
        },
      }
    : {};
  return {
    summary: route.summary,
    ...(route.description ? { description: route.description } : {}),
    operationId: `${route.method}${route.path.replace(/[{}]/g, "").replace(/[^A-Za-z0-9]+(.)?/g, (_m, c: string | undefined) => (c ?? "").toUpperCase())}`,
    parameters: parameters(route),
    ...body,
    responses,
  };
}

export function openApiDocument(serverUrl: string) {
  const paths: Record<string, Record<string, Schema>> = {};
  for (const route of ROUTES) (paths[route.path] ??= {})[route.method] = operation(route);
  return {
    openapi: "3.1.0",
    info: {
      title: "Sagline open data API",
      version: DATA_SCHEMA_VERSION,
      description: [
        "Read access to published, independently measured LiPo pack results with their method cards, and the public tools beside them.",
        PUBLISHED_RULE,
        `${ATTRIBUTION_TEXT} Every JSON answer carries the licence in meta.licence.`,
        "Every list answers { data, meta, links }: meta has page, size, total and pageCount; links has self, first, last, next and prev. A page past the last answers 422; an unknown like-for-like group 404.",
        "Figures are rounded to the decimal places each field states. Rate limit: 600 requests per minute per client (429 with Retry-After). GET answers carry an ETag; send If-None-Match for a 304. CORS is open for GET.",
      ].join("\n\n"),
      license: { name: DATA_LICENCE_LABEL, identifier: DATA_LICENCE_SPDX },
    },
    servers: [{ url: serverUrl }],
    paths,
    components: { schemas: components() },
  };
}
