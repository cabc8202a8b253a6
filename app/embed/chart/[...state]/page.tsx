import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { ServerChartSvg } from "@/components/charts/server-chart-svg";
import { loadChartData } from "@/server/open-data/load-chart-data";
import { chartLinks } from "@/lib/open-data/chart-links";
import { decodeChartStateSegments } from "@/lib/open-data/chart-state";
import { DATA_LICENCE_LABEL, DATA_LICENCE_URL } from "@/lib/open-data/licence";

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
  return { title: state?.title ?? "Chart not found", robots: { index: false } };
}

// Tells the embedding page our height; embed-resize.js checks that the message comes from this frame.
const RESIZE_SCRIPT = `(function(){var el=document.getElementById("sagline-embed");if(!el||window.parent===window)return;var last=0;function send(){var h=Math.ceil(el.getBoundingClientRect().height);if(h&&h!==last){last=h;window.parent.postMessage({type:"sagline:embed-height",height:h},"*");}}if(window.ResizeObserver){new ResizeObserver(send).observe(el);}window.addEventListener("load",send);send();})();`;

export default async function EmbedChartPage({ params }: Props) {
  const state = await stateOf(params);
  if (!state) notFound();
  const data = await loadChartData(state);
  const links = chartLinks(state);
  return (
    <div id="sagline-embed" className="p-1">
      <ServerChartSvg data={data} />
      <p className="px-1 pt-1 text-xs text-ink-soft">
        <a href={links.permalink} target="_blank" rel="noopener">
          View on Sagline
        </a>{" "}
        · Data{" "}
        <a href={DATA_LICENCE_URL} target="_blank" rel="license noopener">
          {DATA_LICENCE_LABEL}
        </a>
      </p>
      <script dangerouslySetInnerHTML={{ __html: RESIZE_SCRIPT }} />
    </div>
  );
}
