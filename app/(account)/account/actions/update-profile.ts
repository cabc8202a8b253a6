"use server";
import { revalidatePath } from "next/cache";
import { updateProfile as updateProfileRow } from "@/db/mutations/users";
import { authedAction } from "@/server/authed-action";
import { profileSchema } from "@/lib/validations/account";

/** The signed-in user's display name, or anonymous. */
export const updateProfile = authedAction("account.update", profileSchema, async (input, user) => {
  await updateProfileRow(user.id, input);
  revalidatePath("/account");
  return { displayName: input.displayName, anonymous: input.anonymous };
});
