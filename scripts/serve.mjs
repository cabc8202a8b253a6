// Serves the production build: Next.js's own request handler (the documented custom-server API) behind a
// plain node:http server that first rewrites X-Forwarded-For from the socket (scripts/serve/forwarded.mjs),
// so per-address limits see the real client and a forged header cannot make new buckets. Used by npm start
// and the browser tests instead of `next start`, which passes a client's X-Forwarded-For on unchanged.
// Usage: node scripts/serve.mjs [-H host] [-p port]
import http from "node:http";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { rewriteForwarded, trustedHops } from "./serve/forwarded.mjs";

process.env.NODE_ENV = "production";
process.env.NEXT_TELEMETRY_DISABLED ??= "1";

function option(flag, fallback) {
  const at = process.argv.indexOf(flag);
  return at > 0 && process.argv[at + 1] ? process.argv[at + 1] : fallback;
}
const hostname = option("-H", "127.0.0.1");
const port = Number(option("-p", process.env.PORT ?? "3000"));
const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..");

const { default: next } = await import("next");
const app = next({ dev: false, dir: root, hostname, port });
const handle = app.getRequestHandler();
await app.prepare(); // loads .env files, so the setting below is read afterwards
let hops;
try {
  hops = trustedHops(process.env.TRUSTED_PROXY_HOPS);
} catch (err) {
  console.error(`sagline: error: ${err.message}`);
  process.exit(1);
}

const server = http.createServer((req, res) => {
  rewriteForwarded(req.headers, req.socket.remoteAddress, hops);
  handle(req, res).catch((err) => {
    console.error(`[serve] ${req.method} ${req.url?.split("?")[0]}: ${err instanceof Error ? err.message : err}`);
    if (!res.headersSent) res.writeHead(500, { "content-type": "text/plain; charset=utf-8" });
    res.end("Something went wrong on our side.");
  });
});
server.listen(port, hostname, () => {
  console.log(`sagline: serving on http://${hostname}:${port} (trusted proxy hops: ${hops})`);
});
for (const signal of ["SIGTERM", "SIGINT"]) {
  process.on(signal, () => {
    server.close(() => process.exit(0));
    setTimeout(() => process.exit(0), 5000).unref();
  });
}
