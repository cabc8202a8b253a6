"use server";
import { revalidatePath } from "next/cache";
import { withdrawOwnResult } from "@/db/mutations/results";
import { authedAction } from "@/server/authed-action";
import { withdrawResultSchema } from "@/lib/validations/result";

/** Withdraw one's own result while it waits for review (or for one's changes). */
export const withdrawResult = authedAction(
  "result.withdraw-own",
  withdrawResultSchema,
  async ({ resultId, note }, user) => {
    await withdrawOwnResult(resultId, user.id, note ?? null);
    revalidatePath("/account");
    return { resultId };
  },
);
