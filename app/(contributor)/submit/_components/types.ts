// What the submit page hands its client components (plain data, no Date objects).
import type { PackChoice } from "@/db/queries/submissions";
import type { ColumnMapping } from "@/lib/analysis";
import type { LoadMode, ResistanceMethod } from "@/lib/enums";

export type PackOption = PackChoice;
export type MakerOption = { id: number; name: string };
export type BenchProfileOption = {
  id: number;
  name: string;
  equipment: string;
  resistanceMethod: ResistanceMethod;
  defaultAmbientC: number | null;
  defaultLoadMode: LoadMode | null;
  defaultCutoffVPerCell: number | null;
  defaultStopTemperatureC: number | null;
  defaultSampleRateHz: number | null;
  /** The column mapping this bench's logs need; null: detect the columns. */
  logMapping: ColumnMapping | null;
};
/** The pack's label figures the analysis needs, whether chosen or proposed. */
export type PackFactsClient = {
  cells: number;
  ratedMah: number;
  labelledC: number;
  weightG: number | null;
  title: string;
};
export type Limits = { logMaxMb: number; photoMaxMb: number };

/** The form's API as the steps receive it (the submit and the resubmit forms hold the same values). */
export type SubmitFormApi = import("react-hook-form").UseFormReturn<
  import("@/lib/validations/result").SubmitResultValues,
  unknown,
  unknown
>;
