// User writes: a contributor's own profile, and role changes by admins. A role change locks the admin
// rows, refuses to demote the last admin, and writes its audit event in the same transaction.
import "server-only";
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { auditEvents, users, type UserRole } from "@/db/schema";
import { AppError } from "@/lib/errors";
import type { ProfileInput } from "@/lib/validations/account";

export async function updateProfile(userId: string, input: ProfileInput): Promise<void> {
  const rows = await db
    .update(users)
    .set({ displayName: input.displayName, anonymous: input.anonymous, publicNameChosenAt: new Date() })
    .where(eq(users.id, userId))
    .returning({ id: users.id });
  if (rows.length === 0) throw new AppError("not_found", "Your account was not found.");
}

export type RoleChange = { userId: string; from: UserRole; to: UserRole; changed: boolean };

export async function setUserRole(actorId: string, userId: string, role: UserRole): Promise<RoleChange> {
  return db.transaction(async (tx) => {
    // Locking every admin row makes concurrent demotions queue up; a waiting transaction then re-reads
    // the admins and sees the one already demoted, so two admins can never demote each other to zero.
    const admins = await tx.select({ id: users.id }).from(users).where(eq(users.role, "admin")).for("update");
    const [target] = await tx.select({ role: users.role }).from(users).where(eq(users.id, userId)).for("update");
    if (!target) throw new AppError("not_found", "That user does not exist.");
    if (target.role === role) return { userId, from: target.role, to: role, changed: false };
    if (target.role === "admin" && admins.length <= 1) {
      throw new AppError("conflict", "This is the last admin. Make someone else an admin first.");
    }
    await tx.update(users).set({ role }).where(eq(users.id, userId));
    await tx.insert(auditEvents).values({
      actorId,
      action: "user.set-role",
      entityType: "user",
      entityId: userId,
      data: { from: target.role, to: role },
    });
    return { userId, from: target.role, to: role, changed: true };
  });
}
