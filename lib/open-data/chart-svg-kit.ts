// The drawing primitives of the chart SVG (pure): escaping, text width estimates and wrapping, "nice"
// ticks, and the frame — font sizes and margins for one image size, so that text and markers stay
// legible from a 320-pixel phone column up to a 1600-pixel print image.
import type { ChartSize } from "./chart-size";

export const INK = "#1b1f27";
export const SOFT = "#4a5160";
export const GRID = "#e2ded3";
export const CHARGE = "#e08a12";
export const CELL = "#146d63";
export const FONT = "Inter, 'Inter Variable', system-ui, sans-serif";

/** Average advance of Inter, in em: regular ≈ 0.53, bold ≈ 0.58 (estimated from the shipped font). */
const EM_REGULAR = 0.53;
export const EM_BOLD = 0.58;

export const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? "" : "s"}`;

export function escapeXml(text: string): string {
  return text
    .replace(/&/g, "&amp;")
    .replace(/</g, "&lt;")
    .replace(/>/g, "&gt;")
    .replace(/"/g, "&quot;")
    .replace(/'/g, "&apos;");
}

export const textWidth = (s: string, fontSizePx: number, em = EM_REGULAR) => s.length * fontSizePx * em;

/** Cuts text to fit a width, marking the cut with an ellipsis. */
export function clip(s: string, maxWidthPx: number, fontSizePx: number, em = EM_REGULAR): string {
  const max = Math.max(4, Math.floor(maxWidthPx / (fontSizePx * em)));
  return s.length <= max ? s : `${s.slice(0, max - 1).trimEnd()}…`;
}

/** The first of the variants (longest first) that fits the width; the last one, clipped, otherwise. */
export function fitText(variants: string[], maxWidthPx: number, fontSizePx: number): string {
  const last = variants[variants.length - 1] ?? "";
  return variants.find((v) => textWidth(v, fontSizePx) <= maxWidthPx) ?? clip(last, maxWidthPx, fontSizePx);
}

/** Greedy word wrap by an estimated character width; the last kept line ends with "…" when text was cut. */
export function wrapText(
  text: string,
  maxWidthPx: number,
  fontSizePx: number,
  maxLines: number,
  em = EM_REGULAR,
): string[] {
  if (maxLines <= 0) return [];
  const perLine = Math.max(10, Math.floor(maxWidthPx / (fontSizePx * em)));
  const lines: string[] = [];
  let line = "";
  for (const word of text.split(/\s+/).filter(Boolean)) {
    if ((line ? `${line} ${word}` : word).length > perLine && line) {
      lines.push(line);
      line = word;
    } else line = line ? `${line} ${word}` : word;
  }
  if (line) lines.push(line);
  // A single word longer than a line is cut too.
  const fitted = lines.map((l) => (l.length > perLine ? `${l.slice(0, perLine - 1)}…` : l));
  if (fitted.length > maxLines) {
    const kept = fitted.slice(0, maxLines);
    kept[maxLines - 1] = `${(kept[maxLines - 1] ?? "").slice(0, perLine - 1)}…`;
    return kept;
  }
  return fitted;
}

/** "Nice" ticks covering [min, max]. */
export function niceTicks(min: number, max: number, count = 5): number[] {
  const span = Math.max(max - min, 1e-9);
  const raw = span / count;
  const mag = 10 ** Math.floor(Math.log10(raw));
  const step = ([1, 2, 2.5, 5, 10].find((s) => s * mag >= raw) ?? 10) * mag;
  const ticks: number[] = [];
  let v = Math.floor(min / step) * step;
  for (; v < max - step * 1e-6; v += step) ticks.push(Number(v.toFixed(10)));
  ticks.push(Number(v.toFixed(10))); // the last tick covers max
  return ticks;
}

export const text = (x: number, y: number, s: string, attrs = "") =>
  `<text x="${x.toFixed(1)}" y="${y.toFixed(1)}" ${attrs}>${escapeXml(s)}</text>`;
export const fmtTick = (v: number) => (Math.abs(v) >= 100 ? v.toFixed(0) : Number(v.toFixed(2)).toString());

export type Box = { left: number; top: number; right: number; bottom: number };
export type Scale = (v: number) => number;
export const linear =
  (d0: number, d1: number, r0: number, r1: number): Scale =>
  (v) =>
    r0 + ((v - d0) / (d1 - d0 || 1)) * (r1 - r0);

/** Sizes for one image: `k` scales type, strokes, markers and margins with the square root of the width
 * against the 800-pixel design, within 0.9–1.45, and no text is set under 10 px. */
export type Frame = {
  width: number;
  height: number;
  k: number;
  pad: number;
  narrow: boolean;
  font: (designPx: number) => number;
  px: (designPx: number) => number;
};

export function frameFor(size: ChartSize): Frame {
  const k = Math.min(1.45, Math.max(0.9, Math.sqrt(size.width / 800)));
  const round1 = (v: number) => Math.round(v * 10) / 10;
  return {
    width: size.width,
    height: size.height,
    k,
    pad: Math.round(Math.min(28, Math.max(12, size.width * 0.025))),
    narrow: size.width < 560,
    font: (designPx) => Math.max(designPx >= 16 ? 16 : 10, round1(designPx * k)),
    px: (designPx) => round1(designPx * k),
  };
}

/** Places items of the given widths left to right, wrapping into rows within `avail`. */
export function flow(widths: number[], avail: number): { x: number; row: number }[] {
  let x = 0;
  let row = 0;
  return widths.map((w) => {
    if (x > 0 && x + w > avail) {
      row++;
      x = 0;
    }
    const at = { x, row };
    x += w;
    return at;
  });
}
