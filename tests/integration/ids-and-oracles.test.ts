// Limits on strangers' work (issue 13, item 5), the id and ownership part: every route, action and page that
// takes a row id refuses anything but a positive 32-bit integer with 404/422 — never 500, never SQL in the log
// — and someone else's row answers exactly like a missing one (404), so nobody learns which ids exist. A body
// that is not the action's fields is a bad request, not a crash.
import { afterEach, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { MAX_RECORD_ID, recordId } from "@/lib/validations/ids";
import { redirectTarget, requestState } from "../helpers/next-mocks";
import { makePack, makeResult } from "../helpers/review-fixtures";
import { signedIn } from "../helpers/users";

process.env.__NEXT_EXPERIMENTAL_AUTH_INTERRUPTS = "true";
vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const action = async <T>(path: string, name: string) => ((await import(path)) as Record<string, T>)[name] as T;
type Action = (prev: null, payload: unknown) => Promise<{ ok: boolean; code?: string }>;

const TOO_BIG = [String(MAX_RECORD_ID + 1), "99999999999", "1e3", "0x10", " 7", "-1", "0", "1.5"];
let errors: ReturnType<typeof vi.spyOn>;
beforeEach(() => {
  errors = vi.spyOn(console, "error");
});
afterEach(() => {
  // Nothing here may reach the "unexpected error" log (a 500 with a stack, or SQL).
  expect(errors).not.toHaveBeenCalled();
  errors.mockRestore();
});

const tokens: Record<string, string> = {};
beforeAll(async () => {
  for (const role of ["contributor", "moderator", "admin"] as const) tokens[role] = (await signedIn(role)).token;
});

describe("ids are positive 32-bit integers everywhere", () => {
  it("the shared schema: digits only, 1 … 2³¹−1, from a path string or a JSON number", () => {
    expect(recordId.parse("1")).toBe(1);
    expect(recordId.parse(MAX_RECORD_ID)).toBe(MAX_RECORD_ID);
    expect(recordId.parse(String(MAX_RECORD_ID))).toBe(MAX_RECORD_ID);
    for (const bad of [...TOO_BIG, MAX_RECORD_ID + 1, 0, -5, 2.5, null, "", "abc"])
      expect(recordId.safeParse(bad).success, String(bad)).toBe(false);
  });

  it("routes: GET /api/v1/results/{id} 404 (a path naming no row), POST …/flags 404 (signed in)", async () => {
    const { GET } = await import("@/app/api/v1/results/[id]/route");
    const flags = await import("@/app/api/v1/results/[id]/flags/route");
    for (const id of TOO_BIG) {
      const get = await GET(
        new Request(`http://localhost/api/v1/results/${id}`, { headers: { "x-forwarded-for": "10.6.0.1" } }),
        {
          params: Promise.resolve({ id }),
        },
      );
      expect(get.status, id).toBe(404);
      const post = await flags.POST(
        new Request(`http://localhost/api/v1/results/${id}/flags`, {
          method: "POST",
          headers: { cookie: `authjs.session-token=${tokens.contributor}`, "content-type": "application/json" },
          body: JSON.stringify({ reason: "other" }),
        }),
        { params: Promise.resolve({ id }) },
      );
      expect(post.status, id).toBe(404);
    }
  });

  it.each([
    [
      "@/app/(review)/review/[id]/actions/approve-result",
      "approveResult",
      "moderator",
      (id: string) => ({ resultId: id }),
    ],
    [
      "@/app/(review)/review/[id]/actions/reject-result",
      "rejectResult",
      "moderator",
      (id: string) => ({ resultId: id, reason: "other", note: "why not" }),
    ],
    [
      "@/app/(review)/review/[id]/actions/ask-contributor",
      "askContributor",
      "moderator",
      (id: string) => ({ resultId: id, note: "Change it." }),
    ],
    [
      "@/app/(review)/review/flags/actions/resolve-flag",
      "resolveFlag",
      "moderator",
      (id: string) => ({ flagId: id, resolution: "kept" }),
    ],
    [
      "@/app/(account)/account/actions/withdraw-result",
      "withdrawResult",
      "contributor",
      (id: string) => ({ resultId: id }),
    ],
    [
      "@/app/(account)/account/bench-profiles/actions/delete-bench-profile",
      "deleteBenchProfile",
      "contributor",
      (id: string) => ({ id }),
    ],
    ["@/app/actions/start-pack-emails", "startPackEmails", "contributor", (id: string) => ({ packId: id })],
    ["@/app/actions/stop-pack-emails", "stopPackEmails", "contributor", (id: string) => ({ packId: id })],
    [
      "@/app/(admin)/admin/catalogue/actions/merge-makers",
      "mergeMakers",
      "admin",
      (id: string) => ({ sourceId: id, targetId: "1" }),
    ],
    [
      "@/app/(admin)/admin/catalogue/actions/merge-packs",
      "mergePacks",
      "admin",
      (id: string) => ({ sourceId: "1", targetId: id }),
    ],
  ] as const)("%s refuses ids out of range with a field error", async (path, name, role, input) => {
    const fn = await action<Action>(path, name);
    requestState.token = tokens[role] ?? null;
    for (const id of TOO_BIG) {
      const out = await fn(null, input(id));
      expect(out, `${name} ${id}`).toMatchObject({ ok: false, code: "validation" });
    }
  });

  it("pages: /results/{id}, /review/{id}, /submit/{id} and a bench profile's edit page answer 404", async () => {
    const pages = [
      [(await import("@/app/(public)/results/[id]/page")).default, "id", null],
      [(await import("@/app/(review)/review/[id]/page")).default, "id", "moderator"],
      [(await import("@/app/(contributor)/submit/[resultId]/page")).default, "resultId", "contributor"],
      [(await import("@/app/(account)/account/bench-profiles/[id]/edit/page")).default, "id", "contributor"],
    ] as const;
    for (const [Page, key, role] of pages) {
      requestState.token = role ? (tokens[role] ?? null) : null;
      for (const id of TOO_BIG) {
        const render = (Page as (p: { params: Promise<Record<string, string>> }) => Promise<unknown>)({
          params: Promise.resolve({ [key]: id }),
        });
        await expect(render, `${key} ${id}`).rejects.toMatchObject({ digest: "NEXT_HTTP_ERROR_FALLBACK;404" });
      }
    }
  });
});

describe("someone else's row answers like a missing one", () => {
  it("/submit/{id} of another contributor's result: 404, exactly as for an id that does not exist", async () => {
    const { default: ResubmitPage } = await import("@/app/(contributor)/submit/[resultId]/page");
    const owner = await signedIn("contributor");
    const { pack } = await makePack();
    const r = await makeResult({ packId: pack.id, contributorId: owner.id, status: "awaiting_answer" });
    requestState.token = tokens.contributor ?? null;
    for (const id of [String(r.id), "2000000000"])
      await expect(ResubmitPage({ params: Promise.resolve({ resultId: id }) })).rejects.toMatchObject({
        digest: "NEXT_HTTP_ERROR_FALLBACK;404",
      });
    requestState.token = owner.token;
    const own = await ResubmitPage({ params: Promise.resolve({ resultId: String(r.id) }) }).then(
      () => "render",
      (err: unknown) => redirectTarget(err) ?? err,
    );
    expect(own).toBe("render");
  });
});

describe("a payload that is not the action's fields", () => {
  it.each([
    ["a string", "resultId=1"],
    ["an array", [1, 2]],
    ["nothing", undefined],
    ["null", null],
  ])("%s is a bad request (ok: false), never an unexpected error", async (_name, payload) => {
    const approve = await action<Action>("@/app/(review)/review/[id]/actions/approve-result", "approveResult");
    requestState.token = tokens.moderator ?? null;
    expect(await approve(null, payload)).toMatchObject({ ok: false, code: "bad_request" });
  });
});
