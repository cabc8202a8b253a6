"use server";
// Approve a pending result: it is published (a proposed pack goes live with it, or merges into the existing
// pack the moderator names), its pages are revalidated, the contributor and the pack's e-mail list are told.
import { decideResult } from "@/server/review";
import { authedAction } from "@/server/authed-action";
import { approveResultSchema } from "@/lib/validations/review";

export const approveResult = authedAction("result.review", approveResultSchema, (input, user) =>
  decideResult(user.id, input.resultId, {
    kind: "approve",
    note: input.note,
    catalogue: { intoPackId: input.intoPackId, intoMakerId: input.intoMakerId },
  }),
);
