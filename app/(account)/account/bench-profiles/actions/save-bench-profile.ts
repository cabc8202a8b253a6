"use server";
import { revalidatePath } from "next/cache";
import { createBenchProfile, updateBenchProfile } from "@/db/mutations/bench-profiles";
import { authedAction } from "@/server/authed-action";
import { saveBenchProfileSchema } from "@/lib/validations/bench-profile";
import { revalidateBenchProfile } from "@/server/bench-profile-tags";

/** Create a bench profile, or update one of the user's own when an id is given. */
export const saveBenchProfile = authedAction(
  "bench-profile.manage",
  saveBenchProfileSchema,
  async ({ id, ...profile }, user) => {
    const saved =
      id === null ? await createBenchProfile(user.id, profile) : await updateBenchProfile(user.id, id, profile);
    revalidatePath("/account");
    revalidatePath("/account/bench-profiles");
    // The ± on its published results and its public bench page follow the bench's stated accuracy.
    if (id !== null) await revalidateBenchProfile(id);
    return saved;
  },
);
