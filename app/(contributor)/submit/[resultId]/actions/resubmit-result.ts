"use server";
import { revalidatePath } from "next/cache";
import { authedAction } from "@/server/authed-action";
import { resubmitResultFor } from "@/server/submissions/resubmit";
import { resubmitResultSchema } from "@/lib/validations/result";

/** Answer a change request: edited method card (and optionally a new log or photos), back to pending. */
export const resubmitResult = authedAction("result.resubmit-own", resubmitResultSchema, async (input, user) => {
  const out = await resubmitResultFor(input, user);
  revalidatePath("/account");
  return out;
});
