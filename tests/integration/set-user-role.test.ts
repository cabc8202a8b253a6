// Admins change roles: every change is audited in the same transaction, the last admin cannot be
// demoted (not even by two admins demoting each other at once), and because the role is read from the
// database on every request a demotion takes effect on the very next action.
import { beforeEach, describe, expect, it, vi } from "vitest";
import { and, eq } from "drizzle-orm";
import { db } from "@/db";
import { auditEvents, users } from "@/db/schema";
import { setUserRole as setRoleRow } from "@/db/mutations/users";
import { getSessionUserByToken } from "@/db/queries/sessions";
import { requestState } from "../helpers/next-mocks";
import { createUser, signedIn } from "../helpers/users";

vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const { setUserRole } = await import("@/app/(admin)/admin/users/actions/set-user-role");

async function roleOf(id: string) {
  const [u] = await db.select({ role: users.role }).from(users).where(eq(users.id, id));
  return u?.role;
}

async function auditFor(id: string) {
  return db
    .select()
    .from(auditEvents)
    .where(and(eq(auditEvents.entityType, "user"), eq(auditEvents.entityId, id)));
}

/** Leave exactly the given admins in the database (other files' tests may have made some). */
async function onlyAdmins(ids: string[]) {
  await db.update(users).set({ role: "contributor" }).where(eq(users.role, "admin"));
  for (const id of ids) await db.update(users).set({ role: "admin" }).where(eq(users.id, id));
}

describe("set user role", () => {
  beforeEach(() => {
    requestState.token = null;
  });

  it("changes a role and writes an audit event naming the admin, from and to", async () => {
    const admin = await signedIn("admin");
    const target = await createUser("contributor", "promote");
    requestState.token = admin.token;
    const res = await setUserRole(null, { userId: target.id, role: "moderator" });
    expect(res).toMatchObject({ ok: true, data: { from: "contributor", to: "moderator", changed: true } });
    expect(await roleOf(target.id)).toBe("moderator");
    const events = await auditFor(target.id);
    expect(events).toHaveLength(1);
    expect(events[0]).toMatchObject({
      actorId: admin.id,
      action: "user.set-role",
      data: { from: "contributor", to: "moderator" },
    });

    // Setting the same role again changes nothing and adds no event.
    expect(await setUserRole(null, { userId: target.id, role: "moderator" })).toMatchObject({
      ok: true,
      data: { changed: false },
    });
    expect(await auditFor(target.id)).toHaveLength(1);
  });

  it("refuses to demote the last admin, and writes nothing", async () => {
    const admin = await signedIn("admin", "last");
    await onlyAdmins([admin.id]);
    requestState.token = admin.token;
    const res = await setUserRole(null, { userId: admin.id, role: "moderator" });
    expect(res).toMatchObject({ ok: false, code: "conflict" });
    expect(res.ok ? "" : res.error).toMatch(/last admin/);
    expect(await roleOf(admin.id)).toBe("admin");
    expect(await auditFor(admin.id)).toHaveLength(0);
  });

  it("lets one of two admins demote the other, but never both at once", async () => {
    const a = await createUser("admin", "a");
    const b = await createUser("admin", "b");
    await onlyAdmins([a.id, b.id]);
    const outcomes = await Promise.allSettled([
      setRoleRow(a.id, b.id, "contributor"),
      setRoleRow(b.id, a.id, "contributor"),
    ]);
    expect(outcomes.filter((o) => o.status === "fulfilled")).toHaveLength(1);
    const rejected = outcomes.find((o) => o.status === "rejected");
    expect(rejected?.status === "rejected" ? rejected.reason : null).toMatchObject({ code: "conflict" });
    const roles = [await roleOf(a.id), await roleOf(b.id)].sort();
    expect(roles).toEqual(["admin", "contributor"]);
  });

  it("a demoted admin loses admin rights on their next request, with the same session", async () => {
    const first = await signedIn("admin", "first");
    const second = await signedIn("admin", "second");
    await onlyAdmins([first.id, second.id]);
    const someone = await createUser("contributor", "someone");

    requestState.token = first.token;
    expect(await setUserRole(null, { userId: someone.id, role: "moderator" })).toMatchObject({ ok: true });

    requestState.token = second.token;
    expect(await setUserRole(null, { userId: first.id, role: "contributor" })).toMatchObject({
      ok: true,
      data: { changed: true },
    });

    requestState.token = first.token;
    expect((await getSessionUserByToken(first.token))?.role).toBe("contributor");
    const refused = await setUserRole(null, { userId: someone.id, role: "admin" });
    expect(refused).toMatchObject({ ok: false, code: "forbidden" });
    expect(await roleOf(someone.id)).toBe("moderator");
  });

  it("answers 404 for an unknown user and 422 for an unknown role", async () => {
    const admin = await signedIn("admin");
    requestState.token = admin.token;
    expect(await setUserRole(null, { userId: "no-such-user", role: "moderator" })).toMatchObject({
      ok: false,
      code: "not_found",
    });
    const fd = new FormData();
    fd.set("userId", admin.id);
    fd.set("role", "superuser");
    expect(await setUserRole(null, fd)).toMatchObject({
      ok: false,
      code: "validation",
      fieldErrors: { role: ["Choose contributor, moderator or admin."] },
    });
  });
});
