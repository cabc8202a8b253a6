import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { ChartDataFigure } from "@/components/charts/chart-data-figure";
import { env } from "@/server/env";
import { loadChartData } from "@/server/open-data/load-chart-data";
import {
  PNG_DOWNLOADS,
  chartImagePath,
  chartLinks,
  embedSnippet,
  imageSnippet,
  pngPixels,
} from "@/lib/open-data/chart-links";
import { CHART_KIND_LABELS, decodeChartStateSegments, encodeChartState } from "@/lib/open-data/chart-state";
import { ATTRIBUTION, ATTRIBUTION_TEXT, DATA_LICENCE_LABEL, DATA_LICENCE_URL } from "@/lib/open-data/licence";
import { EmbedSnippet } from "../../_components/embed-snippet-client";
import { SaveChart } from "../../_components/save-chart-client";

// The URL carries the whole chart, and anyone can make up a new one, so the page is drawn per request and
// nothing is stored per link (kept pages cost ≈ 435 KB of cache files each, without bound). Its data comes
// from the tagged cached reads of one like-for-like group (bounded keys), and next.config.mjs sends
// Cache-Control with s-maxage so a CDN keeps popular charts; proxy.ts limits how many charts nobody has asked
// for lately one client can have drawn.
export const dynamic = "force-dynamic";

type Props = { params: Promise<{ state: string[] }> };

/** The chart a URL's segments carry (proxy.ts has already sent other splits of it to the canonical one). */
async function stateOf(params: Props["params"]) {
  return decodeChartStateSegments((await params).state);
}

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  const state = await stateOf(params);
  if (!state) return { title: "Chart not found" };
  const base = env().APP_URL;
  const links = chartLinks(state);
  const oembed = `${base}/api/oembed?format=json&url=${encodeURIComponent(`${base}${links.permalink}`)}`;
  return {
    title: state.title,
    description: state.note ?? `${CHART_KIND_LABELS[state.kind]} from Sagline open data.`,
    alternates: { canonical: links.permalink, types: { "application/json+oembed": oembed } },
    openGraph: { title: state.title, images: [{ url: `${base}${links.png}`, width: 1600, height: 1000 }] },
  };
}

export default async function ChartPage({ params }: Props) {
  const state = await stateOf(params);
  if (!state) notFound();
  const data = await loadChartData(state);
  const links = chartLinks(state);
  const base = env().APP_URL;
  return (
    <div className="space-y-6">
      <div className="space-y-1">
        <p className="muted text-sm">
          <a href="/charts">Charts</a> · {CHART_KIND_LABELS[state.kind]}
        </p>
        <h1>{state.title}</h1>
        {state.note ? <p className="muted max-w-3xl">{state.note}</p> : null}
      </div>
      <ChartDataFigure data={data} />
      <p className="muted text-sm">
        Data: {ATTRIBUTION}, licensed{" "}
        <a href={DATA_LICENCE_URL} rel="license">
          {DATA_LICENCE_LABEL}
        </a>
        . Only results in one like-for-like group are compared. {data.leftOut.join(" ")}
      </p>
      <section className="grid gap-6 lg:grid-cols-[2fr_1fr]" aria-label="Use this chart">
        <div className="space-y-6">
          <EmbedSnippet snippet={embedSnippet(state, base)} />
          <EmbedSnippet
            snippet={imageSnippet(state, base)}
            id="image-snippet"
            label="Image snippet (no frame, no script)"
            copyLabel="Copy image snippet"
            hint="For newsletters and pages that refuse frames: a linked PNG, sharp on high-density screens, with a taller layout on phones."
          />
        </div>
        <div className="space-y-2 text-sm">
          <h2 className="text-base">Download</h2>
          <ul className="space-y-1">
            {PNG_DOWNLOADS.map((d) => {
              const px = pngPixels(d);
              const href = chartImagePath(state, "png", { width: d.width, scale: d.scale });
              return (
                <li key={d.label}>
                  <a href={`${href}${href.includes("?") ? "&" : "?"}download=1`} download>
                    {d.label} ({px.width} × {px.height})
                  </a>{" "}
                  <span className="muted">— {d.note}</span>
                </li>
              );
            })}
            <li>
              <a href={`${links.svg}?download=1`} download>
                SVG image
              </a>{" "}
              <span className="muted">— sharp at any size</span>
            </li>
            <li>
              <a
                href={`/data/download/results.csv?group=${state.group}${state.maker ? `&maker=${state.maker}` : ""}${state.cells ? `&cells=${state.cells}` : ""}`}
              >
                The results behind it (CSV)
              </a>
            </li>
          </ul>
          <p className="muted">Credit: “{ATTRIBUTION_TEXT}”</p>
          <SaveChart state={state} />
          <p>
            <a href={`/charts/new?from=${encodeURIComponent(encodeChartState(state))}`}>Change this chart</a> ·{" "}
            <a href={links.embed}>Open the embed</a>
          </p>
        </div>
      </section>
    </div>
  );
}
