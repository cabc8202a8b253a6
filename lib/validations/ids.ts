// Row ids as they arrive in paths, forms and JSON: a positive whole number that fits PostgreSQL's integer
// (32-bit, at most 2³¹ − 1). Written digits only — no sign, exponent, hex, spaces or decimals — so "1e3",
// " 7" or "0x10" are refused instead of quietly meaning another row, and 2147483648 never reaches SQL.
import { z } from "zod";

export const MAX_RECORD_ID = 2_147_483_647;

/** A positive 32-bit id from a string (path, search param, form field) or a JSON number. */
export function recordIdSchema(message = "Not a valid id.") {
  return z.union(
    [
      z.number({ error: message }).int(message).min(1, message).max(MAX_RECORD_ID, message),
      z
        .string({ error: message })
        .regex(/^[1-9][0-9]{0,9}$/, message)
        .transform(Number)
        .pipe(z.number().max(MAX_RECORD_ID, message)),
    ],
    { error: message },
  );
}

export const recordId = recordIdSchema();

/** Whether a form field's text is such an id (for fields that are validated together with others). */
export function isRecordIdText(v: string): boolean {
  return /^[1-9][0-9]{0,9}$/.test(v) && Number(v) <= MAX_RECORD_ID;
}
