// The contributor's own view of how a bench agrees with other benches: the summary in words and, where a figure
// runs one way across several packs, what to check first (Sagline's suggestions, lib/analysis/agreement).
import type { BenchAgreement } from "@/lib/bench-agreement";

export function OwnAgreement({ benchId, agreement }: { benchId: number; agreement: BenchAgreement }) {
  const { summary } = agreement;
  return (
    <div className="space-y-1 text-sm" data-testid="own-agreement">
      <p>
        <span className="font-medium">Agreement with other benches:</span> {summary.words}{" "}
        {summary.resultsCompared > 0 ? <a href={`/benches/${benchId}`}>Public bench page</a> : null}
      </p>
      {summary.suggestions.length > 0 ? (
        <ul className="list-disc space-y-1 pl-5" data-testid="agreement-suggestions">
          {summary.suggestions.map((s) => (
            <li key={`${s.figure}-${s.tendency}`}>{s.words}</li>
          ))}
        </ul>
      ) : null}
      {summary.suggestions.length > 0 ? (
        <p className="muted text-xs">
          Suggestions only: follow your instruments&apos; makers&apos; instructions when checking or calibrating them.
        </p>
      ) : null}
    </div>
  );
}
