// A contributor's public name: a display name shown on published results, or anonymity — an explicit choice,
// recorded when it was made; an empty name is never taken as a wish to be anonymous.
import { beforeEach, describe, expect, it, vi } from "vitest";
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { users } from "@/db/schema";
import { getSessionUserByToken } from "@/db/queries/sessions";
import { nameOnResults } from "@/lib/user-name";
import { requestState } from "../helpers/next-mocks";
import { createSession, signedIn } from "../helpers/users";

vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const { updateProfile } = await import("@/app/(account)/account/actions/update-profile");

function form(values: Record<string, string>): FormData {
  const fd = new FormData();
  for (const [k, v] of Object.entries(values)) fd.set(k, v);
  return fd;
}

async function profile(id: string) {
  const [u] = await db
    .select({ displayName: users.displayName, anonymous: users.anonymous })
    .from(users)
    .where(eq(users.id, id));
  if (!u) throw new Error("user missing");
  return u;
}

describe("public name", () => {
  beforeEach(() => {
    requestState.token = null;
  });

  it("saves a trimmed display name and shows it on results", async () => {
    const me = await signedIn("contributor");
    requestState.token = me.token;
    expect(await updateProfile(null, form({ displayName: "  Heron Bench  ", publicName: "name" }))).toMatchObject({
      ok: true,
      data: { displayName: "Heron Bench", anonymous: false },
    });
    const p = await profile(me.id);
    expect(p).toEqual({ displayName: "Heron Bench", anonymous: false });
    expect(nameOnResults(p)).toBe("Heron Bench");
  });

  it("lets a contributor choose anonymity, with or without a name", async () => {
    const me = await signedIn("contributor");
    requestState.token = me.token;
    expect(await updateProfile(null, form({ displayName: "", publicName: "anonymous" }))).toMatchObject({ ok: true });
    let p = await profile(me.id);
    expect(p).toEqual({ displayName: null, anonymous: true });
    expect(nameOnResults(p)).toBe("Anonymous tester");

    await updateProfile(null, form({ displayName: "Kept Private", publicName: "anonymous" }));
    p = await profile(me.id);
    expect(p).toEqual({ displayName: "Kept Private", anonymous: true });
    expect(nameOnResults(p)).toBe("Anonymous tester");
  });

  it("records the choice: a newcomer has none, and is named “A contributor” until they choose", async () => {
    const [u] = await db
      .insert(users)
      .values({ email: `newcomer-${Date.now()}@test.sagline.localhost` })
      .returning({ id: users.id });
    if (!u) throw new Error("no user");
    const token = await createSession(u.id);
    expect(await getSessionUserByToken(token)).toMatchObject({ publicNameChosen: false });
    expect(nameOnResults(await profile(u.id))).toBe("A contributor");
    requestState.token = token;
    expect((await updateProfile(null, form({ displayName: "Fresh Bench", publicName: "name" }))).ok).toBe(true);
    expect(await getSessionUserByToken(token)).toMatchObject({ publicNameChosen: true, displayName: "Fresh Bench" });
  });

  it("needs the choice itself, a name when a name is chosen, and refuses addresses and markup", async () => {
    const me = await signedIn("contributor");
    requestState.token = me.token;
    const before = await profile(me.id);
    const unchosen = await updateProfile(null, form({ displayName: "" }));
    expect(unchosen.ok ? "" : unchosen.fieldErrors?.publicName?.[0]).toMatch(/Choose how your published results/);
    for (const [displayName, message] of [
      ["", /Enter the name to show, or choose to stay anonymous/],
      ["x", /at least 2 characters/],
      ["me@example.com", /e-mail address/],
      ["<b>Loud</b>", /ordinary punctuation/],
      ["y".repeat(61), /at most 60/],
    ] as const) {
      const res = await updateProfile(null, form({ displayName, publicName: "name" }));
      expect(res.ok).toBe(false);
      expect(res.ok ? "" : res.fieldErrors?.displayName?.[0]).toMatch(message);
    }
    expect(await profile(me.id)).toEqual(before);
  });
});
