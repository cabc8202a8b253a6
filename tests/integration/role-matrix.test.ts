// The role matrix: every server action, route handler and signed-in page added for sign-in, account,
// bench profiles, new-result e-mails about a pack and roles, called with no session, with each role, and checked against the
// permission table: no session → 401 / unauthenticated (pages: redirect to sign-in), a role the table
// does not allow → 403 / forbidden, an allowed role → success.
import { beforeAll, describe, expect, it, vi } from "vitest";
import { db } from "@/db";
import { benchProfiles, makers, packs, userRoles, type UserRole } from "@/db/schema";
import { can, type Permission } from "@/lib/permissions";
import type { ActionResult } from "@/lib/errors";
import { emptyBenchProfile, type BenchProfileFormValues } from "@/lib/validations/bench-profile";
import { redirectTarget, requestState } from "../helpers/next-mocks";
import { createUser, signedIn } from "../helpers/users";

vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const { updateProfile } = await import("@/app/(account)/account/actions/update-profile");
const { signOut } = await import("@/app/(account)/account/actions/sign-out");
const { saveBenchProfile } = await import("@/app/(account)/account/bench-profiles/actions/save-bench-profile");
const { deleteBenchProfile } = await import("@/app/(account)/account/bench-profiles/actions/delete-bench-profile");
const { setUserRole } = await import("@/app/(admin)/admin/users/actions/set-user-role");
const { startPackEmails } = await import("@/app/actions/start-pack-emails");
const { stopPackEmails } = await import("@/app/actions/stop-pack-emails");
const { requestSignInLink } = await import("@/app/(auth)/sign-in/actions/request-sign-in-link");
const meRoute = await import("@/app/api/v1/me/route");
const authRoute = await import("@/app/api/auth/[...nextauth]/route");
const AccountPage = (await import("@/app/(account)/account/page")).default;
const BenchProfilesPage = (await import("@/app/(account)/account/bench-profiles/page")).default;
const NewBenchProfilePage = (await import("@/app/(account)/account/bench-profiles/new/page")).default;
const EditBenchProfilePage = (await import("@/app/(account)/account/bench-profiles/[id]/edit/page")).default;
const AdminUsersPage = (await import("@/app/(admin)/admin/users/page")).default;

type Who = { id: string; token: string } | null;
let packId = 0;

beforeAll(async () => {
  const [maker] = await db.insert(makers).values({ slug: "matrixmaker", name: "Matrixmaker" }).returning();
  if (!maker) throw new Error("no maker");
  const [pack] = await db
    .insert(packs)
    .values({
      slug: "matrixmaker-850",
      makerId: maker.id,
      model: "Grid 850 3S 45C",
      cellsInSeries: 3,
      ratedCapacityMah: 850,
      labelledContinuousC: 45,
      connector: "XT30",
    })
    .returning();
  if (!pack) throw new Error("no pack");
  packId = pack.id;
});

async function ownProfile(userId: string): Promise<number> {
  const [row] = await db
    .insert(benchProfiles)
    .values({ userId, name: "Matrix bench", loadEquipment: "Test load", resistanceMethod: "dc-step" })
    .returning();
  if (!row) throw new Error("no profile");
  return row.id;
}

const profileForm: BenchProfileFormValues = {
  ...emptyBenchProfile,
  name: "Matrix bench",
  loadEquipment: "Test load",
  resistanceMethod: "dc-step",
};

// Each action with the permission it must demand and a valid call for a given (possibly absent) user.
const actions: { name: string; permission: Permission; call: (who: Who) => Promise<ActionResult<unknown>> }[] = [
  {
    name: "updateProfile",
    permission: "account.update",
    call: () => updateProfile(null, { displayName: "Matrix Tester", publicName: "name" }),
  },
  {
    name: "saveBenchProfile (create)",
    permission: "bench-profile.manage",
    call: () => saveBenchProfile(null, profileForm),
  },
  {
    name: "saveBenchProfile (update)",
    permission: "bench-profile.manage",
    call: async (who) => saveBenchProfile(null, { ...profileForm, id: who ? await ownProfile(who.id) : 1 }),
  },
  {
    name: "deleteBenchProfile",
    permission: "bench-profile.manage",
    call: async (who) => deleteBenchProfile(null, { id: who ? await ownProfile(who.id) : 1 }),
  },
  { name: "startPackEmails", permission: "pack-emails.manage", call: () => startPackEmails(null, { packId }) },
  { name: "stopPackEmails", permission: "pack-emails.manage", call: () => stopPackEmails(null, { packId }) },
  {
    name: "setUserRole",
    permission: "user.set-role",
    call: async () => setUserRole(null, { userId: (await createUser("contributor", "target")).id, role: "moderator" }),
  },
];

