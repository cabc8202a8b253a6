import type { Metadata } from "next";
import Link from "next/link";
import { listSavedCharts } from "@/db/queries/open-data/charts";
import { chartLinks } from "@/lib/open-data/chart-links";
import { CHART_KIND_LABELS, chartState } from "@/lib/open-data/chart-state";

export const revalidate = 600;
export const metadata: Metadata = {
  title: "Charts",
  description: "Published charts from Sagline open data, ready to embed or download.",
};

export default async function ChartsPage() {
  const saved = await listSavedCharts();
  const charts = saved.flatMap((c) => {
    const parsed = chartState.safeParse(c.state);
    return parsed.success ? [{ ...c, state: parsed.data, links: chartLinks(parsed.data) }] : [];
  });
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div className="space-y-1">
          <h1>Charts</h1>
          <p className="muted max-w-2xl">
            Charts built from one like-for-like group at a time. Each can be embedded, downloaded as PNG or SVG, and
            cited under CC BY 4.0.
          </p>
        </div>
        <Link
          href="/charts/new"
          className="rounded bg-cell-600 px-4 py-2 font-medium text-white no-underline hover:bg-cell-700 hover:no-underline"
        >
          Build a chart
        </Link>
      </div>
      {charts.length === 0 ? <p className="muted">No published charts yet.</p> : null}
      <ul className="grid gap-4 md:grid-cols-2" data-testid="chart-list">
        {charts.map((c) => (
          <li key={c.id} className="card space-y-2">
            <Link href={c.links.permalink} className="block">
              {/* eslint-disable-next-line @next/next/no-img-element -- server-drawn SVG */}
              <img
                src={c.links.svg}
                alt={`Chart: ${c.title}`}
                width={800}
                height={500}
                loading="lazy"
                className="h-auto w-full rounded border border-ink/10"
              />
            </Link>
            <h2 className="text-base">
              <Link href={c.links.permalink}>{c.title}</Link>
            </h2>
            <p className="muted text-sm">{CHART_KIND_LABELS[c.kind]}</p>
          </li>
        ))}
      </ul>
    </div>
  );
}
