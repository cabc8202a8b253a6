// The one helper of the public read API: rate limit, zod-checked query, JSON with licence, strong ETag
// (If-None-Match → 304) and cache headers, CORS for GET from any origin, pagination links.
import "server-only";
import { createHash } from "node:crypto";
import type { z } from "zod";
import { errorResponse } from "@/lib/errors";
import { clientAddress } from "@/server/client-address";
import { enforceRateLimit, limits } from "@/server/rate-limit";
import { withPermission } from "@/server/route";
import { searchParamsObject } from "@/lib/validations/open-data";
import { DATA_LICENCE_URL, licenceInfo } from "@/lib/open-data/licence";

export const corsHeaders = {
  "Access-Control-Allow-Origin": "*",
  "Access-Control-Allow-Methods": "GET, HEAD, OPTIONS",
  "Access-Control-Allow-Headers": "If-None-Match, Content-Type",
  "Access-Control-Expose-Headers": "ETag, Link, Retry-After, X-Total-Count",
  "Access-Control-Max-Age": "86400",
} as const;

export const API_CACHE_CONTROL = "public, max-age=60, stale-while-revalidate=300";
/** The pack catalogue's list (/api/v1/packs) may also sit in shared caches for five minutes. */
const CATALOGUE_CACHE_CONTROL = "public, max-age=60, s-maxage=300, stale-while-revalidate=600";

/** Parses the request's search params with a zod schema (a ZodError becomes a 422 with field errors). */
export function parseQuery<S extends z.ZodType>(req: Request, schema: S): z.infer<S> {
  return schema.parse(searchParamsObject(new URL(req.url).searchParams));
}

export function etagOf(body: string): string {
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

export type ApiBody = { data: unknown; meta?: Record<string, unknown>; links?: Record<string, string | null> };

/** JSON with the licence in `meta`, a strong ETag (304 on If-None-Match) and public cache headers. */
export function apiJson(req: Request, body: ApiBody, extraHeaders: Record<string, string> = {}): Response {
  const text = JSON.stringify({ ...body, meta: { ...body.meta, licence: licenceInfo } });
  const etag = etagOf(text);
  const headers = new Headers({
    ...corsHeaders,
    ...extraHeaders,
    ETag: etag,
    "Cache-Control": API_CACHE_CONTROL,
    Link: `<${DATA_LICENCE_URL}>; rel="license"`,
  });
  if (ifNoneMatchHits(req.headers.get("if-none-match"), etag)) return new Response(null, { status: 304, headers });
  headers.set("Content-Type", "application/json; charset=utf-8");
  return new Response(req.method === "HEAD" ? null : text, { status: 200, headers });
}

type Ctx<P> = { params: Promise<P> };

/** A public GET handler: rate-limited per client IP; errors keep the CORS headers. */
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

/** A cacheable JSON answer without the licence envelope (the pack catalogue's own shape), or 304. */
export function cachedJson(req: Request, data: unknown, extra: Record<string, string> = {}): Response {
  const body = JSON.stringify(data);
  const etag = etagOf(body);
  const headers = {
    ...corsHeaders,
    "Cache-Control": CATALOGUE_CACHE_CONTROL,
    ETag: etag,
    Vary: "Accept-Encoding",
    ...extra,
  };
  if (ifNoneMatchHits(req.headers.get("if-none-match"), etag)) return new Response(null, { status: 304, headers });
  return new Response(body, {
    status: 200,
    headers: { ...headers, "Content-Type": "application/json; charset=utf-8" },
  });
}

/** Error answers of the public API keep the CORS headers, so browsers can read the 422 details. */
export async function withCors(res: Response | Promise<Response>): Promise<Response> {
  const r = await res;
  for (const [k, v] of Object.entries(corsHeaders)) if (!r.headers.has(k)) r.headers.set(k, v);
  return r;
}

/** `meta` and `links` for one page of a list. */
export function pageEnvelope(req: Request, page: number, size: number, total: number) {
  const url = new URL(req.url);
  const at = (p: number) => {
    const u = new URL(url);
    u.searchParams.set("page", String(p));
    u.searchParams.set("size", String(size));
    return `${u.pathname}${u.search}`;
  };
  const pageCount = Math.max(1, Math.ceil(total / size));
  return {
    meta: { page, pageSize: size, pageCount, total },
    links: {
      self: at(page),
      first: at(1),
      last: at(pageCount),
      next: page < pageCount ? at(page + 1) : null,
      prev: page > 1 ? at(Math.min(page - 1, pageCount)) : null,
    },
    headers: { "X-Total-Count": String(total) },
  };
}
