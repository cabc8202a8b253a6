// zod schemas of the published records, generated from the field lists (lib/open-data/fields.ts,
// result-fields.ts): the same names, types, constraints and descriptions as the CSV and the Data Package.
import { z } from "zod";
import { describeField, type Field } from "@/lib/open-data/field-kit";
import { makerFields, packFields } from "@/lib/open-data/fields";
import { resultFields } from "@/lib/open-data/result-fields";

function baseSchema<R>(f: Field<R>): z.ZodType {
  const c = f.constraints ?? {};
  if (f.type === "integer" || f.type === "number") {
    let n = f.type === "integer" ? z.number().int() : z.number();
    if (c.minimum !== undefined) n = n.min(c.minimum);
    if (c.maximum !== undefined) n = n.max(c.maximum);
    return n;
  }
  if (f.type === "date") return z.iso.date();
  if (f.type === "datetime") return z.iso.datetime({ offset: true });
  const [first, ...rest] = c.enum ?? [];
  if (first !== undefined) return z.enum([first, ...rest]);
  return c.pattern ? z.string().regex(new RegExp(c.pattern)) : z.string();
}

function fieldSchema<R>(f: Field<R>): z.ZodType {
  const s = baseSchema(f);
  return (f.constraints?.required ? s : s.nullable()).describe(describeField(f));
}

function objectOf<R>(fields: Field<R>[]) {
  return z.object(Object.fromEntries(fields.map((f) => [f.name, fieldSchema(f)])));
}

export const makerRecord = objectOf(makerFields).describe("A maker (makers.csv has the same fields).");
export const packRecord = objectOf(packFields).describe("A pack as labelled (packs.csv has the same fields).");

/** A result: top-level fields, then the method card and the figures, each as the field list's section says. */
export const resultRecord = objectOf(resultFields.filter((f) => !f.section))
  .extend({
    methodCard: objectOf(resultFields.filter((f) => f.section === "methodCard")).describe(
      "The method card: how the test was run.",
    ),
    figures: objectOf(resultFields.filter((f) => f.section === "figures")).describe(
      "Figures computed from the log (lib/analysis); units in the names.",
    ),
  })
  .describe("A published result (results.csv has the same fields, flat).");
