// Building blocks for submission tests: an invented pack, a log uploaded through the real route handler,
// and form values as the submit form sends them.
import { randomUUID } from "node:crypto";
import { POST as uploadLogRoute } from "@/app/api/v1/uploads/log/route";
import { POST as uploadPhotoRoute } from "@/app/api/v1/uploads/photo/route";
import { db } from "@/db";
import { makers, packs } from "@/db/schema";
import type { ColumnMapping } from "@/lib/analysis";
import type { SubmitResultValues } from "@/lib/validations/result";
import { postRequest, sampleLog } from "./logs";
import { PNG_BYTES } from "./storage";

export async function makePack(
  over: Partial<typeof packs.$inferInsert> = {},
): Promise<{ packId: number; makerId: number }> {
  const tag = randomUUID().slice(0, 8);
  const [maker] = await db
    .insert(makers)
    .values({ slug: `testmaker-${tag}`, name: `Testmaker ${tag}` })
    .returning({ id: makers.id });
  if (!maker) throw new Error("no maker");
  const [pack] = await db
    .insert(packs)
    .values({
      slug: `testmaker-${tag}-pack`,
      makerId: maker.id,
      model: `Volt ${tag} 1300 4S 75C`,
      cellsInSeries: 4,
      ratedCapacityMah: 1300,
      labelledContinuousC: 75,
      weightG: 160,
      connector: "XT60",
      ...over,
    })
    .returning({ id: packs.id });
  if (!pack) throw new Error("no pack");
  return { packId: pack.id, makerId: maker.id };
}

export async function uploadLog(
  token: string,
  csv = sampleLog().csv,
  filename = "bench.csv",
  mapping?: ColumnMapping,
): Promise<{ key: string; filename: string; sha256: string }> {
  const map = mapping ? `&mapping=${encodeURIComponent(JSON.stringify(mapping))}` : "";
  const res = await uploadLogRoute(
    postRequest(`/api/v1/uploads/log?filename=${encodeURIComponent(filename)}${map}`, csv, {
      "content-type": "text/csv",
      cookie: `authjs.session-token=${token}`,
    }),
    undefined,
  );
  if (res.status !== 201) throw new Error(`upload failed: ${res.status} ${await res.text()}`);
  return (await res.json()).log;
}

export async function uploadPhoto(token: string): Promise<string> {
  const res = await uploadPhotoRoute(
    postRequest("/api/v1/uploads/photo", PNG_BYTES, {
      "content-type": "image/png",
      cookie: `authjs.session-token=${token}`,
    }),
    undefined,
  );
  if (res.status !== 201) throw new Error(`photo upload failed: ${res.status}`);
  return (await res.json()).key;
}

export const validMethod: SubmitResultValues["method"] = {
  benchProfileId: "",
  ambientTemperatureC: "22",
  packStartTemperatureC: "22,5",
  loadMode: "constant-current",
  loadCurrentA: "13",
  cutoffVPerCell: "3.3",
  stopTemperatureC: "60",
  resistanceMethod: "dc-step",
  equipment: "Electronic load 600 W, logger at 1 Hz, thermocouple on the pack face",
  sampleRateHz: "1",
  cyclesBeforeTest: "2",
  testedOn: "",
  notes: "",
};

export const noProposal = {
  makerId: "",
  makerName: "",
  model: "",
  cellsInSeries: "",
  ratedCapacityMah: "",
  labelledContinuousC: "",
  labelledBurstC: "",
  weightG: "",
  connector: "",
};

export function submission(
  packId: number,
  log: { key: string; filename: string },
  over: Partial<SubmitResultValues> = {},
): SubmitResultValues {
  return {
    idempotencyKey: randomUUID(),
    pack: { mode: "existing", packId: String(packId), ...noProposal },
    method: validMethod,
    log: { key: log.key, filename: log.filename },
    photoKeys: [],
    declaration: true,
    ...over,
  };
}
