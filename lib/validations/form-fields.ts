// Field helpers for schemas shared by forms and server actions. HTML inputs give strings, so optional
// numbers, dates and checkboxes arrive as strings ("" meaning empty) both in the browser and in FormData.
import { z } from "zod";

/** An optional free-text field: trimmed, "" → null. */
export const optionalText = (label: string, max: number) =>
  z
    .string()
    .trim()
    .max(max, `${label} can be at most ${max} characters.`)
    .transform((v) => (v === "" ? null : v));

/** A required free-text field, trimmed. */
export const requiredText = (label: string, max: number) =>
  z
    .string({ error: `Enter the ${label.toLowerCase()}.` })
    .trim()
    .min(1, `Enter the ${label.toLowerCase()}.`)
    .max(max, `${label} can be at most ${max} characters.`);

/** An optional number typed into a text/number input: "" → null; otherwise a finite number in range. */
export const optionalNumber = (label: string, check: (n: z.ZodNumber) => z.ZodNumber) =>
  z
    .string()
    .trim()
    .transform((v, ctx) => {
      if (v === "") return null;
      const n = Number(v.replace(",", "."));
      if (!Number.isFinite(n)) {
        ctx.addIssue({ code: "custom", message: `${label} must be a number.` });
        return z.NEVER;
      }
      return n;
    })
    .pipe(check(z.number()).nullable());

/** An optional calendar date (YYYY-MM-DD) that is not in the future. */
export const optionalPastDate = (label: string) =>
  z
    .string()
    .trim()
    .refine(
      (v) => v === "" || (/^\d{4}-\d{2}-\d{2}$/.test(v) && !Number.isNaN(Date.parse(`${v}T00:00:00Z`))),
      `${label} must be a date.`,
    )
    .refine(
      (v) => v === "" || Date.parse(`${v}T00:00:00Z`) <= Date.now() + 24 * 3600 * 1000,
      `${label} cannot be in the future.`,
    )
    .refine((v) => v === "" || v >= "1990-01-01", `${label} looks too old.`)
    .transform((v) => (v === "" ? null : v));

/** A checkbox: "on"/"true"/true → true; missing, "false" or false → false. */
export const checkbox = z
  .union([z.boolean(), z.enum(["on", "true", "false"])])
  .optional()
  .transform((v) => v === true || v === "on" || v === "true");

/** A select whose empty option means "not set". */
export const optionalEnum = <T extends readonly [string, ...string[]]>(values: T, message: string) =>
  z.union([z.literal(""), z.enum(values, { error: message })]).transform((v) => (v === "" ? null : v));
