// Filtered downloads: a plain GET form (works without JavaScript); each button names its file.
import type { GroupSummary } from "@/db/queries/groups";
import type { MakerRow } from "@/lib/open-data/records";

const inputClass =
  "mt-1 block w-full rounded border border-ink/20 bg-paper-raised px-2 py-1 dark:border-night-line dark:bg-night-raised";

export function DownloadForm({ makers, groups }: { makers: MakerRow[]; groups: GroupSummary[] }) {
  return (
    <form
      method="get"
      action="/data/download/results.csv"
      className="card space-y-4"
      aria-labelledby="filtered-heading"
    >
      <h3 id="filtered-heading">Filtered download</h3>
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
        <label className="text-sm">
          Maker
          <select name="maker" className={inputClass} defaultValue="">
            <option value="">Any maker</option>
            {makers.map((m) => (
              <option key={m.slug} value={m.slug}>
                {m.name}
              </option>
            ))}
          </select>
        </label>
        <label className="text-sm">
          Cells in series (S)
          <input name="cells" type="number" min={1} max={14} inputMode="numeric" className={inputClass} />
        </label>
        <label className="text-sm">
          Rated capacity from (mAh)
          <input name="minMah" type="number" min={1} inputMode="numeric" className={inputClass} />
        </label>
        <label className="text-sm">
          Rated capacity up to (mAh)
          <input name="maxMah" type="number" min={1} inputMode="numeric" className={inputClass} />
        </label>
        <label className="text-sm">
          Connector
          <input name="connector" type="text" maxLength={40} className={inputClass} />
        </label>
        <label className="text-sm">
          Search maker or model
          <input name="q" type="search" maxLength={80} className={inputClass} />
        </label>
        <label className="text-sm sm:col-span-2">
          Like-for-like group (results only)
          <select name="group" className={inputClass} defaultValue="">
            <option value="">Every group</option>
            {groups.map((g) => (
              <option key={g.key} value={g.key}>
                {g.label} ({g.resultCount} results)
              </option>
            ))}
          </select>
        </label>
      </div>
      <div className="flex flex-wrap gap-2">
        {(["results.csv", "results.json", "packs.csv", "packs.json"] as const).map((file) => (
          <button
            key={file}
            type="submit"
            formAction={`/data/download/${file}`}
            className="rounded border border-cell-600 px-3 py-1 text-sm font-medium text-cell-700 hover:bg-cell-50 dark:text-cell-400 dark:hover:bg-night-sunk"
          >
            Download {file}
          </button>
        ))}
      </div>
    </form>
  );
}
