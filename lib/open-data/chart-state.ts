// A chart's full state travels in its URL (base64url JSON), so a published chart never changes when
// defaults change later. Version 1 of the state; a new version gets a new literal and its own reader.
import { z } from "zod";
import { parseUnitsParam, writeUnitsParam } from "../units";
import { GROUP_KEY_PATTERN, SLUG_PATTERN } from "@/lib/api-contract/params";

export const CHART_KINDS = ["label-check", "curves", "maker-ranking"] as const;
export type ChartKind = (typeof CHART_KINDS)[number];
export const CHART_KIND_LABELS: Record<ChartKind, string> = {
  "label-check": "Label check (labelled C against a rating)",
  curves: "Discharge curves overlay",
  "maker-ranking": "Maker ranking (median label ratio)",
};

/**
 * Which rating a label check or maker ranking uses: the sustained C measured from the runs, or the sag-limited
 * C estimate. Absent in states published before both existed: those meant the estimate, and still do.
 */
export const CHART_RATINGS = ["measured", "estimate"] as const;
export type ChartRating = (typeof CHART_RATINGS)[number];

export const chartState = z.object({
  v: z.literal(1),
  kind: z.enum(CHART_KINDS),
  group: z.string().regex(GROUP_KEY_PATTERN, "Choose a like-for-like group."),
  maker: z.string().regex(SLUG_PATTERN).optional(),
  cells: z.number().int().min(1).max(14).optional(),
  rating: z.enum(CHART_RATINGS).optional(),
  title: z.string().trim().min(1, "Give the chart a title.").max(120),
  note: z.string().trim().max(400).optional(),
  /** The reader's units (lib/units.ts), e.g. "pack": discharge curves of one pack size per pack instead of per cell. */
  units: z
    .string()
    .regex(/^[A-Za-z,]{1,20}$/, "Units are words like F, oz, pack.")
    .optional(),
});
export type ChartState = z.infer<typeof chartState>;

// Isomorphic base64url (the builder encodes in the browser, the server decodes).
function toBase64Url(text: string): string {
  let bin = "";
  for (const byte of new TextEncoder().encode(text)) bin += String.fromCharCode(byte);
  return btoa(bin).replace(/\+/g, "-").replace(/\//g, "_").replace(/=+$/, "");
}

function fromBase64Url(text: string): string {
  const bin = atob(text.replace(/-/g, "+").replace(/_/g, "/"));
  return new TextDecoder("utf-8", { fatal: true }).decode(Uint8Array.from(bin, (c) => c.charCodeAt(0)));
}

/** Keys in a fixed order, so one state always gives one URL. */
export function encodeChartState(state: ChartState): string {
  const s = chartState.parse(state);
  const ordered = {
    v: s.v,
    kind: s.kind,
    group: s.group,
    maker: s.maker,
    cells: s.cells,
    rating: s.rating,
    title: s.title,
    note: s.note || undefined,
    units: s.units ? writeUnitsParam(parseUnitsParam(s.units)) || undefined : undefined,
  };
  return toBase64Url(JSON.stringify(ordered));
}

/** null when the text is not a valid encoded state. */
export function decodeChartState(encoded: string): ChartState | null {
  if (!/^[A-Za-z0-9_-]{1,4000}$/.test(encoded)) return null;
  try {
    const parsed = chartState.safeParse(JSON.parse(fromBase64Url(encoded)));
    return parsed.success ? parsed.data : null;
  } catch {
    return null;
  }
}

/** Chart dimensions in CSS pixels. */
export const CHART_WIDTH = 800;
export const CHART_HEIGHT = 500;

/**
 * Permalinks and embeds carry the encoded state as path segments of at most STATE_SEGMENT characters:
 * their pages are stored per URL (ISR), one file or folder per segment, and a file name has a length
 * limit (255 bytes) that a long title and note would pass in one segment.
 */
export const STATE_SEGMENT = 120;

export function statePath(encoded: string): string {
  return (encoded.match(new RegExp(`.{1,${STATE_SEGMENT}}`, "g")) ?? [encoded]).join("/");
}

/** The encoded state from a page's catch-all segments; null when a segment is not base64url. */
export function stateFromSegments(segments: readonly string[]): string | null {
  if (segments.length === 0 || segments.length > 40 || segments.some((s) => !/^[A-Za-z0-9_-]+$/.test(s))) return null;
  return segments.join("");
}

/** The chart a permalink's or embed's path segments carry; null when they do not hold a valid state. */
export function decodeChartStateSegments(segments: readonly string[]): ChartState | null {
  const encoded = stateFromSegments(segments);
  return encoded === null ? null : decodeChartState(encoded);
}

/** Segments that are not the canonical split of their state (an old one-segment link): where to send them. */
export function canonicalStatePath(segments: readonly string[]): string | null {
  const encoded = stateFromSegments(segments);
  if (encoded === null) return null;
  const canonical = statePath(encoded);
  return canonical === segments.join("/") ? null : canonical;
}
