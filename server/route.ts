// The one wrapper every route handler goes through. Public handlers pass "public"; the others name a
// permission. State-changing requests from a browser must come from our own origin.
import "server-only";
import { AppError, errorResponse } from "@/lib/errors";
import { can, type Permission } from "@/lib/permissions";
import { getRequestUser, type SessionUser } from "@/server/session";

type Handler<C> = (req: Request, ctx: C, user: SessionUser | null) => Promise<Response>;

const SAFE = new Set(["GET", "HEAD", "OPTIONS"]);

function checkOrigin(req: Request): void {
  if (SAFE.has(req.method)) return;
  const origin = req.headers.get("origin");
  if (!origin) return; // non-browser clients (curl, scripts) send none
  const host = req.headers.get("x-forwarded-host") ?? req.headers.get("host");
  let originHost: string;
  try {
    originHost = new URL(origin).host;
  } catch {
    throw new AppError("forbidden", "Cross-site request refused.");
  }
  if (originHost !== host) throw new AppError("forbidden", "Cross-site request refused.");
}

export function withPermission<C = unknown>(permission: Permission | "public", handler: Handler<C>) {
  const route = async (req: Request, ctx: C): Promise<Response> => {
    try {
      checkOrigin(req);
      const user = await getRequestUser(req);
      if (permission !== "public") {
        if (!user) throw new AppError("unauthenticated", "Please sign in first.");
        if (!can(user.role, permission)) throw new AppError("forbidden", "Your role does not allow this.");
      }
      return await handler(req, ctx, user);
    } catch (err) {
      return errorResponse(err);
    }
  };
  // The permission travels with the handler so one test can check every route against the table.
  return Object.assign(route, { permission });
}
