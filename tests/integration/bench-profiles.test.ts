// Bench profiles: create, update, delete through the server actions, with ownership enforced in the
// mutations' WHERE clauses (someone else's profile answers exactly like a missing one: 404, no existence oracle).
import { beforeEach, describe, expect, it, vi } from "vitest";
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { benchProfiles } from "@/db/schema";
import { deleteBenchProfile as deleteRow, updateBenchProfile } from "@/db/mutations/bench-profiles";
import { profileOption } from "@/app/(contributor)/submit/_components/profile-option";
import { listBenchProfilesForUser } from "@/db/queries/bench-profiles";
import { benchProfileSchema } from "@/lib/validations/bench-profile";
import { requestState } from "../helpers/next-mocks";
import { signedIn } from "../helpers/users";

vi.mock("next/headers", async () => (await import("../helpers/next-mocks")).nextHeaders);
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const { saveBenchProfile } = await import("@/app/(account)/account/bench-profiles/actions/save-bench-profile");
const { deleteBenchProfile } = await import("@/app/(account)/account/bench-profiles/actions/delete-bench-profile");

function form(values: Record<string, string>): FormData {
  const fd = new FormData();
  for (const [k, v] of Object.entries(values)) fd.set(k, v);
  return fd;
}

const valid = {
  name: "Winter garage bench",
  loadEquipment: "400 W electronic load",
  logger: "4-channel USB logger",
  resistanceMeter: "",
  resistanceMethod: "iec-61960-two-level",
  calibratedOn: "2025-11-03",
  notes: "",
  defaultAmbientC: "-5",
  defaultLoadMode: "constant-current",
  defaultCutoffVPerCell: "3,3",
  defaultStopTemperatureC: "60",
  defaultSampleRateHz: "10",
};

