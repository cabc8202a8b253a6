// What a submission stores from its log (issue 12): the column mapping it was read with (re-used when a
// resubmission keeps the log), every discharge, both ratings in their own columns, and a like-for-like key
// whose resistance part is what the log showed, not what the method card says. Logs are invented (the
// equivalent-circuit generator); the ratings are checked against the stored figures the core computed.
import { eq } from "drizzle-orm";
import { beforeEach, describe, expect, it, vi } from "vitest";
import { db } from "@/db";
import { results } from "@/db/schema";
import { CYCLING_MAPPING, cyclingLog } from "../helpers/cycling-log";
import { sampleLog } from "../helpers/logs";
import { requestState } from "../helpers/next-mocks";
import { makePack, submission, uploadLog, validMethod } from "../helpers/submission";
import { signedIn } from "../helpers/users";

vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const { submitResult } = await import("@/app/(contributor)/submit/actions/submit-result");
const { resubmitResult } = await import("@/app/(contributor)/submit/[resultId]/actions/resubmit-result");

const rowOf = async (id: number) => (await db.select().from(results).where(eq(results.id, id)))[0];

async function submit(csv: string, method = validMethod, mapping?: typeof CYCLING_MAPPING) {
  const me = await signedIn("contributor");
  requestState.token = me.token;
  const { packId } = await makePack();
  const log = await uploadLog(me.token, csv, "log.csv", mapping);
  const res = await submitResult(
    null,
    submission(packId, log, {
      method,
      log: { key: log.key, filename: log.filename, mapping: mapping ? JSON.stringify(mapping) : "" },
    }),
  );
  return { me, packId, log, res };
}

describe("a submission with a column mapping", () => {
  beforeEach(() => {
    requestState.token = null;
  });

  it("re-analyses the stored header-less log with it on the server and keeps it with the result", async () => {
    const { res } = await submit(cyclingLog(4, 81).csv, validMethod, CYCLING_MAPPING);
    expect(res.ok).toBe(true);
    if (!res.ok) return;
    const row = await rowOf(res.data.resultId);
    expect(row?.logMapping).toEqual(CYCLING_MAPPING);
    expect(row?.figures.discharges).toHaveLength(4);
    expect(row?.figures.warningCodes).toContain("several-discharges");
    expect(row?.capacityMah).toBeCloseTo(row?.figures.discharges[0]?.capacityMah ?? Number.NaN, 3);
  });

  it("refuses a header-less log sent without its mapping, on the log field", async () => {
    const me = await signedIn("contributor");
    requestState.token = me.token;
    const { packId } = await makePack();
    const log = await uploadLog(me.token, cyclingLog(2, 82).csv, "log.csv", CYCLING_MAPPING);
    const res = await submitResult(null, submission(packId, log)); // the mapping left out
    expect(res).toMatchObject({ ok: false, code: "validation" });
    if (res.ok) return;
    expect(res.fieldErrors?.log?.[0]).toMatch(/column mapping/);
  });

  it("refuses mapping text that is not JSON, on log.mapping", async () => {
    const me = await signedIn("contributor");
    requestState.token = me.token;
    const { packId } = await makePack();
    const log = await uploadLog(me.token, sampleLog({ seed: 83 }).csv);
    const res = await submitResult(null, submission(packId, log, { log: { ...log, mapping: "{time:0" } }));
    expect(res).toMatchObject({ ok: false, code: "validation" });
    if (res.ok) return;
    expect(res.fieldErrors?.["log.mapping"]?.[0]).toMatch(/not valid JSON/);
  });

  it("keeps using the stored mapping when a resubmission keeps the stored log", async () => {
    const { me, res } = await submit(cyclingLog(3, 84).csv, validMethod, CYCLING_MAPPING);
    if (!res.ok) throw new Error(res.error);
    await db.update(results).set({ status: "awaiting_answer" }).where(eq(results.id, res.data.resultId));
    requestState.token = me.token;
    const again = await resubmitResult(null, {
      resultId: String(res.data.resultId),
      method: { ...validMethod, notes: "Cut-off confirmed." },
      log: null,
      photoKeys: [],
      note: "Cut-off confirmed.",
      declaration: true,
    });
    expect(again).toMatchObject({ ok: true });
    const row = await rowOf(res.data.resultId);
    expect(row?.logMapping).toEqual(CYCLING_MAPPING);
    expect(row?.figures.discharges).toHaveLength(3);
    expect(row?.status).toBe("pending");
  });
});

