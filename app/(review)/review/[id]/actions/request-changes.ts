"use server";
// Send a pending result back to its contributor with a note saying what needs to change.
import { decideResult } from "@/server/review";
import { authedAction } from "@/server/authed-action";
import { requestChangesSchema } from "@/lib/validations/review";

export const requestChanges = authedAction("result.review", requestChangesSchema, (input, user) =>
  decideResult(user.id, input.resultId, { kind: "request-changes", note: input.note }),
);
