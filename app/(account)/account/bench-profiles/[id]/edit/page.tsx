import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { z } from "zod";
import { getBenchProfileForUser, type BenchProfile } from "@/db/queries/bench-profiles";
import { requirePageUser } from "@/server/page-auth";
import { benchProfileId, type BenchProfileFormValues } from "@/lib/validations/bench-profile";
import { BenchProfileForm } from "../../_components/bench-profile-form-client";

export const metadata: Metadata = { title: "Edit bench profile" };
export const dynamic = "force-dynamic";

const params = z.object({ id: benchProfileId });

const str = (v: number | string | null) => (v === null ? "" : String(v));

function toFormValues(p: BenchProfile): BenchProfileFormValues {
  return {
    name: p.name,
    loadEquipment: p.loadEquipment,
    logger: str(p.logger),
    resistanceMeter: str(p.resistanceMeter),
    resistanceMethod: p.resistanceMethod,
    calibratedOn: str(p.calibratedOn),
    notes: str(p.notes),
    defaultAmbientC: str(p.defaultAmbientC),
    defaultLoadMode: p.defaultLoadMode ?? "",
    defaultCutoffVPerCell: str(p.defaultCutoffVPerCell),
    defaultStopTemperatureC: str(p.defaultStopTemperatureC),
    defaultSampleRateHz: str(p.defaultSampleRateHz),
    logMapping: p.logMapping ? JSON.stringify(p.logMapping) : "",
    voltageAccuracyPct: str(p.voltageAccuracyPct),
    voltageOffsetV: str(p.voltageOffsetV),
    voltageResolutionV: str(p.voltageResolutionV),
    currentAccuracyPct: str(p.currentAccuracyPct),
    currentOffsetA: str(p.currentOffsetA),
    currentResolutionA: str(p.currentResolutionA),
    temperatureAccuracyPct: str(p.temperatureAccuracyPct),
    temperatureOffsetC: str(p.temperatureOffsetC),
    temperatureResolutionC: str(p.temperatureResolutionC),
    samplingIntervalS: str(p.samplingIntervalS),
  };
}

export default async function EditBenchProfilePage(props: { params: Promise<{ id: string }> }) {
  const parsed = params.safeParse(await props.params);
  const user = await requirePageUser("bench-profile.manage", "/account/bench-profiles");
  if (!parsed.success) notFound();
  // Someone else's profile is "not found" here: the page does not confirm that it exists.
  const profile = await getBenchProfileForUser(user.id, parsed.data.id);
  if (!profile) notFound();
  return (
    <div className="space-y-6">
      <h1>Edit bench profile</h1>
      <BenchProfileForm id={profile.id} initial={toFormValues(profile)} />
    </div>
  );
}
