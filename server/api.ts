// The one helper of the public API, its downloads and files: per-client rate limit, zod-checked path and query
// (a bad path is 404, a bad query 422 with field errors), JSON with the licence in meta, pages with meta and links
// (422 past the last page), strong ETags (If-None-Match → 304) and cache headers, CORS for GET from any origin.
// Outside production every JSON answer is also checked against its response schema (lib/api-contract).
import "server-only";
import { createHash } from "node:crypto";
import type { z } from "zod";
import { AppError, errorResponse } from "@/lib/errors";
import { searchParamsObject } from "@/lib/api-contract/params";
import { DATA_LICENCE_URL, licenceInfo } from "@/lib/open-data/licence";
import { pageCountOf } from "@/lib/pack-query";
import { clientAddress } from "@/server/client-address";
import { enforceRateLimit, limits } from "@/server/rate-limit";
import { withPermission } from "@/server/route";

export const corsHeaders = {
  "Access-Control-Allow-Origin": "*",
  "Access-Control-Allow-Methods": "GET, HEAD, OPTIONS",
  "Access-Control-Allow-Headers": "If-None-Match, Content-Type",
  "Access-Control-Expose-Headers": "ETag, Link, Retry-After, X-Total-Count, Content-Disposition",
  "Access-Control-Max-Age": "86400",
} as const;

const API_CACHE_CONTROL = "public, max-age=60, stale-while-revalidate=300";
const LICENCE_LINK = `<${DATA_LICENCE_URL}>; rel="license"`;

/** Parses the request's search params (a ZodError becomes a 422 with field errors). */
export function parseQuery<S extends z.ZodType>(req: Request, schema: S): z.infer<S> {
  return schema.parse(searchParamsObject(new URL(req.url).searchParams));
}

/** Parses a route's path params: anything that cannot name a thing is simply not there (404). */
export function parsePath<S extends z.ZodType>(params: unknown, schema: S, notFound: string): z.infer<S> {
  const parsed = schema.safeParse(params);
  if (!parsed.success) throw new AppError("not_found", notFound);
  return parsed.data;
}

export function etagOf(body: string | Uint8Array): string {
  return `"${createHash("sha256").update(body).digest("base64url").slice(0, 27)}"`;
}

/** Whether an If-None-Match header names this ETag (or `*`); weak forms count, as RFC 9110 §13.1.2 allows. */
export function ifNoneMatchHits(ifNoneMatch: string | null, etag: string): boolean {
  if (!ifNoneMatch) return false;
  return ifNoneMatch.split(",").some((t) => {
    const v = t.trim();
    return v === "*" || v === etag || v === `W/${etag}`;
  });
}

/** Outside production, a JSON answer that strays from its contract is a bug: fail loudly (tests call every route). */
export function checkContract(schema: z.ZodType, body: unknown): void {
  if (process.env.NODE_ENV === "production") return;
  const parsed = schema.safeParse(body);
  if (!parsed.success)
    throw new Error(`Response does not match its contract: ${JSON.stringify(parsed.error.issues.slice(0, 5))}`);
}

type Sent = { body: string | Uint8Array; contentType: string; etag?: string; headers?: Record<string, string> };

/** A 200 with a strong ETag and the public headers, or a bodiless 304 when If-None-Match names the ETag. */
export function sendCached(req: Request, sent: Sent): Response {
  const etag = sent.etag ?? etagOf(sent.body);
  const headers = new Headers({
    ...corsHeaders,
    "Cache-Control": API_CACHE_CONTROL,
    Link: LICENCE_LINK,
    ...sent.headers,
    ETag: etag,
  });
  if (ifNoneMatchHits(req.headers.get("if-none-match"), etag)) return new Response(null, { status: 304, headers });
  headers.set("Content-Type", sent.contentType);
  const body = typeof sent.body === "string" ? sent.body : new Uint8Array(sent.body);
  return new Response(req.method === "HEAD" ? null : body, { status: 200, headers });
}

