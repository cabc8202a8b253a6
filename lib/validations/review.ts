// Inputs of the moderation actions and the reader-flag endpoint. Shared by forms and server.
import { z } from "zod";
import { recordId } from "./ids";
import { flagReasons, rejectReasons } from "@/lib/enums";
export type { RejectReason } from "@/lib/enums";
import { flagCodes } from "@/lib/flag-labels";

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

/** "" (the form's "no, a new entry") or a catalogue id. */
const optionalId = z
  .union([z.literal(""), id])
  .optional()
  .transform((v) => (v === "" || v === undefined ? null : v));

/**
 * Approve a pending result. For a result on a proposed pack the moderator may say it is an existing pack
 * (intoPackId) or that its new maker is an existing maker (intoMakerId); otherwise the proposal goes live.
 */
export const approveResultSchema = z.object({
  resultId: id,
  note: note(2000),
  intoPackId: optionalId,
  intoMakerId: optionalId,
});
export const rejectResultSchema = z
  .object({ resultId: id, reason: z.enum(rejectReasons, { error: "Choose a reason." }), note: note(2000) })
  .refine((v) => v.reason !== "other" || (v.note?.length ?? 0) >= 3, {
    path: ["note"],
    message: "Say why in the note when the reason is “other”.",
  });
/** Send a pending result back to its contributor: the note is what they are asked to answer or change. */
export const askContributorSchema = z.object({
  resultId: id,
  note: requiredNote(2000, "Say what the contributor should answer or change."),
});

export const readerFlagSchema = z.object({
  reason: z.enum(flagReasons, { error: "Choose a reason." }),
  note: note(1000),
});
export const resolveFlagSchema = z
  .object({ flagId: id, resolution: z.enum(flagResolutions, { error: "Choose how to resolve it." }), note: note(2000) })
  .refine((v) => v.resolution !== "corrected" || (v.note?.length ?? 0) >= 3, {
    path: ["note"],
    message: "Say in the note what the reader got right.",
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
