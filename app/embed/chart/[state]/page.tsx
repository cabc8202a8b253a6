import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { ServerChartSvg } from "@/components/charts/server-chart-svg";
import { loadChartData } from "@/lib/open-data/chart-data";
import { chartLinks } from "@/lib/open-data/chart-links";
import { decodeChartState } from "@/lib/open-data/chart-state";
import { DATA_LICENCE_SHORT, DATA_LICENCE_URL } from "@/lib/open-data/licence";

// The URL carries the whole chart, so the set of pages is whatever anyone types: rendered per request rather
// than stored one file per URL (an unbounded page cache, and names too long for the file system). The data
// comes from tagged cached reads (lib/public-data.ts), so a render is cheap and a decision shows at once;
// a CDN in front may cache by URL.
export const dynamic = "force-dynamic";

type Props = { params: Promise<{ state: string }> };

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  const state = decodeChartState((await params).state);
  return { title: state?.title ?? "Chart not found", robots: { index: false } };
}

// Tells the embedding page our height; embed-resize.js checks that the message comes from this frame.
const RESIZE_SCRIPT = `(function(){var el=document.getElementById("sagline-embed");if(!el||window.parent===window)return;var last=0;function send(){var h=Math.ceil(el.getBoundingClientRect().height);if(h&&h!==last){last=h;window.parent.postMessage({type:"sagline:embed-height",height:h},"*");}}if(window.ResizeObserver){new ResizeObserver(send).observe(el);}window.addEventListener("load",send);send();})();`;

export default async function EmbedChartPage({ params }: Props) {
  const state = decodeChartState((await params).state);
  if (!state) notFound();
  const data = await loadChartData(state);
  const links = chartLinks(state);
  return (
    <div id="sagline-embed" className="p-1">
      <ServerChartSvg data={data} />
      <p className="px-1 pt-1 text-xs text-ink-soft">
        <a href={links.permalink} target="_blank" rel="noopener">View on Sagline</a> · Data{" "}
        <a href={DATA_LICENCE_URL} target="_blank" rel="license noopener">{DATA_LICENCE_SHORT}</a>
      </p>
      <script dangerouslySetInnerHTML={{ __html: RESIZE_SCRIPT }} />
    </div>
  );
}
