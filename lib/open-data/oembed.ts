// oEmbed (https://oembed.com) for chart pages: type "rich", honouring maxwidth/maxheight.
import { z } from "zod";
import { NARROW_VIEWPORT_PX, NARROW_WIDTH, chartImagePath, chartLinks, escapeHtmlAttr } from "./chart-links";
import { CHART_MIN_WIDTH, defaultHeight, heightRange } from "./chart-size";
import { CHART_HEIGHT, CHART_WIDTH, decodeChartStateSegments, type ChartState } from "./chart-state";
import { ATTRIBUTION, DATA_LICENCE_SPDX, DATA_LICENCE_URL } from "./licence";

export const oembedQuery = z.object({
  url: z.string().min(1).max(5000),
  format: z.string().optional(),
  maxwidth: z.coerce.number().int().positive().max(10_000).optional(),
  maxheight: z.coerce.number().int().positive().max(10_000).optional(),
});

/** Height of the embed frame for a width: the chart's aspect ratio (the embed switches to the square narrow
 * layout below NARROW_VIEWPORT_PX), plus a line for the credit. */
const FOOTER_PX = 32;
const NARROW_RATIO = defaultHeight(NARROW_WIDTH) / NARROW_WIDTH;
const ratioAt = (width: number) => (width < NARROW_VIEWPORT_PX ? NARROW_RATIO : CHART_HEIGHT / CHART_WIDTH);
const frameHeight = (width: number) => Math.round(width * ratioAt(width)) + FOOTER_PX;
/** The widest frame whose chart fits a height. */
function widthFor(maxheight: number): number {
  const wide = Math.floor(((maxheight - FOOTER_PX) * CHART_WIDTH) / CHART_HEIGHT);
  return Math.max(1, wide >= NARROW_VIEWPORT_PX ? wide : Math.floor((maxheight - FOOTER_PX) / NARROW_RATIO));
}

/** The chart state behind a Sagline URL (permalink or embed), or null when it is not one of ours. */
export function chartStateFromUrl(url: string, baseUrl: string) {
  let u: URL;
  try {
    u = new URL(url);
  } catch {
    return null;
  }
  if (u.origin !== new URL(baseUrl).origin) return null;
  const m = /^\/(?:charts\/view|embed\/chart)\/([A-Za-z0-9_-]+(?:\/[A-Za-z0-9_-]+)*)\/?$/.exec(u.pathname);
  return m?.[1] ? decodeChartStateSegments(m[1].split("/")) : null;
}

/** A PNG of the chart within maxwidth × maxheight (oEmbed: "the thumbnail must respect any maxwidth and
 * maxheight parameters"), at 1× so its pixel size is what we state; none when no allowed size fits. */
function thumbnail(state: ChartState, baseUrl: string, maxwidth?: number, maxheight?: number) {
  const width = Math.min(CHART_WIDTH, maxwidth ?? CHART_WIDTH);
  const height = Math.min(defaultHeight(width), maxheight ?? Infinity);
  if (width < CHART_MIN_WIDTH || height < heightRange(width).min) return {};
  return {
    thumbnail_url: `${baseUrl}${chartImagePath(state, "png", { width, height, scale: 1 })}`,
    thumbnail_width: width,
    thumbnail_height: height,
  };
}

export function oembedResponse(url: string, baseUrl: string, maxwidth?: number, maxheight?: number) {
  const state = chartStateFromUrl(url, baseUrl);
  if (!state) return null;
  let width = Math.min(CHART_WIDTH, maxwidth ?? CHART_WIDTH);
  let height = frameHeight(width);
  if (maxheight !== undefined && height > maxheight) {
    height = maxheight;
    width = Math.min(width, widthFor(maxheight));
  }
  const links = chartLinks(state);
  const html = `<iframe src="${baseUrl}${links.embed}" title="${escapeHtmlAttr(state.title)}" loading="lazy" width="${width}" height="${height}" style="max-width:100%;border:0" data-sagline-embed></iframe><script async src="${baseUrl}/embed-resize.js"></script>`;
  return {
    version: "1.0",
    type: "rich",
    title: state.title,
    author_name: ATTRIBUTION,
    author_url: `${baseUrl}/data`,
    provider_name: "Sagline",
    provider_url: baseUrl,
    cache_age: 3600,
    html,
    width,
    height,
    ...thumbnail(state, baseUrl, maxwidth, maxheight),
    license: DATA_LICENCE_SPDX,
    license_url: DATA_LICENCE_URL,
  };
}
