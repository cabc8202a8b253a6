// The size of a server-drawn chart image: `width` (CSS pixels, the drawing's own coordinates), `height`
// (by default 5/8 of the width, never under 400 so narrow charts keep room for their plot) and, for PNG, a
// device-pixel `scale`. Values arrive as strings and must be plain whole numbers, so one picture has one
// URL (and one cache entry): "800", never "0800" or "8e2". Pure, shared by the route, the links and tests.
import { z } from "zod";
import { CHART_HEIGHT, CHART_WIDTH } from "./chart-state";

export const CHART_MIN_WIDTH = 320;
export const CHART_MAX_WIDTH = 1600;
export const CHART_MIN_HEIGHT = 300;
export const CHART_MAX_HEIGHT = 1600;
/** Height may be from 0.4× to 1.5× the width: flatter or taller charts leave no room for the plot. */
const MIN_ASPECT = 0.4;
const MAX_ASPECT = 1.5;
export const PNG_SCALES = [1, 2, 3] as const;
/** The PNG's scale when none is asked for: 2, as before sizes could be chosen (800 × 500 → 1600 × 1000 px). */
export const DEFAULT_PNG_SCALE = 2;
/** No PNG side over this many pixels (memory and time of one render). */
export const MAX_PNG_SIDE = 3200;

export type ChartSize = { width: number; height: number };
export type ChartImageFormat = "svg" | "png";
type ChartImageSize = ChartSize & { scale: number };

export const DEFAULT_CHART_SIZE: ChartSize = { width: CHART_WIDTH, height: CHART_HEIGHT };

export function defaultHeight(width: number): number {
  return Math.max(400, Math.round((width * CHART_HEIGHT) / CHART_WIDTH));
}

export function heightRange(width: number): { min: number; max: number } {
  return {
    min: Math.max(CHART_MIN_HEIGHT, Math.ceil(width * MIN_ASPECT)),
    max: Math.min(CHART_MAX_HEIGHT, Math.floor(width * MAX_ASPECT)),
  };
}

const wholeNumber = /^[1-9][0-9]{0,4}$/;
const widthMessage = `width must be a whole number of pixels from ${CHART_MIN_WIDTH} to ${CHART_MAX_WIDTH}.`;

const imageQuery = z.object({
  width: z
    .string()
    .regex(wholeNumber, widthMessage)
    .transform(Number)
    .pipe(z.number().min(CHART_MIN_WIDTH, widthMessage).max(CHART_MAX_WIDTH, widthMessage))
    .optional(),
  height: z
    .string()
    .regex(
      wholeNumber,
      `height must be a whole number of pixels from ${CHART_MIN_HEIGHT} to ${CHART_MAX_HEIGHT}, and from ${MIN_ASPECT} to ${MAX_ASPECT} times the width.`,
    )
    .transform(Number)
    .optional(),
  scale: z
    .string()
    .regex(/^[123]$/, "scale must be 1, 2 or 3.")
    .transform(Number)
    .optional(),
});

export type ImageSizeResult = { ok: true; size: ChartImageSize } | { ok: false; fieldErrors: Record<string, string[]> };

/** Reads width, height and scale from an image URL's search params (first value of each), or says what is wrong. */
export function parseChartImageSize(params: URLSearchParams, format: ChartImageFormat): ImageSizeResult {
  const raw = Object.fromEntries(
    ["width", "height", "scale"].flatMap((k) => (params.has(k) ? [[k, params.get(k) ?? ""]] : [])),
  );
  const parsed = imageQuery.safeParse(raw);
  if (!parsed.success) {
    const fieldErrors: Record<string, string[]> = {};
    for (const issue of parsed.error.issues) (fieldErrors[String(issue.path[0] ?? "query")] ??= []).push(issue.message);
    return { ok: false, fieldErrors };
  }
  const width = parsed.data.width ?? CHART_WIDTH;
  const range = heightRange(width);
  const height = parsed.data.height ?? defaultHeight(width);
  if (height < range.min || height > range.max) {
    return {
      ok: false,
      fieldErrors: { height: [`height must be from ${range.min} to ${range.max} pixels when width is ${width}.`] },
    };
  }
  if (format === "svg" && parsed.data.scale !== undefined) {
    return { ok: false, fieldErrors: { scale: ["scale applies to chart.png only; an SVG is sharp at any scale."] } };
  }
  const scale = format === "png" ? (parsed.data.scale ?? DEFAULT_PNG_SCALE) : 1;
  if (Math.max(width, height) * scale > MAX_PNG_SIDE) {
    return {
      ok: false,
      fieldErrors: {
        scale: [
          `A PNG side can be at most ${MAX_PNG_SIDE} pixels; ${width} × ${height} at scale ${scale} would be ${width * scale} × ${height * scale}. Use a smaller scale or width.`,
        ],
      },
    };
  }
  return { ok: true, size: { width, height, scale } };
}

/** The query string for an image of this size ("" for the defaults), in one fixed order. */
export function imageSizeQuery(
  format: ChartImageFormat,
  size: { width?: number; height?: number; scale?: number } = {},
): string {
  const q = new URLSearchParams();
  const width = size.width ?? CHART_WIDTH;
  if (width !== CHART_WIDTH) q.set("width", String(width));
  if (size.height !== undefined && size.height !== defaultHeight(width)) q.set("height", String(size.height));
  if (format === "png" && size.scale !== undefined && size.scale !== DEFAULT_PNG_SCALE)
    q.set("scale", String(size.scale));
  const s = q.toString();
  return s ? `?${s}` : "";
}
