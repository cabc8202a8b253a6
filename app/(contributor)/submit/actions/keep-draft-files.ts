"use server";
import { authedAction } from "@/lib/authed-action";
import { keepDraftFilesFor } from "@/lib/submissions/draft-files";
import { keepDraftFilesSchema } from "@/lib/validations/result";

/** The draft in this browser is open again: keep its uploaded files from the sweep, and say which are gone. */
export const keepDraftFiles = authedAction("upload.create", keepDraftFilesSchema, (input, user) => keepDraftFilesFor(user.id, input));
