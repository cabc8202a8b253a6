// Page access for the moderation and catalogue pages: signed-out visitors are sent to sign in, roles the
// permission table does not list get the 403 page (forbidden()), allowed roles get the page.
import { describe, expect, it, vi } from "vitest";
import { requestState, redirectTarget } from "../helpers/next-mocks";
import { signedIn } from "../helpers/users";

// next.config.mjs sets experimental.authInterrupts; Next's build passes it to forbidden() this way.
process.env.__NEXT_EXPERIMENTAL_AUTH_INTERRUPTS = "true";
vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const { default: ReviewQueuePage } = await import("@/app/(review)/review/page");
const { default: ReaderFlagsPage } = await import("@/app/(review)/review/flags/page");
const { default: CataloguePage } = await import("@/app/(admin)/admin/catalogue/page");
const { default: SavedChartsPage } = await import("@/app/(review)/review/charts/page");

const pages: { name: string; allowed: string[]; render: () => Promise<unknown> }[] = [
  {
    name: "/review",
    allowed: ["moderator", "admin"],
    render: () => ReviewQueuePage({ searchParams: Promise.resolve({ flag: "bogus" }) }),
  },
  { name: "/review/flags", allowed: ["moderator", "admin"], render: () => ReaderFlagsPage() },
  {
    name: "/review/charts",
    allowed: ["moderator", "admin"],
    render: () => SavedChartsPage({ searchParams: Promise.resolve({}) }),
  },
  { name: "/admin/catalogue", allowed: ["admin"], render: () => CataloguePage() },
];

async function outcome(render: () => Promise<unknown>): Promise<string> {
  try {
    await render();
    return "page";
  } catch (err) {
    if (redirectTarget(err)?.startsWith("/sign-in")) return "sign-in";
    const digest = typeof err === "object" && err && "digest" in err ? String((err as { digest: unknown }).digest) : "";
    if (digest === "NEXT_HTTP_ERROR_FALLBACK;403") return "403";
    throw err;
  }
}

describe("moderation page access", () => {
  const tokens: Record<string, string | null> = { anonymous: null };
  it("signs in one user per role", async () => {
    for (const role of ["contributor", "moderator", "admin"] as const) tokens[role] = (await signedIn(role)).token;
  });
  for (const p of pages) {
    for (const role of ["anonymous", "contributor", "moderator", "admin"]) {
      const expected = role === "anonymous" ? "sign-in" : p.allowed.includes(role) ? "page" : "403";
      it(`${p.name} as ${role} → ${expected}`, async () => {
        requestState.token = tokens[role] ?? null;
        expect(await outcome(p.render)).toBe(expected);
      });
    }
  }
});
