import type { Metadata } from "next";
import { Suspense } from "react";
import { listGroupOptions } from "@/db/queries/open-data/groups";
import { listAllMakers } from "@/db/queries/open-data/packs";
import { ChartBuilder } from "./chart-builder-client";

export const revalidate = 600;
export const metadata: Metadata = { title: "Build a chart", description: "Build a chart from Sagline open data, then embed it or download it." };

export default async function NewChartPage() {
  const [groups, makers] = await Promise.all([listGroupOptions(3), listAllMakers()]);
  return (
    <div className="space-y-4">
      <h1>Build a chart</h1>
      <p className="muted max-w-3xl">
        Pick a chart and one like-for-like group: results taken another way are never mixed in. The chart&apos;s address
        carries everything you chose, so a published chart stays as you built it. No account needed.
      </p>
      <Suspense fallback={<p className="muted">Loading the builder…</p>}>
        <ChartBuilder groups={groups.map((g) => ({ key: g.key, label: g.label ?? g.key, resultCount: g.resultCount, packCount: g.packCount }))} makers={makers.map((m) => ({ slug: m.slug, name: m.name }))} />
      </Suspense>
    </div>
  );
}
