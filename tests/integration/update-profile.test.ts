// A contributor's display name (shown on published results) or anonymity.
import { beforeEach, describe, expect, it, vi } from "vitest";
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { users } from "@/db/schema";
import { nameOnResults } from "@/lib/user-name";
import { requestState } from "../helpers/next-mocks";
import { signedIn } from "../helpers/users";

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

describe("update profile", () => {
  beforeEach(() => {
    requestState.token = null;
  });

  it("saves a trimmed display name and shows it on results", async () => {
    const me = await signedIn("contributor");
    requestState.token = me.token;
    expect(await updateProfile(null, form({ displayName: "  Heron Bench  " }))).toMatchObject({
      ok: true,
      data: { displayName: "Heron Bench", anonymous: false },
    });
    const p = await profile(me.id);
    expect(p).toEqual({ displayName: "Heron Bench", anonymous: false });
    expect(nameOnResults(p)).toBe("Heron Bench");
  });

  it("lets a contributor stay anonymous, with or without a name", async () => {
    const me = await signedIn("contributor");
    requestState.token = me.token;
    expect(await updateProfile(null, form({ displayName: "", anonymous: "on" }))).toMatchObject({ ok: true });
    let p = await profile(me.id);
    expect(p).toEqual({ displayName: null, anonymous: true });
    expect(nameOnResults(p)).toBe("Anonymous tester");

    await updateProfile(null, form({ displayName: "Kept Private", anonymous: "on" }));
    p = await profile(me.id);
    expect(p).toEqual({ displayName: "Kept Private", anonymous: true });
    expect(nameOnResults(p)).toBe("Anonymous tester");
  });

  it("asks for a name when not anonymous, and refuses addresses and markup", async () => {
    const me = await signedIn("contributor");
    requestState.token = me.token;
    const before = await profile(me.id);
    for (const [displayName, message] of [
      ["", /Enter a display name, or choose to stay anonymous/],
      ["x", /at least 2 characters/],
      ["me@example.com", /e-mail address/],
      ["<b>Loud</b>", /ordinary punctuation/],
      ["y".repeat(61), /at most 60/],
    ] as const) {
      const res = await updateProfile(null, form({ displayName }));
      expect(res.ok).toBe(false);
      expect(res.ok ? "" : res.fieldErrors?.displayName?.[0]).toMatch(message);
    }
    expect(await profile(me.id)).toEqual(before);
  });
});
