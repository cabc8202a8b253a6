// Caching and CORS headers of the public read API: anyone may GET it from any origin; responses carry a
// strong ETag so clients and CDNs revalidate cheaply (If-None-Match → 304).
import { createHash } from "node:crypto";

export const CORS_HEADERS = {
  "Access-Control-Allow-Origin": "*",
  "Access-Control-Allow-Methods": "GET, HEAD, OPTIONS",
  "Access-Control-Allow-Headers": "If-None-Match, Content-Type",
  "Access-Control-Expose-Headers": "ETag, Link, X-Total-Count",
  "Access-Control-Max-Age": "86400",
} as const;

export const PUBLIC_CACHE_CONTROL = "public, max-age=60, s-maxage=300, stale-while-revalidate=600";

export function etagOf(body: string): string {
  return `"${createHash("sha256").update(body).digest("base64url").slice(0, 27)}"`;
}

function matches(ifNoneMatch: string | null, etag: string): boolean {
  if (!ifNoneMatch) return false;
  return ifNoneMatch.split(",").some((t) => {
    const v = t.trim().replace(/^W\//, "");
    return v === "*" || v === etag;
  });
}

/** A cacheable JSON answer, or 304 when the client already holds it. */
export function cachedJson(req: Request, data: unknown, extra: Record<string, string> = {}): Response {
  const body = JSON.stringify(data);
  const etag = etagOf(body);
  const headers = { ...CORS_HEADERS, "Cache-Control": PUBLIC_CACHE_CONTROL, ETag: etag, Vary: "Accept-Encoding", ...extra };
  if (matches(req.headers.get("if-none-match"), etag)) return new Response(null, { status: 304, headers });
  return new Response(body, { status: 200, headers: { ...headers, "Content-Type": "application/json; charset=utf-8" } });
}

/** Error answers of the public API keep the CORS headers, so browsers can read the 422 details. */
export async function withCors(res: Response | Promise<Response>): Promise<Response> {
  const r = await res;
  for (const [k, v] of Object.entries(CORS_HEADERS)) if (!r.headers.has(k)) r.headers.set(k, v);
  return r;
}

export function preflight(): Response {
  return new Response(null, { status: 204, headers: CORS_HEADERS });
}
