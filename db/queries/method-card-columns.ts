// The method card's columns (the conditions a result was measured under), selected the same way wherever a
// result is read with its method: the public result lists and a contributor's own results.
import { results } from "@/db/schema";

export const methodCardColumns = {
  ambientTemperatureC: results.ambientTemperatureC,
  packStartTemperatureC: results.packStartTemperatureC,
  loadMode: results.loadMode,
  loadCurrentA: results.loadCurrentA,
  loadRateC: results.loadRateC,
  cutoffVPerCell: results.cutoffVPerCell,
  stopTemperatureC: results.stopTemperatureC,
  resistanceMethod: results.resistanceMethod,
  equipment: results.equipment,
  sampleRateHz: results.sampleRateHz,
  cyclesBeforeTest: results.cyclesBeforeTest,
  testedOn: results.testedOn,
};
