// The evidence a moderator checks a result against: the label photos the contributor sent (served through
// the permission-checked /results/<id>/photos/<n>) and the raw log as uploaded (/review/<id>/log).
import { fmt } from "@/lib/format";

type Props = { resultId: number; photoCount: number; log: { filename: string; bytes: number; sha256: string } };

export function Evidence({ resultId, photoCount, log }: Props) {
  return (
    <section className="card space-y-3" aria-labelledby="evidence-h">
      <h2 id="evidence-h">Evidence</h2>
      <div className="space-y-2">
        <h3 className="text-sm font-semibold">Label photos</h3>
        {photoCount === 0 ? (
          <p className="muted text-sm">The contributor sent no label photo.</p>
        ) : (
          <ul className="grid grid-cols-2 gap-3 sm:grid-cols-4" data-testid="label-photos">
            {Array.from({ length: photoCount }, (_, i) => (
              <li key={i}>
                <a href={`/results/${resultId}/photos/${i + 1}`} target="_blank" rel="noopener">
                  {/* Served from storage through a permission check: next/image's optimiser cannot read it. */}
                  {/* eslint-disable-next-line @next/next/no-img-element */}
                  <img
                    src={`/results/${resultId}/photos/${i + 1}`}
                    alt={`Label photo ${i + 1} of ${photoCount}`}
                    loading="lazy"
                    className="aspect-square w-full rounded border border-ink/10 object-cover dark:border-night-line"
                  />
                </a>
              </li>
            ))}
          </ul>
        )}
      </div>
      <div className="space-y-1 text-sm">
        <h3 className="font-semibold">Log</h3>
        <p>
          <a href={`/review/${resultId}/log`} download data-testid="log-download">
            Download the log as uploaded
          </a>{" "}
          <span className="muted num">
            ({log.filename}, {fmt(log.bytes / 1024, 1, "KB")}, sha256 {log.sha256.slice(0, 12)}…)
          </span>
        </p>
      </div>
    </section>
  );
}
