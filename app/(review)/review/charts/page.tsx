import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { z } from "zod";
import { listSavedChartsForReview } from "@/db/queries/open-data/charts";
import { chartLinks } from "@/lib/open-data/chart-links";
import { CHART_KIND_LABELS, chartState } from "@/lib/open-data/chart-state";
import { requirePageUser } from "@/server/page-auth";
import { FeatureChartButton } from "./_components/feature-chart-client";

export const metadata: Metadata = { title: "Saved charts" };
export const dynamic = "force-dynamic";

const PER_PAGE = 20;
const query = z.object({ page: z.coerce.number().int().min(1).max(100_000).catch(1) });
const when = (d: Date) =>
  d.toLocaleString("en-GB", { dateStyle: "medium", timeStyle: "short", timeZone: "UTC" }) + " UTC";

export default async function SavedChartsPage(props: { searchParams: Promise<Record<string, string | string[]>> }) {
  await requirePageUser("chart.feature", "/review/charts");
  const { page } = query.parse(await props.searchParams);
  const { rows, total } = await listSavedChartsForReview(page, PER_PAGE);
  const pageCount = Math.max(1, Math.ceil(total / PER_PAGE));
  if (page > pageCount) notFound();
  return (
    <div className="space-y-6">
      <div className="space-y-1">
        <h1>Saved charts</h1>
        <p className="muted max-w-3xl">
          {total} saved {total === 1 ? "chart" : "charts"}, newest first. Anyone signed in may save a chart and share
          its link; only the ones you feature are listed on <Link href="/charts">/charts</Link> and in the API. Feature
          a chart when its title and note describe the data fairly and advertise nothing.
        </p>
      </div>
      <ul className="space-y-4" data-testid="saved-charts">
        {rows.map((c) => {
          const parsed = chartState.safeParse(c.state);
          return (
            <li key={c.id} className="card grid gap-4 md:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
              <div className="min-w-0 space-y-1">
                <p className="font-medium">
                  {parsed.success ? <Link href={chartLinks(parsed.data).permalink}>{c.title}</Link> : c.title}
                </p>
                <p className="muted text-sm">
                  {CHART_KIND_LABELS[c.kind]} · saved {when(c.createdAt)} by {c.savedBy ?? "a deleted account"}
                  {c.featuredAt ? ` · featured ${when(c.featuredAt)}` : " · not featured"}
                </p>
                {c.note ? <p className="text-sm">{c.note}</p> : null}
                {!parsed.success ? (
                  <p className="text-sm text-warn">Its stored state no longer reads as a chart.</p>
                ) : null}
              </div>
              <FeatureChartButton chartId={c.id} title={c.title} featured={c.featuredAt !== null} />
            </li>
          );
        })}
      </ul>
      {pageCount > 1 ? (
        <nav aria-label="Pages of saved charts" className="flex items-center gap-4 text-sm">
          {page > 1 ? <Link href={`/review/charts?page=${page - 1}`}>← Newer</Link> : null}
          <span className="muted">
            Page {page} of {pageCount}
          </span>
          {page < pageCount ? <Link href={`/review/charts?page=${page + 1}`}>Older →</Link> : null}
        </nav>
      ) : null}
    </div>
  );
}
