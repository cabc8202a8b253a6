// The role matrix of every moderation and catalogue action: signed-out → 401, a role the permission table
// does not list → 403, an allowed role passes the gate (here to a 404 on a missing id, so nothing changes).
import { describe, expect, it, vi } from "vitest";
import type { ActionResult } from "@/lib/errors";
import { requestState } from "../helpers/next-mocks";
import { signedIn } from "../helpers/users";

vi.mock("@/server/revalidate", () => ({ revalidateTags: vi.fn() }));
vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const { approveResult } = await import("@/app/(review)/review/[id]/actions/approve-result");
const { rejectResult } = await import("@/app/(review)/review/[id]/actions/reject-result");
const { askContributor } = await import("@/app/(review)/review/[id]/actions/ask-contributor");
const { resolveFlag } = await import("@/app/(review)/review/flags/actions/resolve-flag");
const { editPackLabel } = await import("@/app/(admin)/admin/catalogue/actions/edit-pack-label");
const { mergePacks } = await import("@/app/(admin)/admin/catalogue/actions/merge-packs");
const { mergeMakers } = await import("@/app/(admin)/admin/catalogue/actions/merge-makers");

const missing = 999_999_999;
type Call = () => Promise<ActionResult<unknown>>;
const actions: { name: string; allowed: string[]; call: Call }[] = [
  { name: "approveResult", allowed: ["moderator", "admin"], call: () => approveResult(null, { resultId: missing }) },
  {
    name: "rejectResult",
    allowed: ["moderator", "admin"],
    call: () => rejectResult(null, { resultId: missing, reason: "duplicate" }),
  },
  {
    name: "askContributor",
    allowed: ["moderator", "admin"],
    call: () => askContributor(null, { resultId: missing, note: "Please fix." }),
  },
  {
    name: "resolveFlag",
    allowed: ["moderator", "admin"],
    call: () => resolveFlag(null, { flagId: missing, resolution: "kept" }),
  },
  {
    name: "editPackLabel",
    allowed: ["admin"],
    call: () =>
      editPackLabel(null, {
        packId: missing,
        cellsInSeries: 4,
        ratedCapacityMah: 1300,
        labelledContinuousC: 75,
        labelledBurstC: null,
        weightG: null,
        connector: "XT60",
      }),
  },
  {
    name: "mergePacks",
    allowed: ["admin"],
    call: () => mergePacks(null, { sourceId: missing, targetId: missing - 1 }),
  },
  {
    name: "mergeMakers",
    allowed: ["admin"],
    call: () => mergeMakers(null, { sourceId: missing, targetId: missing - 1 }),
  },
];

const tokens: Record<string, string | null> = { anonymous: null };

describe("moderation role matrix", () => {
  it("signs in one user per role", async () => {
    for (const role of ["contributor", "moderator", "admin"] as const) tokens[role] = (await signedIn(role)).token;
  });

  for (const a of actions) {
    for (const role of ["anonymous", "contributor", "moderator", "admin"]) {
      const expected = role === "anonymous" ? "unauthenticated" : a.allowed.includes(role) ? "not_found" : "forbidden";
      it(`${a.name} as ${role} → ${expected}`, async () => {
        requestState.token = tokens[role] ?? null;
        expect(await a.call()).toMatchObject({ ok: false, code: expected });
      });
    }
  }
});
