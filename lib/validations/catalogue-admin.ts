// Inputs of the admin catalogue actions: a pack's label figures, and merges of duplicate makers or packs.
import { z } from "zod";
import { recordId } from "./ids";

const id = recordId;
const optionalNumber = (schema: z.ZodNumber) =>
  z.preprocess(
    (v) => (v === "" || v === null || v === undefined ? null : typeof v === "string" ? v.replace(",", ".") : v),
    z.union([z.null(), z.coerce.number().pipe(schema)]),
  );

export const packLabelSchema = z
  .object({
    packId: id,
    cellsInSeries: z.coerce.number().int("Whole cells only.").min(1, "1 to 14 cells.").max(14, "1 to 14 cells."),
    ratedCapacityMah: z.coerce
      .number()
      .int("Whole mAh.")
      .min(50, "At least 50 mAh.")
      .max(100_000, "At most 100 000 mAh."),
    labelledContinuousC: z.preprocess(
      (v) => (typeof v === "string" ? v.replace(",", ".") : v),
      z.coerce.number().gt(0, "Above 0.").max(500, "At most 500C."),
    ),
    labelledBurstC: optionalNumber(z.number().gt(0, "Above 0.").max(1000, "At most 1000C.")),
    weightG: optionalNumber(z.number().gt(0, "Above 0 g.").max(50_000, "At most 50 kg.")),
    connector: z.string().trim().min(1, "Name the connector.").max(40, "At most 40 characters."),
    note: z
      .string()
      .trim()
      .max(500)
      .optional()
      .transform((v) => (v ? v : null)),
  })
  .refine((v) => v.labelledBurstC === null || v.labelledBurstC >= v.labelledContinuousC, {
    path: ["labelledBurstC"],
    message: "Burst C cannot be below continuous C.",
  });
export type PackLabelInput = z.infer<typeof packLabelSchema>;

export const mergeSchema = z
  .object({ sourceId: id, targetId: id })
  .refine((v) => v.sourceId !== v.targetId, { path: ["targetId"], message: "Choose two different entries." });
