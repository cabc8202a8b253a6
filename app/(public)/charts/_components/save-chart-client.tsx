"use client";
// Saves the chart (signed in, "chart.save", checked on the server). Moderators choose which saved charts
// are listed on /charts; the permalink works for everyone either way.
import { useState } from "react";
import type { ChartState } from "@/lib/open-data/chart-state";

export function SaveChart({ state }: { state: ChartState }) {
  const [message, setMessage] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  async function save() {
    setBusy(true);
    try {
      const res = await fetch("/api/v1/charts", {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify({ state }),
      });
      if (res.status === 201)
        setMessage("Saved. Its link works for everyone; moderators choose which saved charts are listed on /charts.");
      else if (res.status === 401) setMessage("Sign in to save charts. The permalink works without it.");
      else if (res.status === 429) setMessage("You saved many charts in the last hour; please try again later.");
      else setMessage("Could not save the chart; the permalink still works.");
    } catch {
      setMessage("Could not reach Sagline; the permalink still works.");
    } finally {
      setBusy(false);
    }
  }
  return (
    <div className="space-y-1">
      <button
        type="button"
        onClick={save}
        disabled={busy}
        className="rounded border border-ink/20 px-3 py-1 text-sm hover:bg-paper-sunk disabled:opacity-50 dark:border-night-line dark:hover:bg-night-sunk"
      >
        Save this chart
      </button>
      {message ? (
        <p className="muted text-xs" role="status">
          {message}
        </p>
      ) : null}
    </div>
  );
}
