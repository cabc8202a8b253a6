// The security review's one role matrix: EVERY server action (app/**/actions/*.ts) and EVERY
// state-changing route handler (POST/PUT/PATCH/DELETE in app/**/route.ts) is found on disk and called
// with no session, with each role, and (routes) from a foreign Origin. Each must carry the permission it
// was wrapped with, and answer 401 / 403 exactly as lib/permissions.ts says. A new action or route that
// skips the wrappers fails here.
import fs from "node:fs";
import path from "node:path";
import { beforeAll, describe, expect, it, vi } from "vitest";
import { userRoles, type UserRole } from "@/db/schema";
import { can, type Permission } from "@/lib/permissions";
import { requestState } from "../helpers/next-mocks";
import { signedIn } from "../helpers/users";

vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const root = path.resolve(__dirname, "../..");
const appDir = path.join(root, "app");
const files = (fs.readdirSync(appDir, { recursive: true }) as string[]).map((f) => path.join(appDir, f));
const actionFiles = files.filter((f) => /[/\\]actions[/\\][^/\\]+\.ts$/.test(f));
const routeFiles = files.filter((f) => /[/\\]route\.ts$/.test(f));

// Actions that must work without a session: asking for a sign-in link, and signing out.
const PUBLIC_ACTIONS = new Set(["requestSignInLink", "signOut"]);
// What each action and state-changing route must require — the reviewed matrix. A new action or route
// fails until it is added here, so nobody adds one without deciding who may call it.
const EXPECTED_ACTIONS: Record<string, Permission> = {
  startPackEmails: "pack-emails.manage",
  stopPackEmails: "pack-emails.manage",
  updateProfile: "account.update",
  withdrawResult: "result.withdraw-own",
  previewStoredLog: "upload.create",
  keepDraftFiles: "upload.create",
  submitResult: "result.submit",
  resubmitResult: "result.resubmit-own",
  saveBenchProfile: "bench-profile.manage",
  deleteBenchProfile: "bench-profile.manage",
  editPackLabel: "catalogue.edit",
  mergeMakers: "catalogue.merge",
  mergePacks: "catalogue.merge",
  setUserRole: "user.set-role",
  saveSiteSettings: "settings.edit",
  retryMail: "mail.retry",
  approveResult: "result.review",
  rejectResult: "result.review",
  askContributor: "result.review",
  resolveFlag: "flag.resolve",
  featureChart: "chart.feature",
};
const EXPECTED_ROUTES: Record<string, Permission | "public"> = {
  "POST api/auth/[...nextauth]": "public",
  "POST api/v1/analyse": "public",
  "POST api/v1/results/[id]/flags": "result.flag",
  "POST api/v1/charts": "chart.save",
  "POST api/v1/uploads/log": "upload.create",
  "POST api/v1/uploads/photo": "upload.create",
};
const MUTATING = ["POST", "PUT", "PATCH", "DELETE"] as const;

type Guarded = ((...args: never[]) => Promise<unknown>) & { permission?: Permission | "public" };
type ActionOut = { ok: boolean; code?: string };

const tokens = {} as Record<UserRole, string>;
beforeAll(async () => {
  for (const role of userRoles) tokens[role] = (await signedIn(role, `matrix-${role}`)).token;
});

async function callAction(fn: Guarded, token: string | null): Promise<ActionOut> {
  requestState.token = token;
  return (await (fn as unknown as (p: null, f: FormData) => Promise<ActionOut>)(null, new FormData())) ?? { ok: true };
}

const ctx = { params: Promise.resolve({ id: "1", nextauth: ["signin", "nodemailer"], resultId: "1", slug: "x" }) };
async function callRoute(fn: Guarded, method: string, token: string | null, origin?: string): Promise<number> {
  const headers = new Headers({ host: "localhost:3000", "content-type": "application/json" });
  if (token) headers.set("cookie", `authjs.session-token=${token}`);
  if (origin) headers.set("origin", origin);
  const req = new Request("http://localhost:3000/api/matrix", { method, headers, body: "{}" });
  const res = await (fn as unknown as (r: Request, c: typeof ctx) => Promise<Response>)(req, ctx);
  return res.status;
}

describe("every server action goes through authedAction and answers per the permission table", () => {
  it("finds the actions on disk", () => {
    expect(actionFiles.length).toBeGreaterThanOrEqual(15);
  });

  for (const file of actionFiles) {
    const rel = path.relative(root, file);
    it(rel, async () => {
      const mod = (await import(file)) as Record<string, unknown>;
      const actions = Object.entries(mod).filter(([, v]) => typeof v === "function") as [string, Guarded][];
      expect(actions.length, `${rel} exports an action`).toBeGreaterThan(0);
      for (const [name, fn] of actions) {
        if (PUBLIC_ACTIONS.has(name)) continue;
        const permission = fn.permission;
        expect(permission, `${rel}#${name} is wrapped by authedAction`).toBeDefined();
        expect(permission, `${rel}#${name} requires what the matrix says`).toBe(EXPECTED_ACTIONS[name]);
        if (!permission || permission === "public") continue;
        expect(await callAction(fn, null), `${name} without a session`).toMatchObject({
          ok: false,
          code: "unauthenticated",
        });
        for (const role of userRoles) {
          const out = await callAction(fn, tokens[role]);
          if (can(role, permission))
            expect(out.code ?? "ok", `${name} as ${role}`).not.toMatch(/^(unauthenticated|forbidden)$/);
          else expect(out, `${name} as ${role}`).toMatchObject({ ok: false, code: "forbidden" });
        }
      }
    });
  }
});

describe("every state-changing route handler goes through withPermission, checks Origin and the table", () => {
  it("finds the routes on disk", () => {
    expect(routeFiles.length).toBeGreaterThanOrEqual(10);
  });

  for (const file of routeFiles) {
    const rel = path.relative(root, file);
    it(rel, async () => {
      const mod = (await import(file)) as Record<string, unknown>;
      for (const method of MUTATING) {
        const fn = mod[method] as Guarded | undefined;
        if (!fn) continue;
        const permission = fn.permission;
        expect(permission, `${method} ${rel} is wrapped by withPermission`).toBeDefined();
        const key = `${method} ${path.relative(appDir, path.dirname(file)).split(path.sep).join("/")}`;
        expect(permission, `${key} requires what the matrix says`).toBe(EXPECTED_ROUTES[key]);
        expect(
          await callRoute(fn, method, tokens.admin, "https://evil.example"),
          `${method} ${rel} from a foreign Origin`,
        ).toBe(403);
        if (!permission || permission === "public") continue;
        expect(await callRoute(fn, method, null), `${method} ${rel} without a session`).toBe(401);
        for (const role of userRoles) {
          const status = await callRoute(fn, method, tokens[role]);
          if (can(role, permission)) expect([401, 403], `${method} ${rel} as ${role}`).not.toContain(status);
          else expect(status, `${method} ${rel} as ${role}`).toBe(403);
        }
      }
    });
  }
});
