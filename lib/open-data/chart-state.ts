// A chart's full state travels in its URL (base64url JSON), so a published chart never changes when
// defaults change later. Version 1 of the state; a new version gets a new literal and its own reader.
import { z } from "zod";

export const CHART_KINDS = ["label-check", "curves", "maker-ranking"] as const;
export type ChartKind = (typeof CHART_KINDS)[number];
export const CHART_KIND_LABELS: Record<ChartKind, string> = {
  "label-check": "Label check (labelled C against measured C)",
  curves: "Discharge curves overlay",
  "maker-ranking": "Maker ranking (median label ratio)",
};

export const chartState = z.object({
  v: z.literal(1),
  kind: z.enum(CHART_KINDS),
  group: z.string().regex(/^[a-z0-9._-]{1,160}$/, "Choose a like-for-like group."),
  maker: z.string().regex(/^[a-z0-9-]{1,80}$/).optional(),
  cells: z.number().int().min(1).max(14).optional(),
  title: z.string().trim().min(1, "Give the chart a title.").max(120),
  note: z.string().trim().max(400).optional(),
});
export type ChartState = z.infer<typeof chartState>;

export function encodeChartState(state: ChartState): string {
  return Buffer.from(JSON.stringify(chartState.parse(state)), "utf8").toString("base64url");
}

/** null when the text is not a valid encoded state. */
export function decodeChartState(encoded: string): ChartState | null {
  if (!/^[A-Za-z0-9_-]{1,4000}$/.test(encoded)) return null;
  try {
    const parsed = chartState.safeParse(JSON.parse(Buffer.from(encoded, "base64url").toString("utf8")));
    return parsed.success ? parsed.data : null;
  } catch {
    return null;
  }
}

/** Chart dimensions in CSS pixels. */
export const CHART_WIDTH = 800;
export const CHART_HEIGHT = 500;
