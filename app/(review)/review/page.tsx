import type { Metadata } from "next";
import Link from "next/link";
import { buttonClass, inputClass } from "@/components/ui/form";
import { listReviewQueue } from "@/db/queries/review";
import { flagCodes, flagLabels } from "@/lib/flag-labels";
import { fmt } from "@/lib/format";
import { requirePageUser } from "@/server/page-auth";
import { reviewQueueFilterSchema } from "@/lib/validations/review";
import { FlagChips } from "./_components/flag-chips";
import { QueueKeys } from "./_components/queue-keys-client";
import { labelForGroupKey } from "@/lib/analysis";

export const metadata: Metadata = { title: "Review queue" };
export const dynamic = "force-dynamic";

const waited = (d: Date) => {
  const h = Math.max(0, (Date.now() - d.getTime()) / 3_600_000);
  return h < 48 ? `${Math.round(h)} h` : `${Math.round(h / 24)} days`;
};

export default async function ReviewQueuePage(props: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  await requirePageUser("review-queue.read", "/review");
  const filter = reviewQueueFilterSchema.parse(await props.searchParams);
  const { items, total, counts } = await listReviewQueue(filter);
  const filtered = !!(filter.flag || filter.maker || filter.group);
  return (
    <div className="space-y-6">
      <QueueKeys />
      <div className="space-y-1">
        <h1>Review queue</h1>
        <p className="muted max-w-3xl">
          {total} pending {total === 1 ? "result" : "results"}, oldest first. Nothing is public until it is approved.
          Flags point at something to check; they never decide. Keys: <kbd>j</kbd>/<kbd>k</kbd> move, <kbd>Enter</kbd>{" "}
          opens, <kbd>/</kbd> filters.
        </p>
      </div>

      <form
        method="get"
        className="card grid gap-3 sm:grid-cols-[1fr_1fr_1fr_auto] sm:items-end"
        aria-label="Filter the queue"
      >
        <label className="space-y-1 text-sm">
          <span className="block font-medium">Flag</span>
          <select id="filter-flag" name="flag" defaultValue={filter.flag ?? ""} className={inputClass}>
            <option value="">All ({total})</option>
            <option value="none">No flags ({counts.unflagged})</option>
            {flagCodes.map((c) => (
              <option key={c} value={c}>
                {flagLabels[c]} ({counts.flags[c] ?? 0})
              </option>
            ))}
          </select>
        </label>
        <label className="space-y-1 text-sm">
          <span className="block font-medium">Maker</span>
          <select name="maker" defaultValue={filter.maker ?? ""} className={inputClass}>
            <option value="">All makers</option>
            {counts.makers.map((m) => (
              <option key={m.slug} value={m.slug}>
                {m.name} ({m.n})
              </option>
            ))}
          </select>
        </label>
        <label className="space-y-1 text-sm">
          <span className="block font-medium">Like-for-like group</span>
          <select name="group" defaultValue={filter.group ?? ""} className={inputClass}>
            <option value="">All groups</option>
            {counts.groups.map((g) => (
              <option key={g.key} value={g.key}>
                {labelForGroupKey(g.key) ?? g.key} ({g.n})
              </option>
            ))}
          </select>
        </label>
        <div className="flex gap-2">
          <button type="submit" className={buttonClass("primary")}>
            Filter
          </button>
          {filtered ? (
            <Link href="/review" className={buttonClass("secondary")}>
              Clear
            </Link>
          ) : null}
        </div>
      </form>

      {filtered ? (
        <p className="muted text-sm" role="status">
          Showing {items.length} of {total} pending results.
        </p>
      ) : null}

      {items.length === 0 ? (
        <p className="card muted">
          {filtered ? "No pending result matches these filters." : "The queue is empty. Thank you!"}
        </p>
      ) : (
        <ol
          className="divide-y divide-ink/10 rounded-lg border border-ink/10 bg-paper-raised dark:divide-night-line dark:border-night-line dark:bg-night-raised"
          data-testid="review-queue"
        >
          {items.map((r) => (
            <li key={r.id} data-testid="queue-row" data-result-id={r.id}>
              <Link
                href={`/review/${r.id}`}
                data-queue-link
                className="grid gap-2 px-4 py-3 text-ink no-underline hover:bg-paper-sunk hover:no-underline focus-visible:bg-paper-sunk sm:grid-cols-[minmax(0,2fr)_minmax(0,2fr)_auto] sm:items-center dark:text-paper dark:hover:bg-night-sunk"
              >
                <span className="min-w-0">
                  <span className="block truncate font-medium">
                    {r.makerName} {r.packModel}
                  </span>
                  <span className="muted block truncate text-xs">
                    #{r.id} · {r.contributorName} · waiting {waited(r.submittedAt)}
                  </span>
                  <span className="muted block truncate text-xs" title={r.groupKey}>
                    {labelForGroupKey(r.groupKey) ?? r.groupKey}
                  </span>
                </span>
                <FlagChips flags={r.flags} />
                <span className="num muted text-sm sm:text-right">
                  {fmt(r.capacityMah, 0, "mAh")} · ratio {fmt(r.labelRatio, 2)}
                </span>
              </Link>
            </li>
          ))}
        </ol>
      )}
    </div>
  );
}
