// Renders a chart as a standalone SVG string (pure): the same drawing serves the embed, the SVG
// download and the PNG (through resvg with the shipped Inter font). The licence and "Source: Sagline"
// are part of the drawing, so they travel with every copy. Series use the Okabe–Ito palette (Okabe &
// Ito, 2008) paired with dash patterns, never colour alone. The layout is computed for the asked size
// (chart-svg-kit.ts#frameFor): narrow images get wrapped titles, stacked legends and shorter axis titles
// rather than shrunken text.
import { CHART_RATING_WORDS, type ChartData } from "./chart-data";
import { DEFAULT_CHART_SIZE, type ChartSize } from "./chart-size";
import {
  CELL,
  CHARGE,
  EM_BOLD,
  FONT,
  GRID,
  INK,
  SOFT,
  clip,
  escapeXml,
  fitText,
  flow,
  fmtTick,
  frameFor,
  linear,
  niceTicks,
  plural,
  text,
  textWidth,
  wrapText,
  type Box,
  type Frame,
  type Scale,
} from "./chart-svg-kit";
import { ATTRIBUTION, DATA_LICENCE_LABEL } from "./licence";

export { escapeXml, niceTicks, wrapText } from "./chart-svg-kit";

const PALETTE = ["#0072B2", "#D55E00", "#009E73", "#CC79A7", "#E69F00", "#56B4E9", "#000000", "#8c5206"];
const DASHES = ["", "6 3", "2 3", "8 3 2 3", "", "6 3", "2 3", "8 3 2 3"];

type Reserve = { above: number; below: number; left: number; right: number };
type Kind = { reserve: Reserve; draw: (box: Box) => string };

const tickFs = (f: Frame) => f.font(12);
const axisFs = (f: Frame) => f.font(13);
/** Space under a plot for its tick labels and axis title. */
const belowAxis = (f: Frame) => f.px(6) + tickFs(f) + f.px(10) + axisFs(f) + f.px(6);
/** Space left of a plot for its tick labels and the rotated axis title. */
const leftAxis = (f: Frame, ticks: number[]) =>
  f.pad * 0.4 + axisFs(f) + f.px(6) + Math.max(...ticks.map((t) => textWidth(fmtTick(t), tickFs(f)))) + f.px(8);

function axes(
  f: Frame,
  box: Box,
  ticks: { x: number[]; y: number[] },
  x: Scale,
  y: Scale,
  xLabels: string[],
  yLabels: string[],
): string {
  const tf = tickFs(f);
  const lf = axisFs(f);
  const out: string[] = [];
  for (const t of ticks.y)
    out.push(
      `<line x1="${box.left.toFixed(1)}" x2="${box.right.toFixed(1)}" y1="${y(t).toFixed(1)}" y2="${y(t).toFixed(1)}" stroke="${GRID}"/>`,
      text(box.left - f.px(8), y(t) + tf / 3, fmtTick(t), `text-anchor="end" font-size="${tf}" fill="${SOFT}"`),
    );
  for (const t of ticks.x)
    out.push(
      `<line x1="${x(t).toFixed(1)}" x2="${x(t).toFixed(1)}" y1="${box.top.toFixed(1)}" y2="${box.bottom.toFixed(1)}" stroke="${GRID}"/>`,
      text(x(t), box.bottom + f.px(6) + tf, fmtTick(t), `text-anchor="middle" font-size="${tf}" fill="${SOFT}"`),
    );
  out.push(
    `<line x1="${box.left.toFixed(1)}" x2="${box.right.toFixed(1)}" y1="${box.bottom.toFixed(1)}" y2="${box.bottom.toFixed(1)}" stroke="${INK}"/>`,
    `<line x1="${box.left.toFixed(1)}" x2="${box.left.toFixed(1)}" y1="${box.top.toFixed(1)}" y2="${box.bottom.toFixed(1)}" stroke="${INK}"/>`,
  );
  out.push(
    text(
      (box.left + box.right) / 2,
      box.bottom + f.px(6) + tf + f.px(10) + lf * 0.8,
      fitText(xLabels, box.right - box.left, lf),
      `text-anchor="middle" font-size="${lf}" fill="${INK}"`,
    ),
  );
  const yLabelX = f.pad * 0.4 + lf * 0.8;
  out.push(
    text(
      0,
      0,
      fitText(yLabels, box.bottom - box.top, lf),
      `transform="translate(${yLabelX.toFixed(1)} ${((box.top + box.bottom) / 2).toFixed(1)}) rotate(-90)" text-anchor="middle" font-size="${lf}" fill="${INK}"`,
    ),
  );
  return out.join("");
}

