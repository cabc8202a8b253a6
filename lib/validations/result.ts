// A result submission: one schema for the multi-step form (react-hook-form + zodResolver) and the server
// actions. Inputs hold strings as typed; the schema turns them into numbers. The method-card bounds match
// the results table's checks: ambient −20…60 °C, cut-off 2.5…4.2 V per cell, stop ≤ 80 °C, load > 0.
import { z } from "zod";
import { MAPPING_JSON_MAX, parseMappingJson } from "@/lib/analysis";
import { isRecordIdText, recordIdSchema } from "./ids";
import { loadModes, resistanceMethods } from "@/lib/enums";
import { PHOTO_EXTENSIONS } from "@/lib/storage-keys";
import { optionalNumber, optionalPastDate, optionalText, requiredText } from "./form-fields";

/** A required number typed into an input ("" → "Enter …"). */
const requiredNumber = (label: string, unit: string, check: (n: z.ZodNumber) => z.ZodNumber) =>
  z
    .string({ error: `Enter the ${label.toLowerCase()}${unit ? ` in ${unit}` : ""}.` })
    .trim()
    .transform((v, ctx) => {
      const n = Number(v.replace(",", "."));
      if (v === "" || !Number.isFinite(n)) {
        ctx.addIssue({
          code: "custom",
          message:
            v === "" ? `Enter the ${label.toLowerCase()}${unit ? ` in ${unit}` : ""}.` : `${label} must be a number.`,
        });
        return z.NEVER;
      }
      return n;
    })
    .pipe(check(z.number()));

const PACK_CELLS_MAX = 14;

// ---------- Step 1: the pack ----------
const packStepSchema = z
  .object({
    mode: z.enum(["existing", "new"], { error: "Choose a pack or propose a new one." }),
    packId: z.string().trim(),
    makerId: z.string().trim(),
    makerName: optionalText("Maker name", 80),
    model: optionalText("Model", 120),
    cellsInSeries: optionalNumber("Cells in series", (n) =>
      n
        .int("Cells in series must be a whole number.")
        .min(1, "At least 1 cell.")
        .max(PACK_CELLS_MAX, `At most ${PACK_CELLS_MAX} cells in series.`),
    ),
    ratedCapacityMah: optionalNumber("Rated capacity", (n) =>
      n
        .int("Rated capacity must be a whole number of mAh.")
        .min(50, "Rated capacity must be at least 50 mAh.")
        .max(100_000, "Rated capacity must be at most 100 000 mAh."),
    ),
    labelledContinuousC: optionalNumber("Labelled continuous C", (n) =>
      n.gt(0, "Labelled C must be above 0.").max(1000, "Labelled C must be at most 1000."),
    ),
    labelledBurstC: optionalNumber("Labelled burst C", (n) =>
      n.gt(0, "Burst C must be above 0.").max(2000, "Burst C must be at most 2000."),
    ),
    weightG: optionalNumber("Weight", (n) =>
      n.gt(0, "Weight must be above 0 g.").max(50_000, "Weight must be at most 50 kg."),
    ),
    connector: optionalText("Connector", 40),
  })
  .superRefine((v, ctx) => {
    const need = (path: string, ok: boolean, message: string) => {
      if (!ok) ctx.addIssue({ code: "custom", path: [path], message });
    };
    if (v.mode === "existing") {
      need("packId", isRecordIdText(v.packId), "Choose a pack from the catalogue, or propose a new one.");
      return;
    }
    need("makerName", v.makerId !== "" || v.makerName !== null, "Choose the maker, or give the new maker's name.");
    need("model", v.model !== null, "Enter the model as printed on the label.");
    need("cellsInSeries", v.cellsInSeries !== null, "Enter the cells in series (the S number).");
    need("ratedCapacityMah", v.ratedCapacityMah !== null, "Enter the rated capacity in mAh.");
    need("labelledContinuousC", v.labelledContinuousC !== null, "Enter the labelled continuous C.");
    need("connector", v.connector !== null, "Enter the connector (e.g. XT60).");
    if (v.labelledBurstC !== null && v.labelledContinuousC !== null && v.labelledBurstC < v.labelledContinuousC) {
      ctx.addIssue({ code: "custom", path: ["labelledBurstC"], message: "Burst C cannot be below the continuous C." });
    }
  });
export type PackStep = z.output<typeof packStepSchema>;

