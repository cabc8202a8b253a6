import "server-only";
import { and, eq, gt, sql } from "drizzle-orm";
import { db } from "@/db";
import { sessions, users, type UserRole } from "@/db/schema";

export type SessionUser = {
  id: string;
  email: string | null;
  role: UserRole;
  displayName: string | null;
  anonymous: boolean;
  /** Whether they chose how published results name them (a name, or anonymous). */
  publicNameChosen: boolean;
};

/** The signed-in user behind a database session token, with the role as it is now (not as it was). */
export async function getSessionUserByToken(token: string): Promise<SessionUser | null> {
  const rows = await db
    .select({
      id: users.id,
      email: users.email,
      role: users.role,
      displayName: users.displayName,
      anonymous: users.anonymous,
      publicNameChosen: sql<boolean>`${users.publicNameChosenAt} is not null`,
    })
    .from(sessions)
    .innerJoin(users, eq(users.id, sessions.userId))
    .where(and(eq(sessions.sessionToken, token), gt(sessions.expires, new Date())))
    .limit(1);
  return rows[0] ?? null;
}
