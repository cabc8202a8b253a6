"use client";
import { useActionState } from "react";
import { buttonClass } from "@/components/ui/form";
import { featureChart } from "../actions/feature-chart";

/** Feature a saved chart on /charts, or take it off. */
export function FeatureChartButton({
  chartId,
  title,
  featured,
}: {
  chartId: string;
  title: string;
  featured: boolean;
}) {
  const [state, action, pending] = useActionState(featureChart, null);
  const now = state?.ok ? state.data.featured : featured;
  return (
    <form action={action} className="flex flex-col items-start gap-1">
      <input type="hidden" name="chartId" value={chartId} />
      <input type="hidden" name="featured" value={now ? "0" : "1"} />
      <button
        type="submit"
        className={buttonClass(now ? "secondary" : "primary")}
        disabled={pending}
        aria-label={`${now ? "Take off /charts" : "Feature on /charts"}: ${title}`}
      >
        {now ? "Take off /charts" : "Feature on /charts"}
      </button>
      <p aria-live="polite" className="text-sm">
        {state && !state.ok ? <span className="text-warn">{state.error}</span> : null}
        {state?.ok ? (now ? "Featured: listed on /charts." : "Taken off /charts.") : null}
      </p>
    </form>
  );
}
