// One cache for every app instance (issue 18): Next.js's pages (ISR) and data cache (unstable_cache) kept in Redis
// instead of each instance's own disk and memory, so a decision taken on one instance — which revalidates its tags —
// is fresh on every instance at the next request. Used only when REDIS_URL is set (next.config.mjs); a single
// instance without Redis keeps Next's own file-system cache, as before.
//
// This is Next.js's documented custom `cacheHandler` interface (get / set / revalidateTag / resetRequestCache).
// Loaded by Next at run time as plain JavaScript, hence .mjs and JSDoc instead of TypeScript.
//
// Layout in Redis (prefix REDIS_CACHE_PREFIX, default "sagline"):
//   <prefix>:<build id>:e:<key>  one entry: { lastModified, tags, value } as JSON (Buffers and Maps tagged);
//                                entries belong to one build, so a new deployment never serves an old build's pages;
//   <prefix>:tags                a hash: tag → the time (ms) it was last revalidated, shared by every build.
// An entry is served only if none of its tags (its own, and the soft tags of the request reading it) was
// revalidated at or after the entry was written. Redis unreachable: reads miss (pages are rendered fresh — slower,
// never stale), writes are dropped, and revalidations are kept and sent once Redis is back, so an entry written
// before an outage cannot outlive a decision taken during it.
import fs from "node:fs";
import path from "node:path";
import { createClient } from "@redis/client";

const ENTRY_TTL_S = 24 * 3600;
const TAGS_HEADER = "x-next-cache-tags";

let shared = null; // { client, ready: Promise<void> } — one connection per process
const pendingTags = new Map(); // tag → time, revalidations Redis has not taken yet
let lastWarning = 0;

function warn(message) {
  const now = Date.now();
  if (now - lastWarning < 60_000) return;
  lastWarning = now;
  console.error(`sagline: shared cache: ${message}`);
}

function connection() {
  if (shared) return shared;
  const client = createClient({
    url: process.env.REDIS_URL,
    // Fail fast while disconnected instead of queueing: a page render must not wait for Redis.
    disableOfflineQueue: true,
    socket: { connectTimeout: 2000, reconnectStrategy: (retries) => Math.min(100 * 2 ** retries, 5000) },
  });
  client.on("error", (err) => warn(`Redis unavailable (${err.message}); pages are rendered fresh until it is back`));
  client.on("ready", () => {
    if (pendingTags.size === 0) return;
    const times = Object.fromEntries([...pendingTags].map(([t, ms]) => [t, String(ms)]));
    pendingTags.clear();
    client.hSet(tagsKey(), times).catch((err) => {
      for (const [t, ms] of Object.entries(times)) pendingTags.set(t, Number(ms));
      warn(`could not record revalidated tags (${err.message})`);
    });
  });
  // Ready once connected, or after the first failure or 2 s: a request never waits longer for Redis than that.
  const ready = new Promise((resolve) => {
    client.once("ready", resolve);
    client.once("error", resolve);
    setTimeout(resolve, 2000).unref();
  });
  client.connect().catch((err) => warn(`cannot connect (${err.message})`));
  shared = { client, ready };
  return shared;
}

/** Closes this process's connection (tests; a server keeps it for its lifetime). */
export async function closeSharedCache() {
  const s = shared;
  shared = null;
  if (s) await s.client.destroy();
}

const prefix = () => process.env.REDIS_CACHE_PREFIX || "sagline";
const tagsKey = () => `${prefix()}:tags`;

/** JSON that keeps Buffers and Maps (Next's page entries hold both: the RSC payload and its segments). */
export function encode(value) {
  return JSON.stringify(value, function (key, v) {
    const original = this[key];
    if (Buffer.isBuffer(original)) return { $buffer: original.toString("base64") };
    if (original instanceof Map) return { $map: [...original.entries()] };
    return v;
  });
}
export function decode(text) {
  return JSON.parse(text, (_key, v) => {
    if (v && typeof v === "object" && !Array.isArray(v)) {
      if (typeof v.$buffer === "string" && Object.keys(v).length === 1) return Buffer.from(v.$buffer, "base64");
      if (Array.isArray(v.$map) && Object.keys(v).length === 1) return new Map(v.$map);
    }
    return v;
  });
}

/** Every tag an entry answers to: the data cache's own tags and a page's or route's cache-tags header. */
function tagsOf(data, ctx) {
  const tags = new Set(ctx?.tags ?? []);
  for (const t of Array.isArray(data?.tags) ? data.tags : []) tags.add(t);
  const header = data?.headers?.[TAGS_HEADER];
  if (typeof header === "string") for (const t of header.split(",")) if (t) tags.add(t);
  return [...tags];
}

export default class RedisCacheHandler {
  /** @param {{ serverDistDir?: string }} ctx */
  constructor(ctx = {}) {
    let buildId = "dev";
    try {
      if (ctx.serverDistDir) buildId = fs.readFileSync(path.join(ctx.serverDistDir, "..", "BUILD_ID"), "utf8").trim();
    } catch {
      // No BUILD_ID (development): one namespace.
    }
    this.entryPrefix = `${prefix()}:${buildId}:e:`;
    this.redis = connection();
  }

  async get(key, ctx = {}) {
    const { client, ready } = this.redis;
    await ready;
    if (!client.isReady) return null;
    try {
      const text = await client.get(this.entryPrefix + key);
      if (text === null) return null;
      const entry = decode(text);
      const tags = [...new Set([...(entry.tags ?? []), ...(ctx.tags ?? []), ...(ctx.softTags ?? [])])];
      if (tags.length > 0) {
        const times = await client.hmGet(tagsKey(), tags);
        if (times.some((t) => t !== null && Number(t) >= entry.lastModified)) return null;
      }
      return { lastModified: entry.lastModified, value: entry.value, cacheControl: entry.cacheControl };
    } catch (err) {
      warn(`read failed (${err.message})`);
      return null;
    }
  }

  async set(key, data, ctx = {}) {
    const { client, ready } = this.redis;
    await ready;
    if (!client.isReady) return;
    try {
      if (data === null || data === undefined) {
        await client.del(this.entryPrefix + key);
        return;
      }
      const entry = { lastModified: Date.now(), tags: tagsOf(data, ctx), value: data, cacheControl: ctx.cacheControl };
      await client.set(this.entryPrefix + key, encode(entry), { EX: ENTRY_TTL_S });
    } catch (err) {
      warn(`write failed (${err.message})`);
    }
  }

  /** Every instance reads these times, so a tag revalidated here is expired everywhere (a stale-while-revalidate
   * profile is taken as expiry too: Sagline only ever asks for fresh data after a decision). */
  async revalidateTag(tags, _durations) {
    const list = typeof tags === "string" ? [tags] : [...tags];
    if (list.length === 0) return;
    const now = Date.now();
    const { client, ready } = this.redis;
    await ready;
    const times = Object.fromEntries(list.map((t) => [t, String(now)]));
    try {
      if (!client.isReady) throw new Error("not connected");
      await client.hSet(tagsKey(), times);
    } catch (err) {
      for (const t of list) pendingTags.set(t, now);
      warn(`revalidation kept until Redis is back (${err.message})`);
    }
  }

  resetRequestCache() {}
}
