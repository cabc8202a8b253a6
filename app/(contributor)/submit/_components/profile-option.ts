// A bench profile as the form needs it (plain data: no dates cross to the client).
import type { BenchProfile } from "@/db/queries/bench-profiles";
import type { BenchProfileOption } from "./types";

export function profileOption(p: BenchProfile): BenchProfileOption {
  return {
    id: p.id,
    name: p.name,
    equipment: [p.loadEquipment, p.logger, p.resistanceMeter].filter(Boolean).join(", "),
    resistanceMethod: p.resistanceMethod,
    defaultAmbientC: p.defaultAmbientC,
    defaultLoadMode: p.defaultLoadMode,
    defaultCutoffVPerCell: p.defaultCutoffVPerCell,
    defaultStopTemperatureC: p.defaultStopTemperatureC,
    defaultSampleRateHz: p.defaultSampleRateHz,
    logMapping: p.logMapping,
  };
}
