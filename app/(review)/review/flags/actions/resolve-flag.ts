"use server";
// Resolve a reader flag: keep the result, keep it with a moderator's note, or take the result out of publication
// with a reason (approved → withdrawn, with its review event).
import { resolveReaderFlag } from "@/server/review";
import { authedAction } from "@/server/authed-action";
import { resolveFlagSchema } from "@/lib/validations/review";

export const resolveFlag = authedAction("flag.resolve", resolveFlagSchema, (input, user) =>
  resolveReaderFlag(user.id, input.flagId, input.resolution, input.note),
);