describe("the like-for-like key from what the log shows", () => {
  it("groups a card saying 'charger read-out' whose log gave a step reading with the DC-step results", async () => {
    const { res } = await submit(sampleLog({ seed: 85 }).csv, { ...validMethod, resistanceMethod: "charger-readout" });
    if (!res.ok) throw new Error(res.error);
    const row = await rowOf(res.data.resultId);
    expect(row?.figures.dcResistanceMethod).toBe("step");
    expect(row?.resistanceMethod).toBe("charger-readout"); // the card stays as typed
    expect(row?.groupKey).toMatch(/^dc-step_a15-25_co3\.3_r5-10_new$/);
  });

  it("keys a log holding the IEC 61960-3 two-level sequence as such, whatever the card says", async () => {
    const { res } = await submit(sampleLog({ seed: 86, iecPrelude: true }).csv, validMethod);
    if (!res.ok) throw new Error(res.error);
    const row = await rowOf(res.data.resultId);
    expect(row?.figures.dcResistanceMethod).toBe("iec-61960-two-level");
    expect(row?.groupKey.startsWith("iec-61960-two-level_")).toBe(true);
  });

  it("keys a log without a rest before the load as having no DC resistance", async () => {
    // The log starts 5 s into the discharge: no rest → load step to read a resistance from.
    const [header, ...lines] = sampleLog({ seed: 87 }).csv.split("\n");
    const { res } = await submit([header, ...lines.slice(10)].join("\n"), {
      ...validMethod,
      resistanceMethod: "iec-61960-two-level",
    });
    if (!res.ok) throw new Error(res.error);
    const row = await rowOf(res.data.resultId);
    expect(row?.figures.dcResistanceMethod).toBeNull();
    expect(row?.groupKey.startsWith("dc-none_")).toBe(true);
  });
});

describe("the two ratings in their own columns", () => {
  it("stores the sag-limited C estimate and the measured sustained C with the label ratio of each", async () => {
    const { res } = await submit(sampleLog({ seed: 88 }).csv);
    if (!res.ok) throw new Error(res.error);
    const row = await rowOf(res.data.resultId);
    if (!row) throw new Error("no row");
    const f = row.figures;
    // The 4S 1300 mAh 75C test pack drew 13 A: 10C measured, as the generator's load (the truth of the run).
    expect(f.sustainedCMeasured).toBeCloseTo(10, 1);
    expect(row.sustainedCMeasured).toBeCloseTo(f.sustainedCMeasured ?? Number.NaN, 4);
    expect(row.sustainedLabelRatio).toBeCloseTo((f.sustainedCMeasured ?? Number.NaN) / 75, 4);
    expect(row.sagLimitedC).toBeCloseTo(f.sagLimitedCEstimate ?? Number.NaN, 4);
    expect(row.labelRatio).toBeCloseTo((f.sagLimitedCEstimate ?? Number.NaN) / 75, 4);
    expect(f.sagLimitedCAssumptions).toMatchObject({ nominalVPerCell: 3.7, floorVPerCell: 3.3 });
  });

  it("leaves the measured column empty when the run does not qualify, with the reason in the figures", async () => {
    // Stopped at 3.7 V per cell: the cut-off (3.3 V) was never reached.
    const { res } = await submit(sampleLog({ seed: 89, cutoffVPerCell: 3.7 }).csv);
    if (!res.ok) throw new Error(res.error);
    const row = await rowOf(res.data.resultId);
    expect(row?.sustainedCMeasured).toBeNull();
    expect(row?.sustainedLabelRatio).toBeNull();
    expect(row?.figures.sustainedCReason).toBe("cutoff-not-reached");
  });
});
