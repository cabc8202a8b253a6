"use server";
import { authedAction } from "@/server/authed-action";
import { analyseForCard, checkFiles, resolvePack } from "@/server/submissions/prepare";
import { previewOf } from "@/server/uploads/analyse";
import { previewStoredLogSchema } from "@/lib/validations/result";

/** The figures of an uploaded (not yet submitted) log with the current pack and method card. */
export const previewStoredLog = authedAction("upload.create", previewStoredLogSchema, async (input, user) => {
  const { facts } = await resolvePack(input.pack, user.id);
  await checkFiles(input.log.key, [], user.id);
  const { analysis } = await analyseForCard(input.log.key, facts, input.method, input.log.mapping);
  const m = input.method;
  return previewOf(analysis, {
    packCells: facts.cells,
    cutoffVPerCell: m.cutoffVPerCell,
    loadCurrentA: m.loadCurrentA,
    loadMode: m.loadMode,
    stopTemperatureC: m.stopTemperatureC,
  });
});
