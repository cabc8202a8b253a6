import "server-only";
import { asc, count, sql } from "drizzle-orm";
import { db } from "@/db";
import { users, type UserRole } from "@/db/schema";

export type UserListRow = {
  id: string;
  email: string | null;
  displayName: string | null;
  anonymous: boolean;
  role: UserRole;
  createdAt: Date;
};

/** Users for the admin list: admins first, then moderators, then contributors; by address within each. */
export async function listUsers(limit: number, offset: number): Promise<{ rows: UserListRow[]; total: number }> {
  const rows = await db
    .select({
      id: users.id,
      email: users.email,
      displayName: users.displayName,
      anonymous: users.anonymous,
      role: users.role,
      createdAt: users.createdAt,
    })
    .from(users)
    .orderBy(
      sql`case ${users.role} when 'admin' then 0 when 'moderator' then 1 else 2 end`,
      asc(users.email),
      asc(users.id),
    )
    .limit(limit)
    .offset(offset);
  const [total] = await db.select({ n: count() }).from(users);
  return { rows, total: total?.n ?? 0 };
}
