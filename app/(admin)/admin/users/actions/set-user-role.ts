"use server";
import { revalidatePath } from "next/cache";
import { setUserRole as setUserRoleRow } from "@/db/mutations/users";
import { authedAction } from "@/server/authed-action";
import { setUserRoleSchema } from "@/lib/validations/user-role";

/** Admins change a user's role; the last admin cannot be demoted; every change is audited. */
export const setUserRole = authedAction("user.set-role", setUserRoleSchema, async ({ userId, role }, user) => {
  const change = await setUserRoleRow(user.id, userId, role);
  revalidatePath("/admin/users");
  return change;
});
