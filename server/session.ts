// Who is asking. Auth.js keeps database sessions, so the session cookie is a token we can look up
// directly; the role is read fresh on every request, so a demotion takes effect at once.
import "server-only";
import { cookies } from "next/headers";
import { getSessionUserByToken, type SessionUser } from "@/db/queries/sessions";

export type { SessionUser };
const SESSION_COOKIES = ["__Secure-authjs.session-token", "authjs.session-token"] as const;

function sessionTokenFromCookieHeader(header: string | null): string | null {
  if (!header) return null;
  for (const part of header.split(";")) {
    const [name, ...rest] = part.trim().split("=");
    if (name && (SESSION_COOKIES as readonly string[]).includes(name)) return decodeURIComponent(rest.join("="));
  }
  return null;
}

/** The current user from the request cookies (server components and server actions). */
export async function getCurrentUser(): Promise<SessionUser | null> {
  const jar = await cookies();
  for (const name of SESSION_COOKIES) {
    const token = jar.get(name)?.value;
    if (token) return getSessionUserByToken(token);
  }
  return null;
}

/** The current user of a route handler's request. */
export async function getRequestUser(req: Request): Promise<SessionUser | null> {
  const token = sessionTokenFromCookieHeader(req.headers.get("cookie"));
  return token ? getSessionUserByToken(token) : null;
}
