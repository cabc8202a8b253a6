// Stand-ins for next/headers and next/cache in integration tests, so server actions run outside Next.js
// with a real session: `requestState.token` holds a session token inserted into the sessions table, and
// server/session.ts really looks it up. Use in a test file with:
//   vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);
//   vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);
export const requestState = {
  token: null as string | null,
  ip: "203.0.113.10",
  host: "localhost:3011",
  cookiesSet: [] as { name: string; value: string }[],
  revalidated: [] as string[],
};

const SESSION_COOKIE = "authjs.session-token";

export const nextHeaders = {
  cookies: async () => ({
    get: (name: string) =>
      name === SESSION_COOKIE && requestState.token ? { name, value: requestState.token } : undefined,
    getAll: () => (requestState.token ? [{ name: SESSION_COOKIE, value: requestState.token }] : []),
    has: (name: string) => name === SESSION_COOKIE && !!requestState.token,
    set: (name: string, value: string) => {
      requestState.cookiesSet.push({ name, value });
    },
    delete: () => undefined,
  }),
  headers: async () =>
    new Headers({
      host: requestState.host,
      "x-forwarded-proto": "http",
      "x-forwarded-for": requestState.ip,
      ...(requestState.token ? { cookie: `${SESSION_COOKIE}=${requestState.token}` } : {}),
    }),
};

export const nextCache = {
  revalidatePath: (path: string) => {
    requestState.revalidated.push(path);
  },
  revalidateTag: (tag: string) => {
    requestState.revalidated.push(`tag:${tag}`);
  },
  // No cache outside Next.js: the wrapped query runs every time.
  unstable_cache: <A extends unknown[], R>(fn: (...args: A) => Promise<R>) => fn,
};

/** Thrown by redirect() from next/navigation; its digest carries the target. */
export function redirectTarget(err: unknown): string | null {
  const digest =
    typeof err === "object" && err !== null && "digest" in err ? String((err as { digest: unknown }).digest) : "";
  if (!digest.startsWith("NEXT_REDIRECT")) return null;
  return digest.split(";")[2] ?? null;
}

/**
 * A next/cache stand-in that really caches: entries are keyed by the key parts and the call's arguments and
 * carry their tags; revalidateTag drops every entry with that tag. For tests that prove a cached read goes
 * stale without a tag and fresh with one. Use with:
 *   vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).taggedCache);
 */
const taggedStore = new Map<string, { tags: string[]; value: Promise<unknown> }>();
export const taggedCache = {
  store: taggedStore,
  revalidatePath: (path: string) => {
    requestState.revalidated.push(path);
  },
  revalidateTag: (tag: string) => {
    requestState.revalidated.push(`tag:${tag}`);
    for (const [key, entry] of taggedStore) if (entry.tags.includes(tag)) taggedStore.delete(key);
  },
  unstable_cache:
    <A extends unknown[], R>(
      fn: (...args: A) => Promise<R>,
      keyParts: string[] = [],
      options: { tags?: string[] } = {},
    ) =>
    (...args: A): Promise<R> => {
      const key = JSON.stringify([keyParts, args]);
      const hit = taggedStore.get(key);
      if (hit) return hit.value as Promise<R>;
      // Like Next's cache, values go through JSON (a Date comes back as a string).
      const value = fn(...args).then((v) => JSON.parse(JSON.stringify(v)) as R);
      taggedStore.set(key, { tags: options.tags ?? [], value });
      value.catch(() => taggedStore.delete(key));
      return value;
    },
};
