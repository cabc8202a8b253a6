// What scripts/serve.mjs does to each request's forwarding headers before Next.js sees it (pure, tested in
// tests/unit/server/forwarded.test.ts). Next.js fills X-Forwarded-For from the socket only when the header is
// absent, so without this a client's own header would reach the app unchanged (see server/client-address.ts).

/** TRUSTED_PROXY_HOPS as a whole number 0–10 (server/env.ts validates the same setting for the app). */
export function trustedHops(value) {
  if (value === undefined || value === "") return 0;
  const n = Number(value);
  if (!Number.isInteger(n) || n < 0 || n > 10)
    throw new Error(`TRUSTED_PROXY_HOPS must be a whole number 0–10, got ${value}`);
  return n;
}

/**
 * Rewrites the request's forwarding headers in place (Node's lower-cased IncomingMessage headers).
 * hops = 0: nobody in front of us is trusted, so X-Forwarded-For becomes the socket address alone and a
 * client's X-Forwarded-Host/-Proto/-Port are dropped (Next.js fills them from the connection).
 * hops ≥ 1: the proxies' headers stay and the socket address (the nearest proxy) is appended, as a proxy
 * would append its own peer; the app reads the client `hops` entries from the right.
 */
export function rewriteForwarded(headers, socketAddress, hops) {
  const peer = socketAddress ?? "unknown";
  if (hops === 0) {
    headers["x-forwarded-for"] = peer;
    delete headers["x-forwarded-host"];
    delete headers["x-forwarded-proto"];
    delete headers["x-forwarded-port"];
    delete headers["x-real-ip"];
    return;
  }
  const before = headers["x-forwarded-for"];
  const chain = (Array.isArray(before) ? before.join(",") : (before ?? "")).trim();
  headers["x-forwarded-for"] = chain ? `${chain}, ${peer}` : peer;
}
