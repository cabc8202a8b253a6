// The published records of the open data (API, downloads, Data Package): active makers and packs, and
// approved results with their method card and figures — never files or contributor identities. The data
// layer (db/queries/open-data/) fills them; lib/open-data/fields.ts lists their published fields.
import type { Figures } from "@/lib/analysis";
import type { PackSummary } from "@/lib/catalogue";
import type { LoadMode, ResistanceMethod } from "@/lib/enums";

export type MakerRow = { id: number; slug: string; name: string; packCount: number };

/** A pack as published: the catalogue's summary, its maker's id and how many approved results it has. */
export type PackRecord = PackSummary & { makerId: number; approvedResultCount: number };

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

export type ResultRow = {
  id: number;
  packId: number;
  packSlug: string;
  makerSlug: string;
  status: "approved";
  groupKey: string;
  testedOn: string | null;
  publishedAt: string | null;
  notes: string | null;
  methodCard: MethodCard;
  figures: Figures;
};
