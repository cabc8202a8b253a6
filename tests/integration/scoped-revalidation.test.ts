// Revalidation scoped to what a change touches (server/cache-tags.ts): a decision, a withdrawal and a bench
// profile's edit revalidate exactly the tags of the results they change and the lists that count them — never
// another pack's, maker's, group's or result's tag, and no tag that every page carries.
import { eq } from "drizzle-orm";
import { beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { db } from "@/db";
import { results } from "@/db/schema";
import { decideResult, resolveReaderFlag, fileReaderFlag } from "@/server/review";
import { makeResult } from "../helpers/fixtures";
import { requestState } from "../helpers/next-mocks";
import { makeModerator, seedOpenData } from "../helpers/open-data-fixtures";
import { signedIn } from "../helpers/users";

const revalidate = vi.hoisted(() => ({ revalidateTags: vi.fn<(tags: readonly string[]) => void>() }));
vi.mock("@/server/revalidate", () => revalidate);
vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const { saveBenchProfile } = await import("@/app/(account)/account/bench-profiles/actions/save-bench-profile");

const P = "scoped";
/** Tags every cached read carried before scoping; no change may use them again. */
const RETIRED_SITE_WIDE = ["packs", "results"];
let fx: Awaited<ReturnType<typeof seedOpenData>>;
let moderatorId = "";

const lastTags = () => new Set(revalidate.revalidateTags.mock.calls.at(-1)?.[0]);

const benchForm = (values: Record<string, string>) => {
  const fd = new FormData();
  for (const [k, v] of Object.entries({
    name: "Shed bench",
    loadEquipment: "300 W electronic load",
    logger: "2-channel logger",
    resistanceMeter: "",
    resistanceMethod: "dc-step",
    calibratedOn: "2026-02-10",
    notes: "",
    defaultAmbientC: "22",
    defaultLoadMode: "constant-current",
    defaultCutoffVPerCell: "3.3",
    defaultStopTemperatureC: "60",
    defaultSampleRateHz: "10",
    ...values,
  }))
    fd.set(k, v);
  return fd;
};

beforeAll(async () => {
  fx = await seedOpenData(P);
  moderatorId = await makeModerator(P);
});

beforeEach(() => {
  revalidate.revalidateTags.mockClear();
  requestState.token = null;
});

describe("scoped revalidation", () => {
  it("an approval revalidates its result, pack, maker and group and the lists that count it, nothing else", async () => {
    const pending = fx.results.find((r) => r.status === "pending");
    if (!pending) throw new Error("fixture has no pending result");
    await decideResult(moderatorId, pending.id, {
      kind: "approve",
      note: null,
      catalogue: { intoPackId: null, intoMakerId: null },
    });
    const pack = fx.packs[0]!; // the fixture's pending result is on the first pack
    expect(lastTags()).toEqual(
      new Set([
        `result:${pending.id}`,
        `pack:${pack.slug}`,
        `maker:${P}-voltwren`,
        `group:${fx.group}`,
        "newest",
        "groups",
        "catalogue",
        "result-lists",
      ]),
    );
    for (const t of RETIRED_SITE_WIDE) expect(lastTags().has(t)).toBe(false);
  });

  it("a withdrawal after a reader's flag revalidates what counted the result; the flag itself only its page and pack", async () => {
    const reader = await signedIn("contributor");
    const approved = fx.results.find((r) => r.status === "approved")!;
    const { flagId } = await fileReaderFlag(
      approved.id,
      { reason: "other", note: "The curve looks copied." },
      { userId: reader.id, reporterHash: null },
    );
    expect(lastTags()).toEqual(new Set([`result:${approved.id}`, `pack:${fx.packs[0]!.slug}`]));
    await resolveReaderFlag(moderatorId, flagId, "withdrawn", "Copied from another log.");
    expect(lastTags()).toEqual(
      new Set([
        `result:${approved.id}`,
        `pack:${fx.packs[0]!.slug}`,
        `maker:${P}-voltwren`,
        `group:${fx.group}`,
        "newest",
        "groups",
        "catalogue",
        "result-lists",
      ]),
    );
  });

  it("a bench profile's edit revalidates only the results measured with it (and its bench), never the catalogue", async () => {
    const me = await signedIn("contributor");
    requestState.token = me.token;
    const created = await saveBenchProfile(null, benchForm({}));
    if (!created.ok) throw new Error("bench profile not created");
    const benchId = created.data.id;
    const other = await saveBenchProfile(null, benchForm({ name: "Second bench" }));
    if (!other.ok) throw new Error("second bench profile not created");
    expect(revalidate.revalidateTags).not.toHaveBeenCalled(); // a new profile has no results to refresh

    const onBench = [
      await makeResult(fx.packs[1]!, me.id, { ambientC: 22 }),
      await makeResult(fx.packs[2]!, me.id, { ambientC: 35 }),
    ];
    const pendingOnBench = await makeResult(fx.packs[0]!, me.id, { status: "pending" });
    const onOtherBench = await makeResult(fx.packs[0]!, me.id, { ambientC: 22 });
    for (const r of [...onBench, pendingOnBench])
      await db.update(results).set({ benchProfileId: benchId }).where(eq(results.id, r.id));
    await db.update(results).set({ benchProfileId: other.data.id }).where(eq(results.id, onOtherBench.id));
    const groups = await db
      .select({ id: results.id, groupKey: results.groupKey })
      .from(results)
      .where(eq(results.contributorId, me.id));
    const groupOf = (id: number) => groups.find((g) => g.id === id)?.groupKey ?? "";

    const saved = await saveBenchProfile(null, benchForm({ id: String(benchId), resistanceMethod: "ac-1khz" }));
    expect(saved.ok).toBe(true);
    expect(revalidate.revalidateTags).toHaveBeenCalledTimes(1);
    expect(lastTags()).toEqual(
      new Set([
        `bench:${benchId}`,
        "benches",
        "result-lists",
        `result:${onBench[0]!.id}`,
        `pack:${fx.packs[1]!.slug}`,
        `maker:${P}-voltwren`,
        `group:${groupOf(onBench[0]!.id)}`,
        `result:${onBench[1]!.id}`,
        `pack:${fx.packs[2]!.slug}`,
        `maker:${P}-pikecell`,
        `group:${groupOf(onBench[1]!.id)}`,
      ]),
    );
    // Not the pending result, not the other bench's result or pack, no list that every page carries.
    for (const t of [
      `result:${pendingOnBench.id}`,
      `result:${onOtherBench.id}`,
      `pack:${fx.packs[0]!.slug}`,
      "catalogue",
      "groups",
      "newest",
      ...RETIRED_SITE_WIDE,
    ])
      expect(lastTags().has(t), t).toBe(false);
  });
});
