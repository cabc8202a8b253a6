"use server";
import { authedAction } from "@/server/authed-action";
import { keepDraftFilesFor } from "@/server/submissions/draft-files";
import { keepDraftFilesSchema } from "@/lib/validations/result";

/** The draft in this browser is open again: keep its uploaded files from the sweep, and say which are gone. */
export const keepDraftFiles = authedAction("upload.create", keepDraftFilesSchema, (input, user) =>
  keepDraftFilesFor(user.id, input),
);
