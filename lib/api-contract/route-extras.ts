// The parts of the route table that are not zod schemas: the chart image's size parameters (plain whole-number
// strings, checked by lib/open-data/chart-size.ts) and the media types a raw log may be served as.
import {
  CHART_MAX_HEIGHT,
  CHART_MAX_WIDTH,
  CHART_MIN_HEIGHT,
  CHART_MIN_WIDTH,
  DEFAULT_PNG_SCALE,
  MAX_PNG_SIDE,
  PNG_SCALES,
} from "@/lib/open-data/chart-size";
import { CHART_WIDTH } from "@/lib/open-data/chart-state";

export const chartImageParameters: Record<string, unknown>[] = [
  {
    name: "state",
    in: "path",
    required: true,
    description: `The chart's state, base64url-encoded JSON: a chart permalink's path after /charts/view/ with its slashes removed. Without size parameters the chart is ${CHART_WIDTH} × 500 CSS pixels and the PNG is drawn at scale ${DEFAULT_PNG_SCALE}.`,
    schema: { type: "string", pattern: "^[A-Za-z0-9_-]{1,4000}$" },
  },
  { name: "file", in: "path", required: true, schema: { type: "string", enum: ["chart.svg", "chart.png"] } },
  {
    name: "width",
    in: "query",
    description: "Width of the drawing in CSS pixels (a plain whole number). Below 560 the layout turns narrow.",
    schema: { type: "integer", minimum: CHART_MIN_WIDTH, maximum: CHART_MAX_WIDTH, default: CHART_WIDTH },
  },
  {
    name: "height",
    in: "query",
    description: `Height in CSS pixels. Default: 5/8 of the width, at least 400. Allowed: from max(${CHART_MIN_HEIGHT}, 0.4 × width) to min(${CHART_MAX_HEIGHT}, 1.5 × width).`,
    schema: { type: "integer", minimum: CHART_MIN_HEIGHT, maximum: CHART_MAX_HEIGHT },
  },
  {
    name: "scale",
    in: "query",
    description: `chart.png only (400 for SVG): device pixels per CSS pixel; no side may exceed ${MAX_PNG_SIDE}.`,
    schema: { type: "integer", enum: [...PNG_SCALES], default: DEFAULT_PNG_SCALE },
  },
  {
    name: "download",
    in: "query",
    description: "1: sent as an attachment named sagline-<title>-<width>x<height>.<ext>.",
    schema: { type: "string", enum: ["1"] },
  },
];

/** How a stored log is served: its content type from the download name's extension (lib/open-data/recompute.ts). */
export function logContentType(downloadName: string): string {
  if (downloadName.endsWith(".csv")) return "text/csv; charset=utf-8";
  if (downloadName.endsWith(".tsv")) return "text/tab-separated-values; charset=utf-8";
  return "text/plain; charset=utf-8";
}

export const LOG_MEDIA_TYPES: Record<string, { description?: string }> = {
  "text/csv": { description: "A .csv log." },
  "text/tab-separated-values": { description: "A .tsv log." },
  "text/plain": { description: "A .txt, .log or .dat log." },
};
