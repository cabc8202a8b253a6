// Test users and real database sessions (the same rows Auth.js writes after a sign-in link is used). Test
// users have chosen their public name (a display name), as a contributor does on their first visit.
import { randomBytes, randomUUID } from "node:crypto";
import { db } from "@/db";
import { sessions, users, type UserRole } from "@/db/schema";

export async function createUser(role: UserRole, label: string = role): Promise<{ id: string; email: string }> {
  const email = `${label}-${randomUUID().slice(0, 8)}@test.sagline.localhost`;
  const [row] = await db
    .insert(users)
    .values({ email, role, displayName: `Test ${label}`, publicNameChosenAt: new Date() })
    .returning({ id: users.id, email: users.email });
  if (!row?.email) throw new Error("user insert returned nothing");
  return { id: row.id, email: row.email };
}

export async function createSession(userId: string, expiresInS = 3600): Promise<string> {
  const token = randomBytes(24).toString("hex");
  await db.insert(sessions).values({ sessionToken: token, userId, expires: new Date(Date.now() + expiresInS * 1000) });
  return token;
}

/** A user with a live session; returns the token to put in the request. */
export async function signedIn(role: UserRole, label?: string): Promise<{ id: string; email: string; token: string }> {
  const u = await createUser(role, label);
  return { ...u, token: await createSession(u.id) };
}
