// Shared behaviour of the public read API: rate limit, zod-checked query, JSON with licence, ETag and
// cache headers, CORS for GET, pagination links.
import "server-only";
import { createHash } from "node:crypto";
import type { z } from "zod";
import { errorResponse } from "@/lib/errors";
import { clientIp, enforceRateLimit, limits } from "@/lib/rate-limit";
import { withPermission } from "@/lib/route";
import { searchParamsObject } from "@/lib/validations/open-data";
import { DATA_LICENCE_URL, licenceInfo } from "./licence";

export const corsHeaders = {
  "Access-Control-Allow-Origin": "*",
  "Access-Control-Allow-Methods": "GET, HEAD, OPTIONS",
  "Access-Control-Allow-Headers": "If-None-Match, Content-Type",
  "Access-Control-Expose-Headers": "ETag, Link, Retry-After, X-Total-Count",
  "Access-Control-Max-Age": "86400",
} as const;

export const API_CACHE_CONTROL = "public, max-age=60, stale-while-revalidate=300";

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
  return ifNoneMatch.split(",").some((t) => { const v = t.trim(); return v === "*" || v === etag || v === `W/${etag}`; });
}

export type ApiBody = { data: unknown; meta?: Record<string, unknown>; links?: Record<string, string | null> };

/** JSON with the licence in `meta`, a strong ETag (304 on If-None-Match) and public cache headers. */
export function apiJson(req: Request, body: ApiBody, extraHeaders: Record<string, string> = {}): Response {
  const text = JSON.stringify({ ...body, meta: { ...body.meta, licence: licenceInfo } });
  const etag = etagOf(text);
  const headers = new Headers({ ...corsHeaders, ...extraHeaders, ETag: etag, "Cache-Control": API_CACHE_CONTROL, Link: `<${DATA_LICENCE_URL}>; rel="license"` });
  if (ifNoneMatchHits(req.headers.get("if-none-match"), etag)) return new Response(null, { status: 304, headers });
  headers.set("Content-Type", "application/json; charset=utf-8");
  return new Response(req.method === "HEAD" ? null : text, { status: 200, headers });
}

type Ctx<P> = { params: Promise<P> };

/** A public GET handler: rate-limited per client IP; errors keep the CORS headers. */
export function apiGet<P = Record<string, never>>(handler: (req: Request, params: P) => Promise<Response>) {
  return withPermission<Ctx<P>>("public", async (req, ctx) => {
    try {
      await enforceRateLimit(`api:${clientIp(req.headers)}`, limits.apiPerIp);
      return await handler(req, await ctx.params);
    } catch (err) {
      return errorResponse(err, corsHeaders);
    }
  });
}

export function apiOptions(): Response {
  return new Response(null, { status: 204, headers: corsHeaders });
}

/** `meta` and `links` for one page of a list. */
export function pageEnvelope(req: Request, page: number, size: number, total: number) {
  const url = new URL(req.url);
  const at = (p: number) => { const u = new URL(url); u.searchParams.set("page", String(p)); u.searchParams.set("size", String(size)); return `${u.pathname}${u.search}`; };
  const pageCount = Math.max(1, Math.ceil(total / size));
  return {
    meta: { page, pageSize: size, pageCount, total },
    links: { self: at(page), first: at(1), last: at(pageCount), next: page < pageCount ? at(page + 1) : null, prev: page > 1 ? at(Math.min(page - 1, pageCount)) : null },
    headers: { "X-Total-Count": String(total) },
  };
}
