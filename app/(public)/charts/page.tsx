import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { z } from "zod";
import { chartLinks } from "@/lib/open-data/chart-links";
import { CHART_KIND_LABELS, chartState } from "@/lib/open-data/chart-state";
import { cachedFeaturedCharts } from "@/server/public-data";

export const metadata: Metadata = {
  title: "Charts",
  description: "Charts from Sagline open data chosen by its moderators, ready to embed or download.",
};

const CHARTS_PER_PAGE = 12;
const query = z.object({ page: z.coerce.number().int().min(1).max(10_000).catch(1) });

// Lists only charts a moderator featured (anyone signed in may save a chart and share its link; listing it
// here is a moderator's decision). Reads the tagged cache of featured charts; no cookies.
export default async function ChartsPage(props: { searchParams: Promise<Record<string, string | string[]>> }) {
  const { page } = query.parse(await props.searchParams);
  const { rows, total } = await cachedFeaturedCharts(page, CHARTS_PER_PAGE);
  const pageCount = Math.max(1, Math.ceil(total / CHARTS_PER_PAGE));
  if (page > pageCount) notFound();
  const charts = rows.flatMap((c) => {
    const parsed = chartState.safeParse(c.state);
    return parsed.success ? [{ ...c, state: parsed.data, links: chartLinks(parsed.data) }] : [];
  });
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div className="space-y-1">
          <h1>Charts</h1>
          <p className="muted max-w-2xl">
            Charts built from one like-for-like group at a time and chosen by Sagline’s moderators. Each can be
            embedded, downloaded as PNG or SVG, and cited under CC BY 4.0. Build your own: its link works for anyone at
            once.
          </p>
        </div>
        <Link
          href="/charts/new"
          className="rounded bg-cell-600 px-4 py-2 font-medium text-white no-underline hover:bg-cell-700 hover:no-underline"
        >
          Build a chart
        </Link>
      </div>
      {charts.length === 0 ? <p className="muted">No featured charts yet.</p> : null}
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
      {pageCount > 1 ? (
        <nav aria-label="Pages of charts" className="flex items-center gap-4 text-sm">
          {page > 1 ? <Link href={page === 2 ? "/charts" : `/charts?page=${page - 1}`}>← Newer</Link> : null}
          <span className="muted">
            Page {page} of {pageCount}
          </span>
          {page < pageCount ? <Link href={`/charts?page=${page + 1}`}>Older →</Link> : null}
        </nav>
      ) : null}
    </div>
  );
}
