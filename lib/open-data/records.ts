// The rows the data layer (db/queries/open-data/) hands over, and the published records made from them through
// the field lists (fields.ts, result-fields.ts): active makers and packs, published results with their method
// card and figures — never files or contributor identities.
import type { Figures } from "@/lib/analysis";
import type { PackSummary } from "@/lib/catalogue";
import type { FigureU95 } from "@/lib/figure-u95";
import type { LoadMode, ResistanceMethod } from "@/lib/enums";
import { fieldValue, type Field, type FieldValue } from "./field-kit";

export type MakerRow = { id: number; slug: string; name: string; packCount: number; resultCount: number };

/** A pack as published: the catalogue's summary, its maker's id and how many published results it has. */
export type PackRecordRow = PackSummary & { resultCount: number };

type MethodCard = {
  ambientTemperatureC: number;
  packStartTemperatureC: number | null;
  loadMode: LoadMode;
  loadCurrentA: number;
  loadRateC: number;
  cutoffVPerCell: number;
  stopTemperatureC: number;
  resistanceMethod: ResistanceMethod;
  equipment: string;
  sampleRateHz: number | null;
  cyclesBeforeTest: number;
};

export type ResultFlatRow = {
  id: number;
  packId: number;
  packSlug: string;
  makerSlug: string;
  groupKey: string;
  testedOn: string | null;
  publishedAt: string | null;
  notes: string | null;
  methodCard: MethodCard;
  figures: Figures;
  /** Each figure's expanded uncertainty (lib/figure-u95.ts), computed on read. */
  u95: FigureU95;
};

export type FlatRecord = Record<string, FieldValue>;

/** A flat record: every field by name, rounded (makers, packs, and a result's CSV row). */
export function flatRecord<R>(fields: Field<R>[], row: R): FlatRecord {
  return Object.fromEntries(fields.map((f) => [f.name, fieldValue(f, row)]));
}

export type NestedRecord = { [name: string]: FieldValue | FlatRecord; methodCard: FlatRecord; figures: FlatRecord };

/** A result as the API publishes it: top-level fields, then `methodCard` and `figures` by the fields' section. */
export function nestedRecord<R>(fields: Field<R>[], row: R): NestedRecord {
  const top: FlatRecord = {};
  const methodCard: FlatRecord = {};
  const figures: FlatRecord = {};
  for (const f of fields) {
    const into = f.section === "methodCard" ? methodCard : f.section === "figures" ? figures : top;
    into[f.name] = fieldValue(f, row);
  }
  return { ...top, methodCard, figures };
}
