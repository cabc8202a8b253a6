"use client";
// A real progress bar for an XHR upload, then an indeterminate one while the server analyses.
import type { UploadState } from "./use-xhr-upload";

export function UploadProgress({ state, label }: { state: UploadState<unknown>; label: string }) {
  if (state.phase !== "uploading" && state.phase !== "processing") return null;
  const pct =
    state.phase === "uploading" && state.totalBytes > 0 ? Math.round((state.sentBytes / state.totalBytes) * 100) : 100;
  return (
    <div className="space-y-1" aria-live="polite">
      <div className="flex justify-between text-xs">
        <span>{state.phase === "processing" ? "Analysing the log…" : label}</span>
        <span className="num">{pct} %</span>
      </div>
      <progress
        max={100}
        value={state.phase === "processing" ? undefined : pct}
        aria-label={label}
        className="h-2 w-full overflow-hidden rounded bg-paper-sunk accent-cell-500 dark:bg-night-sunk"
      />
    </div>
  );
}
