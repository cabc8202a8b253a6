// Every public route in one table: path, method, parameters (the zod schemas of ./queries.ts and friends), body
// and responses (./responses.ts). The OpenAPI document (./openapi.ts), the /data/api guide and the contract tests
// read this table, so none of them can forget a route.
import type { z } from "zod";
import { oembedQuery } from "@/lib/open-data/oembed";
import { analyseQuerySchema } from "@/lib/validations/analyse";
import { readerFlagSchema } from "@/lib/validations/review";
import {
  chartIdPath,
  downloadPath,
  downloadQuery,
  chartListQuery,
  groupListQuery,
  groupPath,
  groupQuery,
  idPath,
  packListQuery,
  pageQuery,
  resultListQuery,
  slugPath,
} from "./queries";
import * as r from "./responses";
import * as s from "./service-responses";
import { chartImageParameters, LOG_MEDIA_TYPES } from "./route-extras";

type Json = { json: z.ZodType };
type Media = { media: Record<string, { description?: string }> };
export type RouteResponse = { description: string } & Partial<Json & Media>;
export type RouteSpec = {
  method: "get" | "post";
  path: string;
  summary: string;
  description?: string;
  /** Cached, ETag-tagged GET answers: 304 for a matching If-None-Match. */
  etag?: boolean;
  pathParams?: z.ZodObject;
  query?: z.ZodObject;
  /** Hand-written parameters (for the chart images, whose strings must be plain whole numbers). */
  extraParameters?: Record<string, unknown>[];
  body?: { required: boolean; content: Record<string, { schema?: z.ZodType; description?: string }> };
  responses: Record<string, RouteResponse>;
};

const err = (description: string): RouteResponse => ({ description, json: r.errorBody });
const e404 = (what: string) => ({ "404": err(what) });
const e422 = { "422": err("A parameter is not valid (or a page is past the last): fieldErrors says which.") };
const e429 = { "429": err("Rate limit reached; wait Retry-After seconds.") };
const ok = (json: z.ZodType, description = "OK"): Record<string, RouteResponse> => ({ "200": { description, json } });

