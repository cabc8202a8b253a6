// Guards for server-rendered pages in the signed-in areas. The proxy has already sent cookie-less visitors
// to /sign-in; here the session is really looked up (an expired one also goes to /sign-in) and the role
// is checked against the permission table (403 page otherwise).
import "server-only";
import { forbidden, redirect } from "next/navigation";
import { can, type Permission } from "@/lib/permissions";
import { getCurrentUser, type SessionUser } from "@/server/session";

export async function requirePageUser(permission: Permission, returnTo: string): Promise<SessionUser> {
  const user = await getCurrentUser();
  if (!user) redirect(`/sign-in?${new URLSearchParams({ callbackUrl: returnTo })}`);
  if (!can(user.role, permission)) forbidden();
  return user;
}
