// The embed: a whole HTML document, static, with no framework script — the chart's own drawing (the one the
// page and the images draw), its legend, the group and what was left out, the credit and licence, and a
// script of a few lines that tells the embedding page its height (public/embed-resize.js listens). Its
// styles are inline and follow the reader's light or dark scheme; link and focus colours keep ≥ 4.5:1 and
// ≥ 3:1 against the embed's background in both (tests/unit/contrast.test.ts).
import type { ChartData } from "@/lib/open-data/chart-data";
import { plural } from "@/lib/open-data/chart-svg-kit";
import { ATTRIBUTION, DATA_LICENCE_LABEL, DATA_LICENCE_URL } from "@/lib/open-data/licence";
import { ChartLegend } from "../chart-figure";
import { LabelCheckPlot } from "../draw/label-check-plot";
import { LinePlot } from "../draw/line-plot";
import { RankingPlot } from "../draw/ranking-plot";
import { curveSeries, curvesAxes, labelCheckLegendItems, lineLegendItems } from "../legends";

/** Colours of the embed, light then dark (tailwind.config.ts tokens). */
export const EMBED_COLOURS = {
  light: { text: "#1b1f27", soft: "#4a5160", background: "#ffffff", link: "#0e524b", focus: "#8c5206" },
  dark: { text: "#f6f4ee", soft: "#c9c6bd", background: "#12151b", link: "#35a99b", focus: "#f2a93b" },
} as const;

const { light: L, dark: D } = EMBED_COLOURS;
const CSS = `:root{color-scheme:light dark}body{margin:0;font:14px/1.45 Inter,"Inter Variable",system-ui,sans-serif;color:${L.text};background:${L.background}}a{color:${L.link};text-underline-offset:2px}:focus-visible{outline:2px solid ${L.focus};outline-offset:2px}.soft{color:${L.soft}}@media (prefers-color-scheme:dark){body{color:${D.text};background:${D.background}}a{color:${D.link}}:focus-visible{outline-color:${D.focus}}.soft{color:${D.soft}}}main{padding:4px 6px}h1{font-size:17px;line-height:1.3;margin:0 0 2px}p{margin:2px 0}.chart-legend{display:flex;flex-wrap:wrap;gap:4px 16px;list-style:none;margin:8px 0;padding:0;font-size:13px}.chart-legend li{display:flex;align-items:center;gap:6px}.chart-svg{display:block;margin:6px 0 0 44px;width:calc(100% - 44px);overflow:visible}.small{font-size:12px}`;

// Tells the embedding page our height; embed-resize.js checks that the message comes from this frame.
const RESIZE_SCRIPT = `(function(){var el=document.getElementById("sagline-embed");if(!el||window.parent===window)return;var last=0;function send(){var h=Math.ceil(el.getBoundingClientRect().height);if(h&&h!==last){last=h;window.parent.postMessage({type:"sagline:embed-height",height:h},"*");}}if(window.ResizeObserver){new ResizeObserver(send).observe(el);}window.addEventListener("load",send);send();})();`;

function Drawing({ data }: { data: ChartData }) {
  if (data.state.kind === "label-check")
    return <LabelCheckPlot prefix="e" points={data.labelCheck ?? []} rating={data.rating} height={320} />;
  if (data.state.kind === "maker-ranking") return <RankingPlot bars={data.ranking ?? []} rating={data.rating} />;
  return (
    <LinePlot
      prefix="e"
      series={curveSeries(data.curves ?? [])}
      {...curvesAxes(360, data.curvesPerPack)}
      yDigits={2}
      height={300}
    />
  );
}

export function EmbedDocument({ data, permalink }: { data: ChartData; permalink: string }) {
  const { state } = data;
  const empty = data.counts.results === 0;
  const legend =
    state.kind === "label-check"
      ? labelCheckLegendItems(data.rating)
      : state.kind === "curves"
        ? lineLegendItems(curveSeries(data.curves ?? []))
        : [];
  return (
    <html lang="en-GB">
      {/* eslint-disable-next-line @next/next/no-head-element -- a document a route handler writes out, not a Next page */}
      <head>
        <meta charSet="utf-8" />
        <meta name="viewport" content="width=device-width, initial-scale=1" />
        <meta name="robots" content="noindex" />
        <title>{`${state.title} · Sagline`}</title>
        <style dangerouslySetInnerHTML={{ __html: CSS }} />
      </head>
      <body>
        <main id="sagline-embed">
          <h1>{state.title}</h1>
          {state.note ? <p className="soft">{state.note}</p> : null}
          {empty ? (
            <p className="soft">No approved results match this chart yet.</p>
          ) : (
            <>
              {legend.length ? <ChartLegend items={legend} /> : null}
              <Drawing data={data} />
            </>
          )}
          <p className="soft small">
            Group: {data.groupLabel} · {plural(data.counts.packs, "pack")},{" "}
            {plural(data.counts.results, "approved result")}. {data.leftOut.join(" ")}
          </p>
          <p className="small">
            Source:{" "}
            <a href={permalink} target="_blank" rel="noopener">
              Sagline
            </a>{" "}
            · Data: {ATTRIBUTION}, licensed{" "}
            <a href={DATA_LICENCE_URL} target="_blank" rel="license noopener">
              {DATA_LICENCE_LABEL}
            </a>
          </p>
        </main>
        <script dangerouslySetInnerHTML={{ __html: RESIZE_SCRIPT }} />
      </body>
    </html>
  );
}
