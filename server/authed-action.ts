// The one wrapper every server action goes through: session (401), permission (403), zod input (422),
// and errors mapped to { ok, error, fieldErrors } for useActionState — never a stack trace.
import "server-only";
import type { z } from "zod";
import { actionError, AppError, type ActionResult } from "@/lib/errors";
import { can, type Permission } from "@/lib/permissions";
import { getCurrentUser, type SessionUser } from "@/server/session";

async function requireUser(permission: Permission, user?: SessionUser | null): Promise<SessionUser> {
  const current = user === undefined ? await getCurrentUser() : user;
  if (!current) throw new AppError("unauthenticated", "Please sign in first. Your draft is kept.");
  if (!can(current.role, permission)) throw new AppError("forbidden", "Your role does not allow this.");
  return current;
}

function formDataToObject(fd: FormData): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const key of new Set(fd.keys())) {
    const all = fd.getAll(key);
    out[key] = all.length > 1 ? all : all[0];
  }
  return out;
}

export function authedAction<S extends z.ZodType, T>(
  permission: Permission,
  schema: S,
  fn: (input: z.infer<S>, user: SessionUser) => Promise<T>,
) {
  const action = async (
    _prev: ActionResult<T> | null | undefined,
    payload: FormData | z.input<S>,
  ): Promise<ActionResult<T>> => {
    try {
      const user = await requireUser(permission);
      const raw = payload instanceof FormData ? formDataToObject(payload) : payload;
      // A hand-made request can call an action with anything (a JSON body decodes to a bare object or a
      // string): only a form or an object of fields is an input; the rest is a bad request, not a crash.
      if (raw === null || typeof raw !== "object" || Array.isArray(raw))
        throw new AppError("bad_request", "Send the form's fields.");
      const input = schema.parse(raw);
      return { ok: true, data: await fn(input, user) };
    } catch (err) {
      return actionError(err);
    }
  };
  // The permission travels with the action so one test can check every action against the table.
  return Object.assign(action, { permission });
}
