// Inputs of the moderation actions and the reader-flag endpoint. Shared by forms and server.
import { z } from "zod";
import { recordId } from "./ids";
import { flagReasons } from "@/lib/enums";
import { flagCodes } from "@/lib/flag-labels";

export const rejectReasons = ["wrong-data", "incomplete-method", "duplicate", "not-a-measurement", "other"] as const;
export type RejectReason = (typeof rejectReasons)[number];
export const rejectReasonLabels: Record<RejectReason, string> = {
  "wrong-data": "Wrong data",
  "incomplete-method": "Incomplete method",
  duplicate: "Duplicate",
  "not-a-measurement": "Not a measurement",
  other: "Other (explain in the note)",
};

export const flagReasonLabels: Record<(typeof flagReasons)[number], string> = {
  "wrong-figures": "The figures look wrong",
  "wrong-pack": "Wrong pack",
  duplicate: "Duplicate of another result",
  "not-a-measurement": "Not a real measurement",
  unsafe: "Unsafe method",
  other: "Other",
};

/** The reason of an open case as the public result page says it (our words; the reader's note is not shown). */
export const openCaseReasonWords: Record<(typeof flagReasons)[number], string> = {
  "wrong-figures": "the figures may be wrong",
  "wrong-pack": "it may be filed under the wrong pack",
  duplicate: "it may repeat another result",
  "not-a-measurement": "it may not come from a real measurement",
  unsafe: "the test method may be unsafe",
  other: "a reason the reader explained to the moderators",
};

const flagResolutions = ["kept", "corrected", "withdrawn"] as const;
export type FlagResolution = (typeof flagResolutions)[number];

const id = recordId;
const note = (max: number) =>
  z
    .string()
    .trim()
    .max(max, `At most ${max} characters.`)
    .optional()
    .transform((v) => (v ? v : null));
const requiredNote = (max: number, message: string) =>
  z.string({ error: message }).trim().min(3, message).max(max, `At most ${max} characters.`);

export const approveResultSchema = z.object({ resultId: id, note: note(2000) });
export const rejectResultSchema = z
  .object({ resultId: id, reason: z.enum(rejectReasons, { error: "Choose a reason." }), note: note(2000) })
  .refine((v) => v.reason !== "other" || (v.note?.length ?? 0) >= 3, {
    path: ["note"],
    message: "Say why in the note when the reason is “other”.",
  });
export const requestChangesSchema = z.object({ resultId: id, note: requiredNote(2000, "Say what needs to change.") });

export const readerFlagSchema = z.object({
  reason: z.enum(flagReasons, { error: "Choose a reason." }),
  note: note(1000),
});
export const resolveFlagSchema = z
  .object({ flagId: id, resolution: z.enum(flagResolutions, { error: "Choose how to resolve it." }), note: note(2000) })
  .refine((v) => v.resolution !== "corrected" || (v.note?.length ?? 0) >= 3, {
    path: ["note"],
    message: "Say what was corrected.",
  })
  .refine((v) => v.resolution !== "withdrawn" || (v.note?.length ?? 0) >= 3, {
    path: ["note"],
    message: "Say why the result is taken out of publication; the reason is shown on its page.",
  });

/** /review search params: filters by flag, maker and group; anything unknown falls back to "all". */
export const reviewQueueFilterSchema = z.object({
  flag: z
    .enum([...flagCodes, "none"])
    .optional()
    .catch(undefined),
  maker: z
    .string()
    .regex(/^[a-z0-9-]{1,120}$/)
    .optional()
    .catch(undefined),
  group: z.string().max(200).optional().catch(undefined),
});
export type ReviewQueueFilter = z.infer<typeof reviewQueueFilterSchema>;

export type ReaderFlagInput = z.infer<typeof readerFlagSchema>;
