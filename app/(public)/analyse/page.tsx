import type { Metadata } from "next";
import { env } from "@/server/env";
import { AnalyseClient } from "./_components/analyse-client";

export const metadata: Metadata = {
  title: "Analyse a log",
  description:
    "Drop a discharge log (CSV) to see the figures Sagline computes from it — capacity, energy, DC resistance, hold voltage, sag-limited C — without submitting anything.",
};

export default function AnalysePage() {
  const maxMb = Math.round(env().LOG_MAX_BYTES / (1024 * 1024));
  return (
    <div className="space-y-6">
      <header className="max-w-3xl space-y-2">
        <h1>Analyse a log</h1>
        <p className="muted">
          Drop a discharge log to see the figures Sagline would compute from it, with the curves and any warnings.
          Nothing is stored and you do not need to sign in. The same check is available as{" "}
          <code className="num text-sm">POST /api/v1/analyse</code> (see <a href="/data#api">the API</a>).
        </p>
      </header>
      <AnalyseClient maxMb={maxMb} />
      <aside className="muted max-w-3xl text-sm">
        Discharging packs at high current makes them hot. Test in a fire-safe place, stop at the stop temperature, never
        leave a pack under load or on charge unattended, retire swollen packs, and follow the maker’s instructions and
        local rules. <a href="/methods#safety">Safety notes</a>.
      </aside>
    </div>
  );
}
