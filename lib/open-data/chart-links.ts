// Every address a chart has: permalink, embed, images, oEmbed; and the embed snippet.
import { ATTRIBUTION } from "./licence";
import { CHART_HEIGHT, chartState, encodeChartState, type ChartState } from "./chart-state";

export function chartLinks(state: ChartState) {
  const s = encodeChartState(state);
  return {
    permalink: `/charts/view/${s}`,
    embed: `/embed/chart/${s}`,
    svg: `/charts/image/${s}/chart.svg`,
    png: `/charts/image/${s}/chart.png`,
  };
}

export function escapeHtmlAttr(text: string): string {
  return text.replace(/&/g, "&amp;").replace(/"/g, "&quot;").replace(/</g, "&lt;").replace(/>/g, "&gt;");
}

/** The snippet journalists paste: a titled, lazy, full-width iframe plus the resize script. */
export function embedSnippet(state: ChartState, baseUrl: string): string {
  const { embed } = chartLinks(state);
  const title = escapeHtmlAttr(`${state.title} — chart by ${ATTRIBUTION} (Sagline)`);
  return [
    `<iframe src="${baseUrl}${embed}" title="${title}" loading="lazy" width="100%" height="${CHART_HEIGHT + 120}" style="width:100%;border:0" data-sagline-embed></iframe>`,
    `<script async src="${baseUrl}/embed-resize.js"></script>`,
  ].join("\n");
}

type SavedChart = { id: string; kind: string; title: string; note: string | null; state: Record<string, unknown>; createdAt: Date };

/** A saved chart as the API returns it; a stored state that no longer parses is reported, not hidden. */
export function savedChartJson(row: SavedChart) {
  const parsed = chartState.safeParse(row.state);
  return {
    id: row.id, kind: row.kind, title: row.title, note: row.note, createdAt: row.createdAt.toISOString(),
    state: row.state, links: parsed.success ? chartLinks(parsed.data) : null,
  };
}
