import type { Metadata } from "next";
import { Suspense } from "react";
import { makerRows } from "@/server/open-data/catalogue";
import { cachedGroupCoverage, cachedGroups } from "@/server/public-data";
import { ChartBuilder } from "./chart-builder-client";

// Static; group options and makers come from tagged cached reads, so a decision refreshes them at once.
// The timer is only a safety net.
export const revalidate = 3600;
export const metadata: Metadata = {
  title: "Build a chart",
  description: "Build a chart from Sagline open data, then embed it or download it.",
};

export default async function NewChartPage() {
  const [allGroups, makers, allCoverage] = await Promise.all([cachedGroups(), makerRows(), cachedGroupCoverage()]);
  // Groups with at least three published results: fewer make no chart worth publishing.
  const groups = allGroups.filter((g) => g.resultCount >= 3);
  // Only makers and pack sizes with published results in an offered group.
  const offered = new Set(groups.map((g) => g.key));
  const coverage = allCoverage.filter((c) => offered.has(c.group));
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
            label: g.label,
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
