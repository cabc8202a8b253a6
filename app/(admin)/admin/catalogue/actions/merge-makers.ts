"use server";
// Merge a duplicate maker into another; its packs (and their results) move and the merge is recorded in the audit log.
import { mergeMakers as mergeMakersFor } from "@/server/catalogue-admin";
import { authedAction } from "@/server/authed-action";
import { mergeSchema } from "@/lib/validations/catalogue-admin";

export const mergeMakers = authedAction("catalogue.merge", mergeSchema, (input, user) =>
  mergeMakersFor(user.id, input.sourceId, input.targetId),
);
