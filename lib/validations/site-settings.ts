// An admin's site settings (/admin/settings): a notice on every page and a pause on new submissions.
import { z } from "zod";
import { checkbox } from "./form-fields";

/** Empty or blank text means "none". */
const optionalText = (max: number, what: string) =>
  z
    .string()
    .max(2000)
    .optional()
    .transform((v) => (v ?? "").replace(/\s+/g, " ").trim())
    .pipe(z.string().max(max, `${what} can be at most ${max} characters.`))
    .transform((v) => (v.length > 0 ? v : null));

export const siteSettingsSchema = z
  .object({
    notice: optionalText(300, "The notice"),
    submissionsPaused: checkbox,
    pauseReason: optionalText(300, "The reason"),
  })
  .refine((s) => !s.submissionsPaused || s.pauseReason !== null, {
    path: ["pauseReason"],
    message: "Say why submissions are paused: contributors see it on the submit page.",
  });
export type SiteSettingsInput = z.output<typeof siteSettingsSchema>;
