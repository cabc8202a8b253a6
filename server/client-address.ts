// The client's address for per-address limits, from trusted hops only.
//
// What Next.js passes on: `next start` sets X-Forwarded-For from the socket only when the request has none
// (base-server.js: `req.headers['x-forwarded-for'] ??= socket.remoteAddress`), so behind plain `next start`
// a client's own X-Forwarded-For reaches route handlers unchanged, and route handlers never see the socket.
// So the app is served by scripts/serve.mjs (npm start does), which rewrites the header before Next.js sees
// it: with TRUSTED_PROXY_HOPS = 0 it becomes the socket address alone; with N it keeps what the proxies
// wrote and appends the socket address. Here the address is read from the right: the last entry is the
// peer of our server, each trusted proxy adds one more entry we can believe, so the client is the entry
// N places from the right. Anything a client writes further left is ignored, so a forged header cannot
// make new buckets.
import "server-only";
import { addressBucket, pickForwardedAddress } from "@/lib/client-address";
import { env } from "@/server/env";

/** The client's address bucket for a request (route handlers pass req.headers, actions `await headers()`). */
export function clientAddress(headers: Headers): string {
  return addressBucket(pickForwardedAddress(headers.get("x-forwarded-for"), env().TRUSTED_PROXY_HOPS));
}