describe("bench profiles", () => {
  beforeEach(() => {
    requestState.token = null;
  });

  it("creates a profile from form data, storing numbers and nulls, owned by the signed-in user", async () => {
    const me = await signedIn("contributor");
    requestState.token = me.token;
    const res = await saveBenchProfile(null, form(valid));
    expect(res.ok).toBe(true);
    if (!res.ok) return;
    const [row] = await db.select().from(benchProfiles).where(eq(benchProfiles.id, res.data.id));
    expect(row).toMatchObject({
      userId: me.id,
      name: "Winter garage bench",
      resistanceMethod: "iec-61960-two-level",
      resistanceMeter: null,
      notes: null,
      calibratedOn: "2025-11-03",
      defaultAmbientC: -5,
      defaultCutoffVPerCell: 3.3, // a decimal comma is accepted
      defaultStopTemperatureC: 60,
      defaultSampleRateHz: 10,
    });
    expect(requestState.revalidated).toContain("/account/bench-profiles");
  });

  it("refuses out-of-range method-card defaults with one message per field", async () => {
    const me = await signedIn("contributor");
    requestState.token = me.token;
    const res = await saveBenchProfile(
      null,
      form({
        ...valid,
        resistanceMethod: "",
        defaultAmbientC: "75",
        defaultCutoffVPerCell: "2.4",
        defaultStopTemperatureC: "81",
        defaultSampleRateHz: "0",
        calibratedOn: "2999-01-01",
      }),
    );
    expect(res).toMatchObject({ ok: false, code: "validation" });
    if (res.ok) return;
    expect(Object.keys(res.fieldErrors ?? {}).sort()).toEqual(
      [
        "calibratedOn",
        "defaultAmbientC",
        "defaultCutoffVPerCell",
        "defaultSampleRateHz",
        "defaultStopTemperatureC",
        "resistanceMethod",
      ].sort(),
    );
    expect(res.fieldErrors?.defaultStopTemperatureC?.[0]).toMatch(/80 °C/);
    expect(await db.select().from(benchProfiles).where(eq(benchProfiles.userId, me.id))).toHaveLength(0);
  });

  it("requires the stop temperature to be above the ambient temperature", () => {
    const r = benchProfileSchema.safeParse({ ...valid, defaultAmbientC: "40", defaultStopTemperatureC: "35" });
    expect(r.success).toBe(false);
    expect(r.error?.issues[0]?.path).toEqual(["defaultStopTemperatureC"]);
  });

  it("updates only the owner's profile: another user's id answers exactly like a missing one (404)", async () => {
    const owner = await signedIn("contributor", "owner");
    const other = await signedIn("contributor", "other");
    requestState.token = owner.token;
    const created = await saveBenchProfile(null, form(valid));
    if (!created.ok) throw new Error(created.error);
    const id = created.data.id;

    const renamed = await saveBenchProfile(null, form({ ...valid, id: String(id), name: "Summer bench" }));
    expect(renamed).toMatchObject({ ok: true, data: { id } });

    requestState.token = other.token;
    const hijack = await saveBenchProfile(null, form({ ...valid, id: String(id), name: "Not mine" }));
    const missing = await saveBenchProfile(null, form({ ...valid, id: "99999999" }));
    expect(missing).toMatchObject({ ok: false, code: "not_found" });
    expect(hijack).toEqual(missing);

    const [row] = await db.select().from(benchProfiles).where(eq(benchProfiles.id, id));
    expect(row?.name).toBe("Summer bench");
    // The mutation itself enforces ownership, whoever calls it.
    await expect(updateBenchProfile(other.id, id, benchProfileSchema.parse(valid))).rejects.toMatchObject({
      code: "not_found",
    });
  });

  it("deletes only the owner's profile", async () => {
    const owner = await signedIn("contributor", "owner");
    const other = await signedIn("moderator", "other");
    requestState.token = owner.token;
    const created = await saveBenchProfile(null, form(valid));
    if (!created.ok) throw new Error(created.error);
    const id = created.data.id;

    requestState.token = other.token;
    const foreign = await deleteBenchProfile(null, { id });
    expect(foreign).toMatchObject({ ok: false, code: "not_found" });
    expect(foreign).toEqual(await deleteBenchProfile(null, { id: 2_000_000_000 }));
    await expect(deleteRow(other.id, id)).rejects.toMatchObject({ code: "not_found" });
    expect(await db.select().from(benchProfiles).where(eq(benchProfiles.id, id))).toHaveLength(1);

    requestState.token = owner.token;
    expect(await deleteBenchProfile(null, { id })).toMatchObject({ ok: true, data: { id } });
    expect(await db.select().from(benchProfiles).where(eq(benchProfiles.id, id))).toHaveLength(0);
    expect(await deleteBenchProfile(null, { id })).toMatchObject({ ok: false, code: "not_found" });
  });

  it("remembers the column mapping its logs need, edits and removes it, and refuses one that is not usable", async () => {
    const me = await signedIn("contributor");
    requestState.token = me.token;
    const mapping = { time: 0, current: 1, voltage: 2, temperature: 3, hasHeader: false };
    const created = await saveBenchProfile(null, form({ ...valid, logMapping: JSON.stringify(mapping) }));
    if (!created.ok) throw new Error(created.error);
    const id = created.data.id;
    const stored = async () => (await db.select().from(benchProfiles).where(eq(benchProfiles.id, id)))[0];
    expect((await stored())?.logMapping).toEqual(mapping);
    // The submit form receives it with the profile, so choosing the profile reads logs with it.
    const [option] = (await listBenchProfilesForUser(me.id)).map(profileOption);
    expect(option?.logMapping).toEqual(mapping);

    const edited = { ...mapping, currentUnit: "mA", dischargeSign: "negative" };
    expect(
      await saveBenchProfile(null, form({ ...valid, id: String(id), logMapping: JSON.stringify(edited) })),
    ).toMatchObject({
      ok: true,
    });
    expect((await stored())?.logMapping).toEqual(edited);

    const bad = await saveBenchProfile(
      null,
      form({ ...valid, id: String(id), logMapping: '{"time":"Time","hasHeader":false}' }),
    );
    expect(bad).toMatchObject({ ok: false, code: "validation" });
    if (!bad.ok) expect(bad.fieldErrors?.logMapping?.[0]).toMatch(/column number/);
    const notJson = await saveBenchProfile(null, form({ ...valid, id: String(id), logMapping: "time=0" }));
    if (!notJson.ok) expect(notJson.fieldErrors?.logMapping?.[0]).toMatch(/not valid JSON/);
    expect(notJson.ok).toBe(false);
    expect((await stored())?.logMapping).toEqual(edited); // refused saves change nothing

    expect(await saveBenchProfile(null, form({ ...valid, id: String(id), logMapping: "" }))).toMatchObject({
      ok: true,
    });
    expect((await stored())?.logMapping).toBeNull();
  });

  it("stores the instrument accuracy as stated, leaves blank parts null, and a later save without them clears them", async () => {
    const me = await signedIn("contributor");
    requestState.token = me.token;
    const accuracy = {
      voltageAccuracyPct: "0,1",
      voltageOffsetV: "0.01",
      voltageResolutionV: "0.001",
      currentAccuracyPct: "0.5",
      currentOffsetA: "0.02",
      currentResolutionA: "",
      temperatureAccuracyPct: "",
      temperatureOffsetC: "1.5",
      temperatureResolutionC: "0.1",
      samplingIntervalS: "0.5",
    };
    const created = await saveBenchProfile(null, form({ ...valid, ...accuracy }));
    if (!created.ok) throw new Error(created.error);
    const id = created.data.id;
    const stored = async () => (await db.select().from(benchProfiles).where(eq(benchProfiles.id, id)))[0];
    expect(await stored()).toMatchObject({
      voltageAccuracyPct: expect.closeTo(0.1, 6),
      voltageOffsetV: expect.closeTo(0.01, 6),
      voltageResolutionV: expect.closeTo(0.001, 6),
      currentAccuracyPct: 0.5,
      currentOffsetA: expect.closeTo(0.02, 6),
      currentResolutionA: null,
      temperatureAccuracyPct: null,
      temperatureOffsetC: 1.5,
      temperatureResolutionC: expect.closeTo(0.1, 6),
      samplingIntervalS: 0.5,
    });
    // A save that does not send the accuracy (an older form) states nothing: the values do not linger.
    expect(await saveBenchProfile(null, form({ ...valid, id: String(id) }))).toMatchObject({ ok: true });
    expect(await stored()).toMatchObject({
      voltageAccuracyPct: null,
      samplingIntervalS: null,
      temperatureOffsetC: null,
    });
  });

  it("refuses accuracy outside the bounds with one clear message per field and stores nothing", async () => {
    const me = await signedIn("contributor");
    requestState.token = me.token;
    const res = await saveBenchProfile(
      null,
      form({
        ...valid,
        voltageAccuracyPct: "12",
        currentOffsetA: "-0.1",
        temperatureOffsetC: "abc",
        samplingIntervalS: "0",
      }),
    );
    expect(res).toMatchObject({ ok: false, code: "validation" });
    if (res.ok) return;
    expect(res.fieldErrors?.voltageAccuracyPct?.[0]).toBe("Voltage accuracy must be at most 10 % of reading.");
    expect(res.fieldErrors?.currentOffsetA?.[0]).toBe("Current offset cannot be negative.");
    expect(res.fieldErrors?.temperatureOffsetC?.[0]).toBe("Temperature offset must be a number.");
    expect(res.fieldErrors?.samplingIntervalS?.[0]).toBe("Sampling interval must be above 0 s.");
    expect(await db.select().from(benchProfiles).where(eq(benchProfiles.userId, me.id))).toHaveLength(0);
  });
});
