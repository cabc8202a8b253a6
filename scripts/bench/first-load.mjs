// First-load JS of a page, from the production build: the <script src> chunks its HTML loads (noModule polyfills
// excluded), each gzipped (level 9) and summed. Run after `next build`. The HTML is the prerendered file of a
// static page, or, for a page rendered per request, a file of its HTML given as the second argument.
import fs from "node:fs";
import path from "node:path";
import zlib from "node:zlib";

const route = process.argv[2] ?? "/packs";
const next = path.resolve(process.env.NEXT_DIST_DIR ?? ".next");
const html = fs.readFileSync(
  process.argv[3] ?? path.join(next, "server", "app", `${route === "/" ? "index" : route.slice(1)}.html`),
  "utf8",
);
// Scripts marked noModule (the legacy polyfills) are never fetched by the browsers that run modules.
const tags = [...html.matchAll(/<script[^>]*>/g)].map((m) => m[0]).filter((t) => !/\snomodule/i.test(t));
const srcs = [...new Set(tags.flatMap((t) => /src="([^"]+\.js)"/.exec(t)?.[1] ?? []))];
let raw = 0;
let gz = 0;
for (const src of srcs) {
  const file = path.join(next, src.replace(/^\/_next\//, "").split("?")[0]);
  const buf = fs.readFileSync(file);
  raw += buf.length;
  gz += zlib.gzipSync(buf, { level: 9 }).length;
}
const inline = [...html.matchAll(/<script>([\s\S]*?)<\/script>/g)].reduce((s, m) => s + Buffer.byteLength(m[1]), 0);
const kb = (n) => (n / 1024).toFixed(1);
console.log(
  `first-load JS of ${route}: ${kb(gz)} KB gzip (${kb(raw)} KB raw, ${srcs.length} chunks; target ≤ 180 KB) — plus ${kb(inline)} KB of inline RSC payload in the HTML`,
);