/** A legend entry: a swatch (marker or line) and its words, laid out in rows by `flow`. */
function legendItems(
  f: Frame,
  x0: number,
  y0: number,
  avail: number,
  items: { swatch: (x: number, y: number) => string; label: string }[],
): { svg: string; rows: number } {
  const fs = f.font(12);
  const sw = f.px(26);
  const widths = items.map((it) => sw + f.px(6) + textWidth(it.label, fs) + f.px(22));
  const at = flow(widths, avail);
  const rowH = fs * 1.5;
  const svg = items.map((it, i) => {
    const p = at[i] ?? { x: 0, row: 0 };
    const x = x0 + p.x;
    const y = y0 + p.row * rowH;
    return (
      it.swatch(x, y - fs * 0.35) +
      text(x + sw + f.px(6), y, clip(it.label, avail - sw - f.px(6), fs), `font-size="${fs}" fill="${INK}"`)
    );
  });
  return { svg: svg.join(""), rows: Math.max(1, ...at.map((p) => p.row + 1)) };
}

function labelCheck(data: ChartData, f: Frame): Kind {
  const pts = data.labelCheck ?? [];
  const words = CHART_RATING_WORDS[data.rating];
  const max = Math.max(10, ...pts.map((p) => Math.max(p.labelledC, p.measuredC))) * 1.05;
  const ticks = niceTicks(0, max, f.narrow ? 4 : 5);
  const top = ticks[ticks.length - 1] ?? max;
  const left = leftAxis(f, ticks);
  const avail = f.width - f.pad - left;
  const r = Math.max(3.5, f.px(5));
  const items = [
    {
      swatch: (x: number, y: number) =>
        `<circle cx="${(x + f.px(10)).toFixed(1)}" cy="${y.toFixed(1)}" r="${r}" fill="${CELL}"/>`,
      label: words.legend,
    },
    {
      swatch: (x: number, y: number) =>
        `<line x1="${x.toFixed(1)}" x2="${(x + f.px(26)).toFixed(1)}" y1="${y.toFixed(1)}" y2="${y.toFixed(1)}" stroke="${CHARGE}" stroke-width="${f.px(2)}" stroke-dasharray="7 4"/>`,
      label: words.parity,
    },
  ];
  const rows = legendItems(f, 0, 0, avail, items).rows;
  const rowH = f.font(12) * 1.5;
  return {
    reserve: { above: rows * rowH + f.px(8), below: belowAxis(f), left, right: Math.max(f.pad, f.px(24)) },
    draw: (box) => {
      const x = linear(0, top, box.left, box.right);
      const y = linear(0, top, box.bottom, box.top);
      const parity = `<line x1="${x(0).toFixed(1)}" y1="${y(0).toFixed(1)}" x2="${x(top).toFixed(1)}" y2="${y(top).toFixed(1)}" stroke="${CHARGE}" stroke-width="${f.px(2)}" stroke-dasharray="7 4"/>`;
      const dots = pts.map(
        (p) =>
          `<circle cx="${x(p.labelledC).toFixed(1)}" cy="${y(p.measuredC).toFixed(1)}" r="${r}" fill="${CELL}" fill-opacity="0.8" stroke="#ffffff"><title>${escapeXml(`${p.label}: labelled ${p.labelledC}C, ${words.point} ${p.measuredC.toFixed(1)}C (of ${p.n})`)}</title></circle>`,
      );
      const legend = legendItems(
        f,
        box.left,
        box.top - f.px(8) - (rows - 1) * rowH - f.font(12) * 0.25,
        avail,
        items,
      ).svg;
      return (
        axes(f, box, { x: ticks, y: ticks }, x, y, ["Labelled continuous C", "Labelled C"], words.axis) +
        parity +
        dots.join("") +
        legend
      );
    },
  };
}

