// Every address a chart has: permalink, embed, images (with their sizes), oEmbed; and the snippets to paste.
import { ATTRIBUTION, DATA_LICENCE_LABEL } from "./licence";
import { DEFAULT_PNG_SCALE, defaultHeight, imageSizeQuery, type ChartImageFormat } from "./chart-size";
import { CHART_HEIGHT, CHART_WIDTH, chartState, encodeChartState, statePath, type ChartState } from "./chart-state";

export function chartLinks(state: ChartState) {
  const s = encodeChartState(state);
  return {
    permalink: `/charts/view/${statePath(s)}`,
    embed: `/embed/chart/${statePath(s)}`,
    svg: `/charts/image/${s}/chart.svg`,
    png: `/charts/image/${s}/chart.png`,
  };
}

/** An image address with its size in the query (nothing for the defaults). */
export function chartImagePath(
  state: ChartState,
  format: ChartImageFormat,
  size: { width?: number; height?: number; scale?: number } = {},
): string {
  return `${chartLinks(state)[format]}${imageSizeQuery(format, size)}`;
}

/** Below this viewport width the image snippet switches to the narrow layout (taller, larger text). */
export const NARROW_VIEWPORT_PX = 560;
export const NARROW_WIDTH = 400;

/** The PNG downloads offered on a chart's page: `width` in CSS pixels, `scale` device pixels per CSS pixel. */
export const PNG_DOWNLOADS = [
  {
    label: "PNG image",
    note: "800 px layout at 2×, for articles and slides",
    width: CHART_WIDTH,
    scale: DEFAULT_PNG_SCALE,
  },
  {
    label: "PNG for phones and narrow columns",
    note: `${NARROW_WIDTH} px layout at 2×: taller, with larger text`,
    width: NARROW_WIDTH,
    scale: DEFAULT_PNG_SCALE,
  },
  { label: "PNG for print and wide layouts", note: "1600 px layout at 2×", width: 1600, scale: 2 },
] as const;

/** Pixel size of a PNG download. */
export const pngPixels = (d: { width: number; scale: number }) => ({
  width: d.width * d.scale,
  height: defaultHeight(d.width) * d.scale,
});

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

/** For pages that take no iframe or script (newsletters, some CMSs): a linked, lazy PNG with 1×, 2× and 3×
 * sources, and the narrow layout on small screens. */
export function imageSnippet(state: ChartState, baseUrl: string): string {
  const png = (size: { width?: number; scale?: number }) =>
    escapeHtmlAttr(`${baseUrl}${chartImagePath(state, "png", size)}`);
  const srcset = (width: number) => [1, 2, 3].map((scale) => `${png({ width, scale })} ${scale}x`).join(", ");
  const alt = escapeHtmlAttr(`${state.title} — chart by ${ATTRIBUTION} (Sagline), licensed ${DATA_LICENCE_LABEL}`);
  return [
    `<a href="${baseUrl}${chartLinks(state).permalink}"><picture>`,
    `<source media="(max-width: ${NARROW_VIEWPORT_PX - 1}px)" srcset="${srcset(NARROW_WIDTH)}" width="${NARROW_WIDTH}" height="${defaultHeight(NARROW_WIDTH)}">`,
    `<img src="${png({ scale: 1 })}" srcset="${srcset(CHART_WIDTH)}" width="${CHART_WIDTH}" height="${CHART_HEIGHT}" alt="${alt}" loading="lazy" style="max-width:100%;height:auto">`,
    `</picture></a>`,
  ].join("\n");
}

type SavedChart = {
  id: string;
  kind: string;
  title: string;
  note: string | null;
  state: Record<string, unknown>;
  /** Dates, or their ISO strings after a cached read's JSON round trip. */
  createdAt: Date | string;
  /** When a moderator featured it on /charts; null when it is only saved. */
  featuredAt: Date | string | null;
};

/** A saved chart as the API returns it; a stored state that no longer parses is reported, not hidden. */
export function savedChartJson(row: SavedChart) {
  const parsed = chartState.safeParse(row.state);
  return {
    id: row.id,
    kind: row.kind,
    title: row.title,
    note: row.note,
    createdAt: new Date(row.createdAt).toISOString(),
    featuredAt: row.featuredAt === null ? null : new Date(row.featuredAt).toISOString(),
    state: row.state,
    links: parsed.success ? chartLinks(parsed.data) : null,
  };
}