// ---------- Step 2: the method card ----------
const methodCardSchema = z
  .object({
    benchProfileId: z
      .string()
      .trim()
      .refine((v) => v === "" || isRecordIdText(v), "Choose a bench profile.")
      .transform((v) => (v === "" ? null : Number(v))),
    ambientTemperatureC: requiredNumber("Ambient temperature", "°C", (n) =>
      n.min(-20, "Ambient temperature must be at least −20 °C.").max(60, "Ambient temperature must be at most 60 °C."),
    ),
    packStartTemperatureC: optionalNumber("Pack start temperature", (n) =>
      n
        .min(-20, "Pack start temperature must be at least −20 °C.")
        .max(60, "Pack start temperature must be at most 60 °C."),
    ),
    loadMode: z.string({ error: "Choose the load mode." }).pipe(z.enum(loadModes, { error: "Choose the load mode." })),
    loadCurrentA: requiredNumber("Load current", "A", (n) =>
      n.gt(0, "Load current must be above 0 A.").max(2000, "Load current must be at most 2000 A."),
    ),
    cutoffVPerCell: requiredNumber("Cut-off voltage", "V per cell", (n) =>
      n.min(2.5, "Cut-off must be at least 2.5 V per cell.").max(4.2, "Cut-off must be at most 4.2 V per cell."),
    ),
    stopTemperatureC: requiredNumber("Stop temperature", "°C", (n) =>
      n.max(80, "Stop temperature must be at most 80 °C."),
    ),
    resistanceMethod: z
      .string({ error: "Choose how you measured resistance." })
      .pipe(z.enum(resistanceMethods, { error: "Choose how you measured resistance." })),
    equipment: requiredText("Equipment", 300),
    sampleRateHz: optionalNumber("Sample rate", (n) =>
      n.gt(0, "Sample rate must be above 0 Hz.").max(10_000, "Sample rate must be at most 10 000 Hz."),
    ),
    cyclesBeforeTest: requiredNumber("Cycles before the test", "", (n) =>
      n
        .int("Cycles must be a whole number.")
        .min(0, "Cycles cannot be negative.")
        .max(10_000, "Cycles must be at most 10 000."),
    ),
    testedOn: optionalPastDate("Test date"),
    notes: optionalText("Notes", 2000),
  })
  .superRefine((v, ctx) => {
    if (v.stopTemperatureC <= v.ambientTemperatureC) {
      ctx.addIssue({
        code: "custom",
        path: ["stopTemperatureC"],
        message: "Stop temperature must be above the ambient temperature.",
      });
    }
  });
export type MethodCardValues = z.input<typeof methodCardSchema>;
export type MethodCard = z.output<typeof methodCardSchema>;

// ---------- Step 3 and 4: files, declaration ----------
const LOG_KEY = /^incoming\/[^/]{1,64}\/[0-9a-f-]{36}\.csv$/;
const PHOTO_KEY = new RegExp(`^incoming/[^/]{1,64}/photo-[0-9a-f-]{36}\\.(${PHOTO_EXTENSIONS.join("|")})$`);
export const MAX_PHOTOS = 4;

/**
 * The column mapping the log was read with, as JSON text ("" or absent: the columns were detected). The server
 * re-analyses the stored log with it, so the figures it keeps are the ones the tester saw.
 */
const logMappingSchema = z
  .string()
  .trim()
  .max(MAPPING_JSON_MAX, `The column mapping can be at most ${MAPPING_JSON_MAX} characters.`)
  .optional()
  .transform((text, ctx) => {
    if (!text) return null;
    const parsed = parseMappingJson(text);
    if (parsed.ok) return parsed.mapping;
    ctx.addIssue({ code: "custom", message: parsed.message });
    return z.NEVER;
  });

const logRefSchema = z.object({
  key: z.string().regex(LOG_KEY, "Upload the log first."),
  filename: z.string().trim().min(1, "Upload the log first.").max(200, "The file name can be at most 200 characters."),
  mapping: logMappingSchema,
});
const photoKeysSchema = z
  .array(z.string().regex(PHOTO_KEY, "That photo upload is not valid; add it again."))
  .max(MAX_PHOTOS, `Attach at most ${MAX_PHOTOS} photos.`);
const declarationSchema = z
  .boolean({ error: "Confirm that these are honest measurements." })
  .refine((v) => v, "Confirm that these are honest measurements.");

export const submitResultSchema = z.object({
  idempotencyKey: z.uuid("Reload the page and try again."),
  pack: packStepSchema,
  method: methodCardSchema,
  log: logRefSchema,
  photoKeys: photoKeysSchema,
  declaration: declarationSchema,
});
export type SubmitResultValues = z.input<typeof submitResultSchema>;
export type SubmitResultInput = z.output<typeof submitResultSchema>;

const resultIdSchema = recordIdSchema("Not a result id.");
export const withdrawResultSchema = z.object({ resultId: resultIdSchema, note: optionalText("Note", 500).optional() });

export const resubmitResultSchema = z.object({
  resultId: resultIdSchema,
  method: methodCardSchema,
  /** A new log, or null to keep the stored one. */
  log: logRefSchema.nullable(),
  photoKeys: photoKeysSchema,
  note: requiredText("Answer to the moderator", 2000),
  declaration: declarationSchema,
});
export type ResubmitResultInput = z.output<typeof resubmitResultSchema>;

/** Re-check of a stored log with the current pack and method card (the preview after a reload or an edit). */
export const previewStoredLogSchema = z.object({ log: logRefSchema, pack: packStepSchema, method: methodCardSchema });

/** The files a draft in the browser still points at, to keep them from the storage sweep. */
export const keepDraftFilesSchema = z.object({ logKey: logRefSchema.shape.key.nullable(), photoKeys: photoKeysSchema });
export type KeepDraftFilesInput = z.output<typeof keepDraftFilesSchema>;
