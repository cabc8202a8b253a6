// A bench profile: a contributor's equipment and the method-card defaults they usually test with. One
// schema for the form (react-hook-form + zodResolver) and the server action. Ranges match the method card
// (and the results table's checks): ambient −20…60 °C, cut-off 2.5…4.2 V per cell, stop ≤ 80 °C.
import { z } from "zod";
import { MAPPING_JSON_MAX, parseMappingJson } from "@/lib/analysis";
import { recordIdSchema } from "./ids";
import { loadModes, resistanceMethods } from "@/lib/enums";
import { optionalEnum, optionalNumber, optionalPastDate, optionalText, requiredText } from "./form-fields";

/** The column mapping this bench's logs need, as JSON text ("" → none: the columns are detected). */
const logMappingField = z
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

/** "± p % of reading": 0…10 % (the same bounds as lib/analysis/uncertainty/accuracy.ts). */
/** Absent (an older form, a script) counts as blank, so an update never keeps a value the sender did not send. */
const blankable = (label: string, check: (n: z.ZodNumber) => z.ZodNumber) =>
  z
    .string()
    .optional()
    .transform((v) => v ?? "")
    .pipe(optionalNumber(label, check));
const pct = (label: string) =>
  blankable(label, (n) =>
    n.min(0, `${label} cannot be negative.`).max(10, `${label} must be at most 10 % of reading.`),
  );
const upTo = (label: string, unit: string, max: number) =>
  blankable(label, (n) =>
    n.min(0, `${label} cannot be negative.`).max(max, `${label} must be at most ${max} ${unit}.`),
  );

/** Instrument accuracy, each part optional: what is left blank is assumed from a stated default (and named so). */
const accuracyFields = {
  voltageAccuracyPct: pct("Voltage accuracy"),
  voltageOffsetV: upTo("Voltage offset", "V", 1),
  voltageResolutionV: upTo("Voltage resolution", "V", 1),
  currentAccuracyPct: pct("Current accuracy"),
  currentOffsetA: upTo("Current offset", "A", 10),
  currentResolutionA: upTo("Current resolution", "A", 10),
  temperatureAccuracyPct: pct("Temperature accuracy"),
  temperatureOffsetC: upTo("Temperature offset", "°C", 20),
  temperatureResolutionC: upTo("Temperature resolution", "°C", 10),
  samplingIntervalS: blankable("Sampling interval", (n) =>
    n.gt(0, "Sampling interval must be above 0 s.").max(600, "Sampling interval must be at most 600 s."),
  ),
};

export const benchProfileSchema = z
  .object({
    name: requiredText("Profile name", 80),
    loadEquipment: requiredText("Load equipment", 120),
    logger: optionalText("Logger", 120),
    resistanceMeter: optionalText("Resistance meter", 120),
    resistanceMethod: z
      .string({ error: "Choose how you measure resistance." })
      .pipe(z.enum(resistanceMethods, { error: "Choose how you measure resistance." })),
    calibratedOn: optionalPastDate("Calibration date"),
    notes: optionalText("Notes", 2000),
    defaultAmbientC: optionalNumber("Ambient temperature", (n) =>
      n.min(-20, "Ambient temperature must be at least −20 °C.").max(60, "Ambient temperature must be at most 60 °C."),
    ),
    defaultLoadMode: optionalEnum(loadModes, "Choose a load mode."),
    defaultCutoffVPerCell: optionalNumber("Cut-off voltage", (n) =>
      n.min(2.5, "Cut-off must be at least 2.5 V per cell.").max(4.2, "Cut-off must be at most 4.2 V per cell."),
    ),
    defaultStopTemperatureC: optionalNumber("Stop temperature", (n) =>
      n.min(0, "Stop temperature must be at least 0 °C.").max(80, "Stop temperature must be at most 80 °C."),
    ),
    defaultSampleRateHz: optionalNumber("Sample rate", (n) =>
      n.gt(0, "Sample rate must be above 0 Hz.").max(10_000, "Sample rate must be at most 10 000 Hz."),
    ),
    logMapping: logMappingField,
    ...accuracyFields,
  })
  .superRefine((v, ctx) => {
    if (
      v.defaultAmbientC !== null &&
      v.defaultStopTemperatureC !== null &&
      v.defaultStopTemperatureC <= v.defaultAmbientC
    ) {
      ctx.addIssue({
        code: "custom",
        path: ["defaultStopTemperatureC"],
        message: "Stop temperature must be above the ambient temperature.",
      });
    }
  });

/** What the form holds (all strings, as inputs give them). */
export type BenchProfileFormValues = z.input<typeof benchProfileSchema>;
/** What the database layer receives. */
export type BenchProfileInput = z.output<typeof benchProfileSchema>;

export const emptyBenchProfile: BenchProfileFormValues = {
  name: "",
  loadEquipment: "",
  logger: "",
  resistanceMeter: "",
  resistanceMethod: "",
  calibratedOn: "",
  notes: "",
  defaultAmbientC: "",
  defaultLoadMode: "",
  defaultCutoffVPerCell: "",
  defaultStopTemperatureC: "",
  defaultSampleRateHz: "",
  logMapping: "",
  voltageAccuracyPct: "",
  voltageOffsetV: "",
  voltageResolutionV: "",
  currentAccuracyPct: "",
  currentOffsetA: "",
  currentResolutionA: "",
  temperatureAccuracyPct: "",
  temperatureOffsetC: "",
  temperatureResolutionC: "",
  samplingIntervalS: "",
};

export const benchProfileId = recordIdSchema("Not a bench profile id.");

/** The save action's input: a profile, plus the id when editing one. */
export const saveBenchProfileSchema = benchProfileSchema.and(
  z.object({
    id: z
      .union([z.literal(""), benchProfileId])
      .optional()
      .transform((v) => (v === "" || v === undefined ? null : v)),
  }),
);
export const deleteBenchProfileSchema = z.object({ id: benchProfileId });
