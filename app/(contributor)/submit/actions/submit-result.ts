"use server";
import { revalidatePath } from "next/cache";
import { authedAction } from "@/server/authed-action";
import { submitResultFor } from "@/server/submissions/submit";
import { submitResultSchema } from "@/lib/validations/result";

/** Submit a result: one per idempotency key, figures recomputed from the stored log, receipt queued. */
export const submitResult = authedAction("result.submit", submitResultSchema, async (input, user) => {
  const out = await submitResultFor(input, user);
  revalidatePath("/account");
  return out;
});
