"use server";
// Reject a pending result with a reason from the list (and a note, required for "other").
import { decideResult } from "@/server/review";
import { authedAction } from "@/server/authed-action";
import { rejectResultSchema } from "@/lib/validations/review";

export const rejectResult = authedAction("result.review", rejectResultSchema, (input, user) =>
  decideResult(user.id, input.resultId, { kind: "reject", reason: input.reason, note: input.note }),
);
