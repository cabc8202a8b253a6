// Text measuring for the chart images' layout (pure): estimated widths of the shipped Inter font, wrapping,
// clipping and a flow of legend items into rows. The drawings themselves are in
// components/charts/draw/.

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
