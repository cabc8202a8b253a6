import type { Metadata } from "next";
import Link from "next/link";
import { buttonClass } from "@/components/ui/form";
import { listBenchProfilesForUser, type BenchProfile } from "@/db/queries/bench-profiles";
import { fmt } from "@/lib/format";
import { loadModeLabels, resistanceMethodLabels } from "@/lib/labels";
import { requirePageUser } from "@/server/page-auth";
import { agreementOfBench } from "@/server/bench-agreement";
import { DeleteBenchProfileButton } from "./_components/delete-bench-profile-client";
import { OwnAgreement } from "./_components/own-agreement";

export const metadata: Metadata = { title: "Bench profiles" };
export const dynamic = "force-dynamic";

function defaults(p: BenchProfile): string {
  const parts = [
    p.defaultAmbientC !== null ? `ambient ${fmt(p.defaultAmbientC, 0, "°C")}` : null,
    p.defaultLoadMode ? loadModeLabels[p.defaultLoadMode].toLowerCase() : null,
    p.defaultCutoffVPerCell !== null ? `cut-off ${fmt(p.defaultCutoffVPerCell, 2, "V/cell")}` : null,
    p.defaultStopTemperatureC !== null ? `stop at ${fmt(p.defaultStopTemperatureC, 0, "°C")}` : null,
    p.defaultSampleRateHz !== null ? `${fmt(p.defaultSampleRateHz, p.defaultSampleRateHz < 10 ? 1 : 0, "Hz")}` : null,
  ].filter(Boolean);
  return parts.length ? parts.join(" · ") : "No defaults set";
}

export default async function BenchProfilesPage() {
  const user = await requirePageUser("bench-profile.manage", "/account/bench-profiles");
  const profiles = await listBenchProfilesForUser(user.id);
  const agreements = await Promise.all(profiles.map((p) => agreementOfBench(p.id)));
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div className="space-y-1">
          <h1>Bench profiles</h1>
          <p className="muted max-w-2xl">
            Your equipment and the method-card values you usually test with. Choose a profile when you submit a result
            and its values are filled in; you can still change them for that test.
          </p>
        </div>
        <Link href="/account/bench-profiles/new" className={buttonClass("primary")}>
          New bench profile
        </Link>
      </div>
      {profiles.length === 0 ? (
        <div className="card muted">
          No bench profiles yet. Add one to describe your load, logger and resistance meter.
        </div>
      ) : (
        <ul className="grid gap-3 md:grid-cols-2" data-testid="bench-profile-list">
          {profiles.map((p, i) => (
            <li key={p.id} className="card flex flex-col gap-3">
              <div className="space-y-1">
                <h2 className="text-lg">{p.name}</h2>
                <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-sm">
                  <dt className="muted">Load</dt>
                  <dd>{p.loadEquipment}</dd>
                  <dt className="muted">Logger</dt>
                  <dd>{p.logger ?? "—"}</dd>
                  <dt className="muted">Resistance</dt>
                  <dd>
                    {resistanceMethodLabels[p.resistanceMethod]}
                    {p.resistanceMeter ? ` · ${p.resistanceMeter}` : ""}
                  </dd>
                  <dt className="muted">Calibrated</dt>
                  <dd className="num">{p.calibratedOn ?? "—"}</dd>
                </dl>
                <p className="muted num text-sm">{defaults(p)}</p>
              </div>
              {agreements[i] ? <OwnAgreement benchId={p.id} agreement={agreements[i]} /> : null}
              <div className="mt-auto flex gap-2">
                <Link href={`/account/bench-profiles/${p.id}/edit`} className={buttonClass("secondary")}>
                  Edit
                </Link>
                <DeleteBenchProfileButton id={p.id} name={p.name} />
              </div>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
