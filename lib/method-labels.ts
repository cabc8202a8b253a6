// Human labels for the method enums, shared by forms, method cards and downloads' documentation.
import type { LoadMode, ResistanceMethod } from "@/lib/enums";

export const resistanceMethodLabels: Record<ResistanceMethod, string> = {
  "iec-61960-two-level": "IEC 61960-3 two-level DC (≈0.2 It for 10 s, then ≈1 It for 1 s)",
  "dc-step": "DC step (rest → load, read at 1 s)",
  "ac-1khz": "AC meter at 1 kHz",
  "charger-readout": "Charger read-out",
};

export const loadModeLabels: Record<LoadMode, string> = {
  "constant-current": "Constant current",
  "constant-power": "Constant power",
  "constant-resistance": "Constant resistance",
};
