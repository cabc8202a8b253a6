// Blank form values (prefilled from the first bench profile), and a lenient reading of a stored draft:
// anything missing or of the wrong type falls back to the blank value instead of breaking the form.
import { z } from "zod";
import type { SubmitResultValues } from "@/lib/validations/result";
import { methodFromProfile } from "./method-step";
import type { BenchProfileOption } from "./types";

export function blankValues(profiles: BenchProfileOption[]): SubmitResultValues {
  const first = profiles[0];
  return {
    idempotencyKey: crypto.randomUUID(),
    pack: {
      mode: "existing",
      packId: "",
      makerId: "",
      makerName: "",
      model: "",
      cellsInSeries: "",
      ratedCapacityMah: "",
      labelledContinuousC: "",
      labelledBurstC: "",
      weightG: "",
      connector: "",
    },
    method: {
      benchProfileId: "",
      ambientTemperatureC: "",
      packStartTemperatureC: "",
      loadMode: "constant-current",
      loadCurrentA: "",
      cutoffVPerCell: "",
      stopTemperatureC: "",
      resistanceMethod: "",
      equipment: "",
      sampleRateHz: "",
      cyclesBeforeTest: "0",
      testedOn: "",
      notes: "",
      ...(first ? methodFromProfile(first) : {}),
    },
    log: { key: "", filename: "", mapping: "" },
    photoKeys: [],
    declaration: false,
  };
}

function strings<K extends string>(blank: Record<K, string>) {
  const shape: Partial<Record<K, z.ZodCatch<z.ZodString>>> = {};
  for (const k in blank) shape[k] = z.string().max(5000).catch(blank[k]);
  return z.object(shape as Record<K, z.ZodCatch<z.ZodString>>);
}

/** The stored draft's values over the blank ones. */
export function valuesFromDraft(blank: SubmitResultValues, raw: Record<string, unknown>): SubmitResultValues {
  const { mode: _mode, ...packStrings } = blank.pack;
  const blankLog = { key: blank.log.key, filename: blank.log.filename, mapping: blank.log.mapping ?? "" };
  const schema = z.object({
    idempotencyKey: z.uuid().catch(blank.idempotencyKey),
    pack: strings(packStrings)
      .extend({ mode: z.enum(["existing", "new"]).catch(blank.pack.mode) })
      .catch(blank.pack),
    method: strings(blank.method).catch(blank.method),
    log: strings(blankLog).catch(blankLog),
    photoKeys: z.array(z.string().max(300)).max(10).catch(blank.photoKeys),
    declaration: z.boolean().catch(false),
  });
  return schema.parse(raw);
}