function curves(data: ChartData, f: Frame): Kind {
  const lines = data.curves ?? [];
  const all = lines.flatMap((l) => l.points);
  const maxX = Math.max(100, ...all.map((p) => p.capacityPercent));
  const vs = all.map((p) => p.voltagePerCellV);
  const minY = vs.length ? Math.floor(Math.min(...vs) * 10) / 10 : 3;
  const maxY = vs.length ? Math.ceil(Math.max(...vs) * 10) / 10 : 4.2;
  const count = f.narrow ? 4 : 5;
  const xTicks = niceTicks(0, maxX, count);
  const yTicks = niceTicks(minY, maxY, count).filter((t) => t >= minY - 1e-9);
  const left = leftAxis(f, yTicks);
  const fs = f.font(11);
  const rowH = fs * 1.55;
  const x0 = f.narrow ? f.pad : left;
  const avail = f.width - f.pad - x0;
  const needed = f.px(24) + f.px(20) + Math.max(0, ...lines.map((l) => textWidth(l.label, fs)));
  // As many columns (up to 3) as the longest label allows, or more (labels clipped) when the rows would
  // take over a quarter of the height.
  const byWidth = Math.floor(avail / Math.max(needed, f.px(160)));
  const maxRows = Math.max(1, Math.floor((f.height * 0.25) / rowH));
  const cols = Math.min(3, Math.max(1, byWidth, Math.ceil(lines.length / maxRows)));
  const colW = avail / cols;
  const legendRows = Math.ceil(lines.length / cols);
  return {
    reserve: {
      above: f.px(12),
      below: belowAxis(f) + (legendRows ? f.px(8) + legendRows * rowH : 0),
      left,
      right: Math.max(f.pad, f.px(24)),
    },
    draw: (box) => {
      const x = linear(0, xTicks[xTicks.length - 1] ?? maxX, box.left, box.right);
      const y = linear(yTicks[0] ?? minY, yTicks[yTicks.length - 1] ?? maxY, box.bottom, box.top);
      const sw = f.px(2);
      const paths = lines.map((l, i) => {
        const d = l.points
          .map((p, j) => `${j ? "L" : "M"}${x(p.capacityPercent).toFixed(1)} ${y(p.voltagePerCellV).toFixed(1)}`)
          .join("");
        return `<path d="${d}" fill="none" stroke="${PALETTE[i % PALETTE.length]}" stroke-width="${sw}" stroke-dasharray="${DASHES[i % DASHES.length]}"><title>${escapeXml(l.label)}</title></path>`;
      });
      const legendTop = box.bottom + belowAxis(f) + f.px(8);
      const legend = lines.map((l, i) => {
        const lx = x0 + (i % cols) * colW;
        const ly = legendTop + Math.floor(i / cols) * rowH + fs;
        const swatch = f.px(24);
        return (
          `<line x1="${lx.toFixed(1)}" x2="${(lx + swatch).toFixed(1)}" y1="${(ly - fs * 0.35).toFixed(1)}" y2="${(ly - fs * 0.35).toFixed(1)}" stroke="${PALETTE[i % PALETTE.length]}" stroke-width="${sw}" stroke-dasharray="${DASHES[i % DASHES.length]}"/>` +
          text(
            lx + swatch + f.px(6),
            ly,
            clip(l.label, colW - swatch - f.px(14), fs),
            `font-size="${fs}" fill="${INK}"`,
          )
        );
      });
      return (
        axes(
          f,
          box,
          { x: xTicks, y: yTicks },
          x,
          y,
          ["Capacity delivered (% of rated mAh)", "Capacity (% of rated mAh)", "Capacity (%)"],
          ["Voltage per cell under load (V)", "Voltage per cell (V)", "V per cell"],
        ) +
        paths.join("") +
        legend.join("")
      );
    },
  };
}

