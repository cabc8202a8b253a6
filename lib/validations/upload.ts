// Query parameters of the upload route handlers. The label and method-card figures are optional: they
// only shape the preview (the submission re-analyses the stored log with the values it is sent).
import { z } from "zod";
import { loadModes } from "@/lib/enums";
import { analyseQuerySchema } from "./analyse";

const LOG_EXTENSIONS = ["csv", "txt", "tsv", "log", "dat"] as const;

const filename = z
  .string()
  .trim()
  .min(1, "The file needs a name.")
  .max(200, "The file name can be at most 200 characters.")
  .refine((v) => !/[\u0000-\u001f/\\]/.test(v), "The file name holds characters that cannot be stored.");

export const logUploadQuerySchema = analyseQuerySchema.omit({ include: true }).extend({
  filename: filename.default("log.csv"),
  cutoffVPerCell: z.coerce.number().min(2.5).max(4.2).optional(),
  stopTemperatureC: z.coerce.number().min(-20).max(80).optional(),
  packStartTemperatureC: z.coerce.number().min(-20).max(80).optional(),
  loadCurrentA: z.coerce.number().positive().max(2000).optional(),
  loadMode: z.enum(loadModes).optional(),
});

export function hasLogExtension(name: string): boolean {
  const ext = name.toLowerCase().split(".").pop() ?? "";
  return name.includes(".") && (LOG_EXTENSIONS as readonly string[]).includes(ext);
}
