import { fileURLToPath } from "node:url";

// The packs table's URL parameters (lib/pack-query-params.ts writes them; a unit test holds the two lists equal).
export const PACK_TABLE_PARAMS = [
  "q",
  "cells",
  "minMah",
  "maxMah",
  "minC",
  "maxC",
  "minG",
  "maxG",
  "connector",
  "maker",
  "group",
  "sort",
  "dir",
  "page",
  "size",
];

/** @type {import('next').NextConfig} */
const dev = process.env.NODE_ENV !== "production";

// One policy for every page; only the frame rule differs for /embed/*. Next's hydration scripts are
// inline, hence 'unsafe-inline' for scripts (nonces would make every page dynamic); nothing is loaded
// from another origin.
function csp(frameAncestors) {
  return [
    "default-src 'self'",
    `script-src 'self' 'unsafe-inline'${dev ? " 'unsafe-eval'" : ""}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self' data:",
    `connect-src 'self'${dev ? " ws:" : ""}`,
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    `frame-ancestors ${frameAncestors}`,
  ].join("; ");
}

const common = [
  { key: "X-Content-Type-Options", value: "nosniff" },
  { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
  { key: "Permissions-Policy", value: "camera=(), microphone=(), geolocation=(), payment=()" },
];
const securityHeaders = [
  ...common,
  { key: "X-Frame-Options", value: "DENY" },
  { key: "Cross-Origin-Opener-Policy", value: "same-origin" },
  { key: "Content-Security-Policy", value: csp("'none'") },
];
const embedHeaders = [...common, { key: "Content-Security-Policy", value: csp("*") }];
// Chart pages and embeds are drawn per request (app/(public)/charts/view, app/embed/chart): shared caches may
// keep them an hour and serve them stale a day while refreshing; browsers check again each time. Next.js
// keeps a Cache-Control set here instead of its own no-store for dynamic pages (send-payload.js).
const chartCache = [{ key: "Cache-Control", value: "public, max-age=0, s-maxage=3600, stale-while-revalidate=86400" }];

// npm test builds into its own folder (.next-test) so it never replaces the files a running `npm start` serves.
const distDir = process.env.NEXT_DIST_DIR || ".next";
if (!/^\.next[a-z0-9-]*$/.test(distDir))
  throw new Error(`NEXT_DIST_DIR must look like .next or .next-test, got ${distDir}`);

// With REDIS_URL set, every instance shares one page and data cache in Redis (server/cache/redis-cache-handler.mjs)
// and keeps none in its own memory, so a decision on one instance is fresh on all of them. Without it, Next's own
// file-system cache serves a single instance.
const sharedCache = process.env.REDIS_URL
  ? {
      cacheHandler: fileURLToPath(new URL("./server/cache/redis-cache-handler.mjs", import.meta.url)),
      cacheMaxMemorySize: 0,
    }
  : {};

const nextConfig = {
  distDir,
  ...sharedCache,
  reactStrictMode: true,
  poweredByHeader: false,
  typedRoutes: false,
  serverExternalPackages: ["pg", "nodemailer", "s3rver", "smtp-server", "mailparser", "@resvg/resvg-js"],
  // authInterrupts: forbidden() renders app/forbidden.tsx with a real 403 status.
  // Server actions take form fields and small JSON only (uploads stream through /api/v1/uploads/*): 1 MB.
  experimental: { serverActions: { bodySizeLimit: "1mb" }, authInterrupts: true },
  // /packs with any table parameter renders per request at /packs-query (its first HTML is the page the URL asks
  // for); /packs itself stays a static page. The address bar keeps /packs?…; the query string passes through.
  async rewrites() {
    return {
      beforeFiles: PACK_TABLE_PARAMS.map((key) => ({
        source: "/packs",
        has: [{ type: "query", key }],
        destination: "/packs-query",
      })),
    };
  },
  async headers() {
    return [
      // Embeds are the only routes other sites may frame.
      { source: "/((?!embed/).*)", headers: securityHeaders },
      {
        source: "/embed/:path*",
        headers: embedHeaders,
      },
      { source: "/charts/view/:path+", headers: chartCache },
      { source: "/embed/chart/:path+", headers: chartCache },
    ];
  },
};

export default nextConfig;