function ranking(data: ChartData, f: Frame): Kind {
  const bars = data.ranking ?? [];
  const tf = tickFs(f);
  const lf = axisFs(f);
  const fs = f.font(12);
  const vf = f.font(11);
  const max = Math.max(1.1, ...bars.map((b) => b.labelRatio)) * 1.05;
  const ticks = niceTicks(0, max, f.narrow ? 4 : 5);
  const value = (b: (typeof bars)[number]) =>
    f.narrow ? b.labelRatio.toFixed(2) : `${b.labelRatio.toFixed(2)} · ${b.packCount} packs`;
  return {
    reserve: { above: vf + f.px(12), below: f.px(6) + tf + f.px(10) + lf + f.px(6), left: f.pad, right: f.pad },
    draw: (box) => {
      const labelW = Math.min(f.px(190), (box.right - box.left) * 0.4);
      const valueW = Math.max(0, ...bars.map((b) => textWidth(value(b), vf))) + f.px(8);
      const x = linear(0, ticks[ticks.length - 1] ?? max, box.left + labelW, box.right - valueW);
      const rowH = Math.min(f.px(34), (box.bottom - box.top) / Math.max(1, bars.length));
      const out: string[] = [];
      for (const t of ticks)
        out.push(
          `<line x1="${x(t).toFixed(1)}" x2="${x(t).toFixed(1)}" y1="${box.top.toFixed(1)}" y2="${box.bottom.toFixed(1)}" stroke="${GRID}"/>`,
          text(x(t), box.bottom + f.px(6) + tf, fmtTick(t), `text-anchor="middle" font-size="${tf}" fill="${SOFT}"`),
        );
      bars.forEach((b, i) => {
        const yy = box.top + i * rowH;
        const barH = Math.max(2, rowH - Math.max(2, rowH * 0.24));
        out.push(
          text(
            box.left + labelW - f.px(8),
            yy + rowH / 2 + fs / 3,
            clip(b.label, labelW - f.px(8), fs),
            `text-anchor="end" font-size="${fs}" fill="${INK}"`,
          ),
        );
        out.push(
          `<rect x="${x(0).toFixed(1)}" y="${(yy + (rowH - barH) / 2).toFixed(1)}" width="${(x(b.labelRatio) - x(0)).toFixed(1)}" height="${barH.toFixed(1)}" fill="${CELL}"><title>${escapeXml(`${b.label}: ${b.labelRatio.toFixed(2)} (${b.packCount} packs, ${b.resultCount} results)`)}</title></rect>`,
        );
        out.push(text(x(b.labelRatio) + f.px(6), yy + rowH / 2 + vf / 3, value(b), `font-size="${vf}" fill="${SOFT}"`));
      });
      const met = "label met (1.0)";
      const metLeft = x(1) - f.px(4) - textWidth(met, vf) >= f.pad;
      out.push(
        `<line x1="${x(1).toFixed(1)}" x2="${x(1).toFixed(1)}" y1="${(box.top - f.px(6)).toFixed(1)}" y2="${box.bottom.toFixed(1)}" stroke="${CHARGE}" stroke-width="${f.px(2)}" stroke-dasharray="7 4"/>`,
      );
      out.push(
        text(
          x(1) + (metLeft ? -f.px(4) : f.px(4)),
          box.top - f.px(10),
          met,
          `text-anchor="${metLeft ? "end" : "start"}" font-size="${vf}" fill="${CHARGE}"`,
        ),
      );
      const xLabels = CHART_RATING_WORDS[data.rating].ranking;
      // Centred under the bars when it fits there, else under the whole width.
      const plotW = box.right - valueW - x(0);
      const underBars = xLabels.find((l) => textWidth(l, lf) <= plotW);
      const [label, centre] = underBars
        ? [underBars, (x(0) + box.right - valueW) / 2]
        : [fitText(xLabels, box.right - box.left, lf), (box.left + box.right) / 2];
      out.push(
        text(
          centre,
          box.bottom + f.px(6) + tf + f.px(10) + lf * 0.8,
          label,
          `text-anchor="middle" font-size="${lf}" fill="${INK}"`,
        ),
      );
      return out.join("");
    },
  };
}

const KINDS = { "label-check": labelCheck, curves, "maker-ranking": ranking } as const;

