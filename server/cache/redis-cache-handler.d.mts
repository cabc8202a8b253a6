// Types for server/cache/redis-cache-handler.mjs (plain JavaScript, loaded by Next.js at run time).
export type CacheContext = { kind?: string; tags?: string[]; softTags?: string[]; cacheControl?: unknown };
export type CacheEntry = { lastModified: number; value: unknown; cacheControl?: unknown };
export function encode(value: unknown): string;
export function decode(text: string): unknown;
export function closeSharedCache(): Promise<void>;
export default class RedisCacheHandler {
  constructor(ctx?: { serverDistDir?: string });
  get(key: string, ctx?: CacheContext): Promise<CacheEntry | null>;
  set(key: string, data: unknown, ctx?: CacheContext): Promise<void>;
  revalidateTag(tags: string | string[], durations?: { expire?: number }): Promise<void>;
  resetRequestCache(): void;
}
