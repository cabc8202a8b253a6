"use server";
import { revalidatePath } from "next/cache";
import { deleteBenchProfile as deleteBenchProfileRow } from "@/db/mutations/bench-profiles";
import { authedAction } from "@/server/authed-action";
import { deleteBenchProfileSchema } from "@/lib/validations/bench-profile";

/** Delete one of the user's own bench profiles (results made with it keep their method card). */
export const deleteBenchProfile = authedAction(
  "bench-profile.manage",
  deleteBenchProfileSchema,
  async ({ id }, user) => {
    const deleted = await deleteBenchProfileRow(user.id, id);
    revalidatePath("/account");
    revalidatePath("/account/bench-profiles");
    return deleted;
  },
);