/** `titleId` must be unique in the page when one page carries several drawings. */
export function renderChartSvg(data: ChartData, size: ChartSize = DEFAULT_CHART_SIZE, titleId = "chart-title"): string {
  const { state } = data;
  const f = frameFor(size);
  const { width: W, height: H, pad } = f;
  const lineW = W - 2 * pad;
  const [titleFs, noteFs, footFs, creditFs] = [f.font(20), f.font(13), f.font(11), f.font(12)];
  // The credit breaks between source and licence rather than inside "CC BY 4.0".
  const dataCredit = `Data: ${ATTRIBUTION}, licensed ${DATA_LICENCE_LABEL}`;
  const oneLine = `Source: Sagline · ${dataCredit}`;
  const credit =
    textWidth(oneLine, creditFs, EM_BOLD) <= lineW
      ? [oneLine]
      : ["Source: Sagline", ...wrapText(dataCredit, lineW, creditFs, 2, EM_BOLD)];
  const foot = wrapText(
    `Group: ${data.groupLabel} · ${plural(data.counts.packs, "pack")}, ${plural(data.counts.results, "approved result")}. ${data.leftOut.join(" ")}`,
    lineW,
    footFs,
    f.narrow ? 3 : 2,
  );
  const creditY = (i: number) => H - pad * 0.7 - (credit.length - 1 - i) * creditFs * 1.25;
  const footY = (i: number) => creditY(0) - creditFs * 1.2 - (foot.length - 1 - i) * footFs * 1.3;
  const footerTop = footY(0) - footFs - f.px(10);

  const empty = data.counts.results === 0;
  const kind = empty ? null : KINDS[state.kind](data, f);
  const reserve = kind?.reserve ?? { above: f.px(12), below: f.px(12), left: pad, right: pad };
  // The header gives up note lines, then title lines, before the plot gets too low to read.
  const minPlot = Math.max(f.px(90), H * 0.28);
  let [titleMax, noteMax] = f.narrow ? [3, 3] : [2, 2];
  let title: string[] = [];
  let note: string[] = [];
  let headerBottom = 0;
  for (;;) {
    title = wrapText(state.title, lineW, titleFs, titleMax, EM_BOLD);
    note = state.note ? wrapText(state.note, lineW, noteFs, noteMax) : [];
    headerBottom = pad + title.length * titleFs * 1.2 + note.length * noteFs * 1.35 + f.px(10);
    const plotH = footerTop - reserve.below - headerBottom - reserve.above;
    if (plotH >= minPlot) break;
    if (note.length > 0) noteMax = note.length - 1;
    else if (title.length > 2 || (title.length > 1 && (!f.narrow || plotH < f.px(60)))) titleMax = title.length - 1;
    else break;
  }
  const box: Box = {
    left: reserve.left,
    top: headerBottom + reserve.above,
    right: W - reserve.right,
    bottom: footerTop - reserve.below,
  };
  const emptyLines = wrapText("No approved results match this chart yet.", lineW, f.font(15), 3);
  const body = kind
    ? kind.draw(box)
    : emptyLines
        .map((l, i) =>
          text(
            W / 2,
            (box.top + box.bottom) / 2 + (i - (emptyLines.length - 1) / 2) * f.font(15) * 1.3,
            l,
            `text-anchor="middle" font-size="${f.font(15)}" fill="${SOFT}"`,
          ),
        )
        .join("");
  const titleTop = pad + titleFs * 0.95;
  const noteTop = pad + title.length * titleFs * 1.2 + noteFs * 1.05;
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${W} ${H}" width="${W}" height="${H}" font-family="${FONT}" role="img" aria-labelledby="${escapeXml(titleId)}">`,
    `<title id="${escapeXml(titleId)}">${escapeXml(state.title)}</title>`,
    `<rect width="${W}" height="${H}" fill="#ffffff"/>`,
    ...title.map((l, i) =>
      text(pad, titleTop + i * titleFs * 1.2, l, `font-size="${titleFs}" font-weight="700" fill="${INK}"`),
    ),
    ...note.map((l, i) => text(pad, noteTop + i * noteFs * 1.35, l, `font-size="${noteFs}" fill="${SOFT}"`)),
    body,
    ...foot.map((l, i) => text(pad, footY(i), l, `font-size="${footFs}" fill="${SOFT}"`)),
    ...credit.map((l, i) => text(pad, creditY(i), l, `font-size="${creditFs}" font-weight="700" fill="${INK}"`)),
    `</svg>`,
  ].join("");
}
