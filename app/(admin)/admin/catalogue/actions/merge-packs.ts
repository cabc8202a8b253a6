"use server";
// Merge a duplicate pack into another; its results move with it and the merge is recorded in the audit log.
import { mergePacks as mergePacksFor } from "@/server/catalogue-admin";
import { authedAction } from "@/server/authed-action";
import { mergeSchema } from "@/lib/validations/catalogue-admin";

export const mergePacks = authedAction("catalogue.merge", mergeSchema, (input, user) =>
  mergePacksFor(user.id, input.sourceId, input.targetId),
);
