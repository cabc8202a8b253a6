// Renders a chart as a standalone SVG string (pure): the same drawing serves the embed, the SVG
// download and the PNG (through resvg with the shipped Inter font). The licence and "Source: Sagline"
// are part of the drawing, so they travel with every copy. Series use the Okabe–Ito palette (Okabe &
// Ito, 2008) paired with dash patterns, never colour alone.
import type { ChartData } from "./chart-data";
import { CHART_HEIGHT, CHART_WIDTH } from "./chart-state";
import { ATTRIBUTION, DATA_LICENCE_SHORT } from "./licence";

const W = CHART_WIDTH;
const H = CHART_HEIGHT;
const INK = "#1b1f27";
const SOFT = "#4a5160";
const GRID = "#e2ded3";
const CHARGE = "#e08a12";
const CELL = "#146d63";
const PALETTE = ["#0072B2", "#D55E00", "#009E73", "#CC79A7", "#E69F00", "#56B4E9", "#000000", "#8c5206"];
const DASHES = ["", "6 3", "2 3", "8 3 2 3", "", "6 3", "2 3", "8 3 2 3"];
const FONT = "Inter, 'Inter Variable', system-ui, sans-serif";

export const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? "" : "s"}`;

export function escapeXml(text: string): string {
  return text.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;").replace(/'/g, "&apos;");
}

/** Greedy word wrap by an estimated character width (Inter ≈ 0.53 em per character). */
export function wrapText(text: string, maxWidthPx: number, fontSizePx: number, maxLines: number): string[] {
  const perLine = Math.max(10, Math.floor(maxWidthPx / (fontSizePx * 0.53)));
  const lines: string[] = [];
  let line = "";
  for (const word of text.split(/\s+/).filter(Boolean)) {
    if ((line ? `${line} ${word}` : word).length > perLine && line) {
      lines.push(line);
      line = word;
    } else line = line ? `${line} ${word}` : word;
  }
  if (line) lines.push(line);
  if (lines.length > maxLines) {
    const kept = lines.slice(0, maxLines);
    kept[maxLines - 1] = `${(kept[maxLines - 1] ?? "").slice(0, perLine - 1)}…`;
    return kept;
  }
  return lines;
}

/** "Nice" ticks covering [0, max]. */
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

const text = (x: number, y: number, s: string, attrs = "") => `<text x="${x.toFixed(1)}" y="${y.toFixed(1)}" ${attrs}>${escapeXml(s)}</text>`;
const fmtTick = (v: number) => (Math.abs(v) >= 100 ? v.toFixed(0) : Number(v.toFixed(2)).toString());

type Box = { left: number; top: number; right: number; bottom: number };
type Scale = (v: number) => number;
const linear = (d0: number, d1: number, r0: number, r1: number): Scale => (v) => r0 + ((v - d0) / (d1 - d0 || 1)) * (r1 - r0);

function axes(box: Box, xTicks: number[], yTicks: number[], x: Scale, y: Scale, xLabel: string, yLabel: string): string {
  const out: string[] = [];
  for (const t of yTicks) out.push(`<line x1="${box.left}" x2="${box.right}" y1="${y(t).toFixed(1)}" y2="${y(t).toFixed(1)}" stroke="${GRID}"/>`, text(box.left - 8, y(t) + 4, fmtTick(t), `text-anchor="end" font-size="12" fill="${SOFT}"`));
  for (const t of xTicks) out.push(`<line x1="${x(t).toFixed(1)}" x2="${x(t).toFixed(1)}" y1="${box.top}" y2="${box.bottom}" stroke="${GRID}"/>`, text(x(t), box.bottom + 18, fmtTick(t), `text-anchor="middle" font-size="12" fill="${SOFT}"`));
  out.push(`<line x1="${box.left}" x2="${box.right}" y1="${box.bottom}" y2="${box.bottom}" stroke="${INK}"/>`, `<line x1="${box.left}" x2="${box.left}" y1="${box.top}" y2="${box.bottom}" stroke="${INK}"/>`);
  out.push(text((box.left + box.right) / 2, box.bottom + 38, xLabel, `text-anchor="middle" font-size="13" fill="${INK}"`));
  out.push(text(0, 0, yLabel, `transform="translate(${box.left - 46} ${(box.top + box.bottom) / 2}) rotate(-90)" text-anchor="middle" font-size="13" fill="${INK}"`));
  return out.join("");
}

function labelCheck(data: ChartData, box: Box): string {
  const pts = data.labelCheck ?? [];
  const max = Math.max(10, ...pts.map((p) => Math.max(p.labelledC, p.measuredC))) * 1.05;
  const ticks = niceTicks(0, max);
  const top = ticks[ticks.length - 1] ?? max;
  const x = linear(0, top, box.left, box.right);
  const y = linear(0, top, box.bottom, box.top);
  const parity = `<line x1="${x(0)}" y1="${y(0)}" x2="${x(top).toFixed(1)}" y2="${y(top).toFixed(1)}" stroke="${CHARGE}" stroke-width="2" stroke-dasharray="7 4"/>`;
  const dots = pts.map((p) => `<circle cx="${x(p.labelledC).toFixed(1)}" cy="${y(p.measuredC).toFixed(1)}" r="5" fill="${CELL}" fill-opacity="0.8" stroke="#ffffff"><title>${escapeXml(`${p.label}: labelled ${p.labelledC}C, measured ${p.measuredC.toFixed(1)}C (median of ${p.n})`)}</title></circle>`);
  const legend = [
    `<circle cx="${box.left + 10}" cy="${box.top - 16}" r="5" fill="${CELL}"/>`, text(box.left + 20, box.top - 12, "Pack (median sag-limited C)", `font-size="12" fill="${INK}"`),
    `<line x1="${box.left + 210}" x2="${box.left + 236}" y1="${box.top - 16}" y2="${box.top - 16}" stroke="${CHARGE}" stroke-width="2" stroke-dasharray="7 4"/>`, text(box.left + 242, box.top - 12, "Parity: measured = labelled", `font-size="12" fill="${INK}"`),
  ];
  return axes(box, ticks, ticks, x, y, "Labelled continuous C", "Measured C (sag-limited)") + parity + dots.join("") + legend.join("");
}

function curves(data: ChartData, box: Box): string {
  const lines = data.curves ?? [];
  const all = lines.flatMap((l) => l.points);
  const maxX = Math.max(100, ...all.map((p) => p.capacityPercent));
  const vs = all.map((p) => p.voltagePerCellV);
  const minY = vs.length ? Math.floor(Math.min(...vs) * 10) / 10 : 3;
  const maxY = vs.length ? Math.ceil(Math.max(...vs) * 10) / 10 : 4.2;
  const xTicks = niceTicks(0, maxX);
  const yTicks = niceTicks(minY, maxY).filter((t) => t >= minY - 1e-9);
  const x = linear(0, xTicks[xTicks.length - 1] ?? maxX, box.left, box.right);
  const y = linear(yTicks[0] ?? minY, yTicks[yTicks.length - 1] ?? maxY, box.bottom, box.top);
  const paths = lines.map((l, i) => {
    const d = l.points.map((p, j) => `${j ? "L" : "M"}${x(p.capacityPercent).toFixed(1)} ${y(p.voltagePerCellV).toFixed(1)}`).join("");
    return `<path d="${d}" fill="none" stroke="${PALETTE[i % PALETTE.length]}" stroke-width="2" stroke-dasharray="${DASHES[i % DASHES.length]}"><title>${escapeXml(l.label)}</title></path>`;
  });
  const legend = lines.map((l, i) => {
    const col = i % 2;
    const row = Math.floor(i / 2);
    const lx = box.left + col * 340;
    const ly = box.bottom + 56 + row * 17;
    return `<line x1="${lx}" x2="${lx + 24}" y1="${ly - 4}" y2="${ly - 4}" stroke="${PALETTE[i % PALETTE.length]}" stroke-width="2" stroke-dasharray="${DASHES[i % DASHES.length]}"/>` + text(lx + 30, ly, l.label.slice(0, 44), `font-size="11" fill="${INK}"`);
  });
  return axes(box, xTicks, yTicks, x, y, "Capacity delivered (% of rated mAh)", "Voltage per cell under load (V)") + paths.join("") + legend.join("");
}

function ranking(data: ChartData, box: Box): string {
  const bars = data.ranking ?? [];
  const labelW = 170;
  const max = Math.max(1.1, ...bars.map((b) => b.labelRatio)) * 1.05;
  const ticks = niceTicks(0, max);
  const x = linear(0, ticks[ticks.length - 1] ?? max, box.left + labelW, box.right);
  const rowH = Math.min(34, (box.bottom - box.top) / Math.max(1, bars.length));
  const out: string[] = [];
  for (const t of ticks) out.push(`<line x1="${x(t).toFixed(1)}" x2="${x(t).toFixed(1)}" y1="${box.top}" y2="${box.bottom}" stroke="${GRID}"/>`, text(x(t), box.bottom + 18, fmtTick(t), `text-anchor="middle" font-size="12" fill="${SOFT}"`));
  bars.forEach((b, i) => {
    const yy = box.top + i * rowH;
    out.push(text(box.left + labelW - 8, yy + rowH / 2 + 4, b.label.slice(0, 24), `text-anchor="end" font-size="12" fill="${INK}"`));
    out.push(`<rect x="${x(0).toFixed(1)}" y="${(yy + 4).toFixed(1)}" width="${(x(b.labelRatio) - x(0)).toFixed(1)}" height="${(rowH - 8).toFixed(1)}" fill="${CELL}"><title>${escapeXml(`${b.label}: ${b.labelRatio.toFixed(2)} (${b.packCount} packs, ${b.resultCount} results)`)}</title></rect>`);
    out.push(text(x(b.labelRatio) + 6, yy + rowH / 2 + 4, `${b.labelRatio.toFixed(2)} · ${b.packCount} packs`, `font-size="11" fill="${SOFT}"`));
  });
  out.push(`<line x1="${x(1).toFixed(1)}" x2="${x(1).toFixed(1)}" y1="${box.top - 6}" y2="${box.bottom}" stroke="${CHARGE}" stroke-width="2" stroke-dasharray="7 4"/>`, text(x(1) - 4, box.top - 10, "label met (1.0)", `text-anchor="end" font-size="11" fill="${CHARGE}"`));
  out.push(text((x(0) + box.right) / 2, box.bottom + 38, "Median label ratio (measured C ÷ labelled C) of the maker's packs", `text-anchor="middle" font-size="13" fill="${INK}"`));
  return out.join("");
}

export function renderChartSvg(data: ChartData): string {
  const { state } = data;
  const title = wrapText(state.title, W - 40, 20, 2);
  const note = state.note ? wrapText(state.note, W - 40, 13, 2) : [];
  const top = 28 + title.length * 24 + note.length * 17 + 36;
  const legendRows = state.kind === "curves" ? Math.ceil((data.curves?.length ?? 0) / 2) : 0;
  const box: Box = { left: 80, top, right: W - 30, bottom: H - 110 - legendRows * 17 };
  const empty = data.counts.results === 0;
  const body = empty
    ? text(W / 2, (box.top + box.bottom) / 2, "No approved results match this chart yet.", `text-anchor="middle" font-size="15" fill="${SOFT}"`)
    : state.kind === "label-check" ? labelCheck(data, box) : state.kind === "curves" ? curves(data, box) : ranking(data, box);
  const footer = [
    `Group: ${data.groupLabel} · ${plural(data.counts.packs, "pack")}, ${plural(data.counts.results, "approved result")}. ${data.leftOut.join(" ")}`,
    `Source: Sagline · Data: ${ATTRIBUTION}, licensed ${DATA_LICENCE_SHORT}`,
  ];
  const footLines = wrapText(footer[0] ?? "", W - 40, 11, 2);
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${W} ${H}" width="${W}" height="${H}" font-family="${FONT}" role="img" aria-labelledby="chart-title">`,
    `<title id="chart-title">${escapeXml(state.title)}</title>`,
    `<rect width="${W}" height="${H}" fill="#ffffff"/>`,
    ...title.map((l, i) => text(20, 34 + i * 24, l, `font-size="20" font-weight="700" fill="${INK}"`)),
    ...note.map((l, i) => text(20, 34 + title.length * 24 + i * 17, l, `font-size="13" fill="${SOFT}"`)),
    body,
    ...footLines.map((l, i) => text(20, H - 34 - (footLines.length - 1 - i) * 14, l, `font-size="11" fill="${SOFT}"`)),
    text(20, H - 14, footer[1] ?? "", `font-size="12" font-weight="700" fill="${INK}"`),
    `</svg>`,
  ].join("");
}