export const ROUTES: RouteSpec[] = [
  {
    method: "get",
    path: "/api/v1/makers",
    summary: "Makers, with their numbers of packs and published results",
    etag: true,
    query: pageQuery,
    responses: { ...ok(r.makerList), ...e422, ...e429 },
  },
  {
    method: "get",
    path: "/api/v1/makers/{slug}",
    summary: "One maker",
    etag: true,
    pathParams: slugPath,
    responses: { ...ok(r.makerItem), ...e404("No such maker."), ...e422, ...e429 },
  },
  {
    method: "get",
    path: "/api/v1/packs",
    summary: "Packs, filtered, searched and sorted like the packs table",
    etag: true,
    query: packListQuery,
    responses: { ...ok(r.packList), ...e404("No such like-for-like group."), ...e422, ...e429 },
  },
  {
    method: "get",
    path: "/api/v1/packs/{slug}",
    summary: "One pack as labelled, with its number of published results",
    etag: true,
    pathParams: slugPath,
    responses: { ...ok(r.packItem), ...e404("No such pack."), ...e422, ...e429 },
  },
  {
    method: "get",
    path: "/api/v1/results",
    summary: "Published results with method cards and figures",
    etag: true,
    query: resultListQuery,
    responses: { ...ok(r.resultList), ...e404("No such like-for-like group."), ...e422, ...e429 },
  },
  {
    method: "get",
    path: "/api/v1/results/{id}",
    summary: "One published result",
    etag: true,
    pathParams: idPath,
    responses: { ...ok(r.resultItem), ...e404("No such published result."), ...e422, ...e429 },
  },
  {
    method: "get",
    path: "/api/v1/results/{id}/log",
    summary: "The raw log of a published result, as uploaded (CC BY 4.0)",
    description:
      "Streams the stored file. Its ETag is the file's SHA-256, so If-None-Match answers 304. Recompute the figures with the open CLI: npm run analyse -- <file> --cells … --rated-mah … (the result's page shows the exact command).",
    etag: true,
    pathParams: idPath,
    responses: {
      "200": { description: "The log, as an attachment.", media: LOG_MEDIA_TYPES },
      ...e404("No such published result, or its log is not stored."),
      ...e422,
      ...e429,
      "503": err("File storage is not reachable."),
    },
  },
  {
    method: "post",
    path: "/api/v1/results/{id}/flags",
    summary: "A reader flags a published result for the moderators",
    description: "Opens a case for the moderators with a reason and a note. JSON body; rate-limited.",
    pathParams: idPath,
    body: { required: true, content: { "application/json": { schema: readerFlagSchema } } },
    responses: {
      "201": { description: "The flag is filed.", json: s.flagCreated },
      "400": err("The body is not JSON."),
      "401": err("Signing in is needed."),
      "403": err("A cross-site request was refused."),
      ...e404("No such published result."),
      ...e422,
      ...e429,
    },
  },
  {
    method: "get",
    path: "/api/v1/groups",
    summary: "Like-for-like groups with their numbers of published results and packs",
    etag: true,
    query: groupListQuery,
    responses: { ...ok(r.groupList), ...e422, ...e429 },
  },
  {
    method: "get",
    path: "/api/v1/groups/{key}",
    summary: "One like-for-like group with per-pack medians",
    etag: true,
    pathParams: groupPath,
    query: groupQuery,
    responses: { ...ok(r.groupItem), ...e404("No such like-for-like group."), ...e422, ...e429 },
  },
  {
    method: "get",
    path: "/api/v1/charts",
    summary: "Featured charts (saved charts a moderator chose), newest feature first",
    etag: true,
    query: chartListQuery,
    responses: { ...ok(r.chartList), ...e422, ...e429 },
  },
  {
    method: "get",
    path: "/api/v1/charts/{id}",
    summary: "One saved chart",
    etag: true,
    pathParams: chartIdPath,
    responses: { ...ok(r.chartItem), ...e404("No such chart."), ...e422, ...e429 },
  },
  {
    method: "post",
    path: "/api/v1/analyse",
    summary: "Figures of a log, computed and forgotten (nothing is stored)",
    description:
      "Send the log as the raw body (text/csv) or as the multipart field `file`. The answer is what the open CLI prints with --json.",
    query: analyseQuerySchema,
    body: {
      required: true,
      content: {
        "text/csv": { description: "The log file's bytes." },
        "multipart/form-data": { description: "The log in the field `file`." },
      },
    },
    responses: {
      ...ok(s.analyseResponse),
      "400": err("The log could not be read."),
      "403": err("A cross-site request was refused."),
      "413": err("The log is larger than the limit."),
      "415": err("Not a text log."),
      ...e422,
      ...e429,
    },
  },
  {
    method: "get",
    path: "/api/oembed",
    summary: "oEmbed for chart links (JSON only)",
    query: oembedQuery,
    responses: {
      ...ok(s.oembedResponse),
      ...e404("That URL is not a Sagline chart."),
      ...e422,
      ...e429,
      "501": { description: "Only the json format is available.", media: { "text/plain": {} } },
    },
  },
  {
    method: "get",
    path: "/api/v1/me",
    summary: "Who is signed in (null when nobody is); ?watching=<pack id> says whether they watch it",
    responses: { ...ok(s.meResponse), ...e422 },
  },
  {
    method: "get",
    path: "/api/v1/openapi.json",
    summary: "This document",
    responses: { ...ok(s.openApiResponse, "The OpenAPI 3.1 document."), ...e429 },
  },
  {
    method: "get",
    path: "/data/datapackage.json",
    summary: "The Data Package descriptor of the downloads (Table Schemas, licence, counting rule)",
    etag: true,
    responses: { ...ok(s.dataPackageResponse, "The Data Package v2 descriptor."), ...e429 },
  },
  {
    method: "get",
    path: "/data/download/{file}",
    summary: "Downloads: makers, packs or results as RFC 4180 CSV or JSON, and the README",
    description:
      "Complete or filtered by the packs table's filters (results also by pack and group). The CSV has a header row and nothing else; the licence and credit are in the README and the Data Package descriptor.",
    etag: true,
    pathParams: downloadPath,
    query: downloadQuery,
    responses: {
      "200": {
        description: "The file, as an attachment named with the export date and schema version.",
        json: r.downloadBody,
        media: {
          "text/csv": { description: "RFC 4180, UTF-8, header row first." },
          "text/plain": { description: "README.txt" },
        },
      },
      ...e404("No such like-for-like group, or no such file."),
      ...e422,
      ...e429,
    },
  },
  {
    method: "get",
    path: "/charts/image/{state}/{file}",
    summary: "A chart drawn on the server as SVG or PNG, licence and source inside",
    etag: true,
    extraParameters: chartImageParameters,
    responses: {
      "200": {
        description: "The image. Cached publicly for an hour; the ETag covers the size and scale.",
        media: { "image/svg+xml": {}, "image/png": {} },
      },
      "400": err("width, height or scale is malformed or out of range; fieldErrors says what is allowed."),
      ...e404("The state is not a chart."),
      ...e429,
    },
  },
];