type Streamed = Omit<Sent, "body" | "etag"> & { etag: string; open: () => Promise<AsyncIterable<Uint8Array> | null> };

/** Like sendCached for a body streamed from storage: the ETag is known up front, so a 304 never opens the file. */
export async function sendStream(req: Request, sent: Streamed, missing: string): Promise<Response> {
  const headers = new Headers({
    ...corsHeaders,
    "Cache-Control": API_CACHE_CONTROL,
    Link: LICENCE_LINK,
    ...sent.headers,
  });
  headers.set("ETag", sent.etag);
  if (ifNoneMatchHits(req.headers.get("if-none-match"), sent.etag)) return new Response(null, { status: 304, headers });
  headers.set("Content-Type", sent.contentType);
  if (req.method === "HEAD") return new Response(null, { status: 200, headers });
  const chunks = await sent.open();
  if (!chunks) throw new AppError("not_found", missing);
  const iterator = chunks[Symbol.asyncIterator]();
  const body = new ReadableStream<Uint8Array>({
    async pull(controller) {
      try {
        const next = await iterator.next();
        if (next.done) controller.close();
        else controller.enqueue(next.value);
      } catch (err) {
        controller.error(err);
      }
    },
    async cancel() {
      await iterator.return?.();
    },
  });
  return new Response(body, { status: 200, headers });
}

export type Envelope = { data: unknown; meta?: Record<string, unknown>; links?: Record<string, string | null> };

/** JSON `{ data, meta, links }` with the licence in meta, checked against its response schema. */
export function apiJson(req: Request, schema: z.ZodType, body: Envelope, headers: Record<string, string> = {}) {
  const full = { data: body.data, meta: { ...body.meta, licence: licenceInfo }, links: body.links ?? {} };
  checkContract(schema, full);
  return sendCached(req, { body: JSON.stringify(full), contentType: "application/json; charset=utf-8", headers });
}

/** JSON that is not an envelope (oEmbed, the OpenAPI document, the Data Package descriptor). */
export function plainJson(req: Request, schema: z.ZodType, body: unknown, headers: Record<string, string> = {}) {
  checkContract(schema, body);
  return sendCached(req, { body: JSON.stringify(body), contentType: "application/json; charset=utf-8", headers });
}

/**
 * `meta` and `links` for one page of a list of `total` items, and its X-Total-Count header. A page past the last
 * is a 422 saying where the list ends (an empty list has one, empty, page).
 */
export function pageOf(req: Request, { page, size }: { page: number; size: number }, total: number) {
  const pageCount = pageCountOf(total, size);
  if (page > pageCount)
    throw new AppError("validation", `There are ${pageCount} pages of ${size}; page ${page} is past the last.`, {
      page: [`page must be at most ${pageCount}.`],
    });
  const url = new URL(req.url);
  const at = (p: number) => {
    const u = new URL(url);
    u.searchParams.set("page", String(p));
    u.searchParams.set("size", String(size));
    return `${u.pathname}${u.search}`;
  };
  return {
    meta: { page, size, total, pageCount },
    links: {
      self: at(page),
      first: at(1),
      last: at(pageCount),
      next: page < pageCount ? at(page + 1) : null,
      prev: page > 1 ? at(page - 1) : null,
    },
    headers: { "X-Total-Count": String(total) },
  };
}

type Ctx<P> = { params: Promise<P> };

/** A public GET handler: rate-limited per client; errors are JSON and keep the CORS headers. */
export function apiGet<P = Record<string, never>>(handler: (req: Request, params: P) => Promise<Response>) {
  return withPermission<Ctx<P>>("public", async (req, ctx) => {
    try {
      await enforceRateLimit(`api:${clientAddress(req.headers)}`, limits.apiPerIp);
      return await handler(req, await ctx.params);
    } catch (err) {
      return errorResponse(err, corsHeaders);
    }
  });
}

export function apiOptions(): Response {
  return new Response(null, { status: 204, headers: corsHeaders });
}
