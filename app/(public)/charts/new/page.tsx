import type { Metadata } from "next";
import { Suspense } from "react";
import { labelForGroupKey } from "@/lib/analysis";
import { cachedGroupCoverage, cachedGroupOptions, cachedMakers } from "@/server/public-data";
import { ChartBuilder } from "./chart-builder-client";

// Static; group options and makers come from tagged cached reads, so a decision refreshes them at once.
// The timer is only a safety net.
export const revalidate = 3600;
export const metadata: Metadata = {
  title: "Build a chart",
  description: "Build a chart from Sagline open data, then embed it or download it.",
};

export default async function NewChartPage() {
  const [groups, makers, coverage] = await Promise.all([cachedGroupOptions(3), cachedMakers(), cachedGroupCoverage(3)]);
  // Only makers with approved results in some offered group.
  const withData = new Set(coverage.map((c) => c.maker));
  return (
    <div className="space-y-4">
      <h1>Build a chart</h1>
      <p className="muted max-w-3xl">
        Pick a chart and one like-for-like group: results taken another way are never mixed in. The chart&apos;s address
        carries everything you chose, so a published chart stays as you built it. No account needed.
      </p>
      <Suspense fallback={<p className="muted">Loading the builder…</p>}>
        <ChartBuilder
          groups={groups.map((g) => ({
            key: g.key,
            // In words, always: a group whose card cannot be read back is named from its key.
            label: g.label ?? labelForGroupKey(g.key) ?? "a like-for-like group without a readable name",
            resultCount: g.resultCount,
            packCount: g.packCount,
          }))}
          makers={makers.filter((m) => withData.has(m.slug)).map((m) => ({ slug: m.slug, name: m.name }))}
          coverage={coverage}
        />
      </Suspense>
    </div>
  );
}