// Signed-in pages and the permission each checks; a page "succeeds" by returning its element tree.
const pages: { path: string; permission: Permission; render: (who: Who) => Promise<unknown> }[] = [
  { path: "/account", permission: "account.update", render: () => AccountPage() },
  { path: "/account/bench-profiles", permission: "bench-profile.manage", render: () => BenchProfilesPage() },
  { path: "/account/bench-profiles/new", permission: "bench-profile.manage", render: () => NewBenchProfilePage() },
  {
    path: "/account/bench-profiles",
    permission: "bench-profile.manage",
    render: async (who) =>
      EditBenchProfilePage({ params: Promise.resolve({ id: String(who ? await ownProfile(who.id) : 1) }) }),
  },
  {
    path: "/admin/users",
    permission: "user.set-role",
    render: () => AdminUsersPage({ searchParams: Promise.resolve({}) }),
  },
];

async function as(role: UserRole | null): Promise<Who> {
  if (role === null) {
    requestState.token = null;
    return null;
  }
  const u = await signedIn(role, `matrix-${role}`);
  requestState.token = u.token;
  return u;
}

const roles: (UserRole | null)[] = [null, ...userRoles];

describe("role matrix: server actions", () => {
  for (const a of actions) {
    for (const role of roles) {
      const expected = role === null ? "unauthenticated" : can(role, a.permission) ? "ok" : "forbidden";
      it(`${a.name} as ${role ?? "nobody"} → ${expected}`, async () => {
        const who = await as(role);
        const res = await a.call(who);
        if (expected === "ok") expect(res).toMatchObject({ ok: true });
        else expect(res).toMatchObject({ ok: false, code: expected });
      });
    }
  }

  it("requestSignInLink is public: without a session it validates the input instead of refusing", async () => {
    await as(null);
    const fd = new FormData();
    fd.set("email", "not an address");
    expect(await requestSignInLink(null, fd)).toMatchObject({ ok: false, code: "validation" });
  });

  it("signOut is public: without a session it just goes home", async () => {
    await as(null);
    const to = await signOut().then(
      () => null,
      (err: unknown) => redirectTarget(err),
    );
    expect(to).toBe("http://localhost:3011/");
  });
});

describe("role matrix: pages", () => {
  for (const p of pages) {
    for (const role of roles) {
      const expected = role === null ? "redirect to sign-in" : can(role, p.permission) ? "render" : "403";
      it(`${p.path} (${p.render === pages[3]?.render ? "edit" : "view"}) as ${role ?? "nobody"} → ${expected}`, async () => {
        const who = await as(role);
        const outcome = await p.render(who).then(
          () => "render",
          (err: unknown) => {
            const to = redirectTarget(err);
            if (to !== null) return to.startsWith("/sign-in?callbackUrl=") ? "redirect to sign-in" : `redirect ${to}`;
            const digest =
              typeof err === "object" && err !== null && "digest" in err
                ? String((err as { digest: unknown }).digest)
                : String(err);
            return digest === "NEXT_HTTP_ERROR_FALLBACK;403" ? "403" : digest;
          },
        );
        expect(outcome).toBe(expected);
      });
    }
  }
});

describe("role matrix: route handlers", () => {
  const ctx = { params: Promise.resolve({ nextauth: [] as string[] }) };
  for (const role of roles) {
    it(`GET /api/v1/me as ${role ?? "nobody"} (public) → 200 with ${role ?? "no user"}`, async () => {
      const who = await as(role);
      const res = await meRoute.GET(
        new Request("http://localhost:3011/api/v1/me", {
          headers: who ? { cookie: `authjs.session-token=${who.token}` } : {},
        }),
        {},
      );
      expect(res.status).toBe(200);
      expect(res.headers.get("cache-control")).toContain("no-store");
      const body = (await res.json()) as { user: { role: string; name: string } | null };
      expect(body.user?.role ?? null).toBe(role);
    });
  }

  it("GET /api/auth/session (public, Auth.js) answers without a session", async () => {
    const res = await authRoute.GET(
      new Request("http://localhost:3011/api/auth/session", { headers: { host: "localhost:3011" } }),
      ctx,
    );
    expect(res.status).toBe(200);
    expect(await res.json()).toBeNull();
  });

  it("POST /api/auth/* from another site is refused before Auth.js sees it", async () => {
    const res = await authRoute.POST(
      new Request("http://localhost:3011/api/auth/signin/nodemailer", {
        method: "POST",
        headers: { host: "localhost:3011", origin: "https://elsewhere.example" },
        body: new URLSearchParams({ email: "x@y.example" }),
      }),
      ctx,
    );
    expect(res.status).toBe(403);
  });
});
