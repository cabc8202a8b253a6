"use server";
// Send a pending result back to its contributor with a note saying what they should answer or change; it
// waits for their answer (state awaiting_answer) and they are e-mailed a link to their view of it.
import { decideResult } from "@/server/review";
import { authedAction } from "@/server/authed-action";
import { askContributorSchema } from "@/lib/validations/review";

export const askContributor = authedAction("result.review", askContributorSchema, (input, user) =>
  decideResult(user.id, input.resultId, { kind: "ask", note: input.note }),
);
