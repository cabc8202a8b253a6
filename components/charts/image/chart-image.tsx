// A chart as a standalone picture (the SVG and PNG downloads, the image snippet, Open Graph): the title,
// note and legend, the very drawing the page shows (components/charts/draw/), the group and what was left
// out, and the credit with the licence inside the picture, so they travel with every copy. Laid out at a
// design width of width ÷ k (k grows with the square root of the width, 0.92–1.45) and scaled by the viewBox,
// so type and markers stay legible from a 320-pixel phone column to a 1600-pixel print image.
import type { ChartData } from "@/lib/open-data/chart-data";
import type { ChartSize } from "@/lib/open-data/chart-size";
import { EM_BOLD, plural, textWidth, wrapText, flow, clip } from "@/lib/open-data/chart-svg-kit";
import { ATTRIBUTION, DATA_LICENCE_LABEL } from "@/lib/open-data/licence";
import type { LegendItem } from "../chart-figure";
import { GUTTER, Shape, px } from "../draw/kit";
import { LabelCheckPlot } from "../draw/label-check-plot";
import { LinePlot } from "../draw/line-plot";
import { RankingPlot } from "../draw/ranking-plot";
import { curveSeries, curvesAxes, labelCheckLegendItems, lineLegendItems } from "../legends";

const INK = "#1b1f27";
const SOFT = "#4a5160";
const FONT = "Inter, 'Inter Variable', system-ui, sans-serif";

const imageScale = (width: number) => Math.min(1.45, Math.max(0.92, Math.sqrt(width / 800)));

function legendFor(data: ChartData): LegendItem[] {
  if (data.state.kind === "label-check") return labelCheckLegendItems(data.rating);
  if (data.state.kind === "curves") return lineLegendItems(curveSeries(data.curves ?? []));
  return [];
}

function Legend({ items, x, y, width }: { items: LegendItem[]; x: number; y: number; width: number }) {
  const fs = 12;
  const widths = items.map((it) => 26 + 6 + textWidth(it.label, fs) + 18);
  const at = flow(widths, width);
  return (
    <g>
      {items.map((it, i) => {
        const p = at[i] ?? { x: 0, row: 0 };
        const lx = x + p.x;
        const ly = y + p.row * fs * 1.5;
        return (
          <g key={it.label}>
            {it.line ? (
              <line
                x1={px(lx)}
                x2={px(lx + 26)}
                y1={px(ly - 4)}
                y2={px(ly - 4)}
                stroke={it.color}
                strokeWidth={2}
                strokeDasharray={it.dash}
              />
            ) : null}
            {it.shape ? (
              <Shape
                shape={it.shape}
                transform={`translate(${px(lx + 13)} ${px(ly - 4)})`}
                fill={it.filled !== false && it.shape !== "cross" ? it.color : "none"}
                stroke={it.color}
                strokeWidth={1.5}
              />
            ) : null}
            <text x={px(lx + 32)} y={px(ly)} fontSize={fs} fill={INK}>
              {clip(it.label, width - 32, fs)}
            </text>
          </g>
        );
      })}
    </g>
  );
}

const legendRows = (items: LegendItem[], width: number) =>
  items.length === 0
    ? 0
    : Math.max(
        ...flow(
          items.map((it) => 26 + 6 + textWidth(it.label, 12) + 18),
          width,
        ).map((p) => p.row + 1),
      );

function Plot({ data, box }: { data: ChartData; box: { x: number; y: number; width: number; height: number } }) {
  const ticks = box.width < 500 ? 4 : 6;
  if (data.state.kind === "label-check")
    return (
      <LabelCheckPlot prefix="img" points={data.labelCheck ?? []} rating={data.rating} tickCount={ticks} {...box} />
    );
  if (data.state.kind === "maker-ranking")
    return (
      <RankingPlot
        bars={data.ranking ?? []}
        rating={data.rating}
        tickCount={ticks}
        compact={box.width < 500}
        {...box}
      />
    );
  const axes = curvesAxes(box.width, data.curvesPerPack);
  return (
    <LinePlot
      prefix="img"
      series={curveSeries(data.curves ?? [])}
      xDigits={0}
      yDigits={2}
      tickCount={ticks}
      {...axes}
      {...box}
    />
  );
}

export function ChartImage({
  data,
  size,
  titleId = "chart-title",
}: {
  data: ChartData;
  size: ChartSize;
  titleId?: string;
}) {
  const k = imageScale(size.width);
  const W = Math.round((size.width / k) * 10) / 10;
  const H = Math.round((size.height / k) * 10) / 10;
  const pad = Math.round(Math.min(28, Math.max(12, W * 0.025)));
  const lineW = W - 2 * pad;
  const narrow = W < 560;
  const dataCredit = `Data: ${ATTRIBUTION}, licensed ${DATA_LICENCE_LABEL}`;
  const oneLine = `Source: Sagline · ${dataCredit}`;
  const credit =
    textWidth(oneLine, 12, EM_BOLD) <= lineW
      ? [oneLine]
      : ["Source: Sagline", ...wrapText(dataCredit, lineW, 12, 2, EM_BOLD)];
  const footText = `Group: ${data.groupLabel} · ${plural(data.counts.packs, "pack")}, ${plural(data.counts.results, "approved result")}. ${data.leftOut.join(" ")}`;
  const creditY = (i: number) => H - pad * 0.7 - (credit.length - 1 - i) * 15;
  const empty = data.counts.results === 0;
  let legend = empty ? [] : legendFor(data);
  // The header gives up note lines, then title lines, then the footer its lines, before the plot gets too low
  // to read; a legend goes last, and only where a chart can be read without it.
  const minPlot = Math.max(170, H * 0.45);
  let [titleMax, noteMax, footMax] = narrow ? [3, 3, 3] : [2, 2, 2];
  let title: string[] = [];
  let note: string[] = [];
  let foot: string[] = [];
  let plotTop = 0;
  let footerTop = 0;
  for (;;) {
    title = wrapText(data.state.title, lineW, 20, titleMax, EM_BOLD);
    note = data.state.note ? wrapText(data.state.note, lineW, 13, noteMax) : [];
    foot = wrapText(footText, lineW, 11, footMax);
    const rows = legendRows(legend, lineW);
    plotTop = pad + title.length * 24 + note.length * 17.5 + 10 + (rows ? rows * 18 + 8 : 0);
    footerTop = creditY(0) - 14.4 - (foot.length - 1) * 14.3 - 21;
    if (footerTop - plotTop >= minPlot) break;
    if (note.length > 0) noteMax = note.length - 1;
    else if (title.length > 1) titleMax = title.length - 1;
    else if (foot.length > 1) footMax = foot.length - 1;
    else if (legend.length > 0 && data.state.kind === "label-check") legend = [];
    else break;
  }
  const footY = (i: number) => creditY(0) - 14.4 - (foot.length - 1 - i) * 14.3;
  const rows = legendRows(legend, lineW);
  const legendTop = pad + title.length * 24 + note.length * 17.5 + 10;
  const box = { x: pad + GUTTER, y: plotTop, width: lineW - GUTTER, height: footerTop - plotTop };
  const emptyLines = wrapText("No approved results match this chart yet.", lineW, 15, 3);
  return (
    <svg
      xmlns="http://www.w3.org/2000/svg"
      viewBox={`0 0 ${W} ${H}`}
      width={size.width}
      height={size.height}
      fontFamily={FONT}
      color={INK}
      role="img"
      aria-labelledby={titleId}
    >
      <title id={titleId}>{data.state.title}</title>
      <rect width="100%" height="100%" fill="#ffffff" />
      {title.map((l, i) => (
        <text key={`t${i}`} x={pad} y={px(pad + 19 + i * 24)} fontSize={20} fontWeight={700} fill={INK}>
          {l}
        </text>
      ))}
      {note.map((l, i) => (
        <text key={`n${i}`} x={pad} y={px(pad + title.length * 24 + 13.6 + i * 17.5)} fontSize={13} fill={SOFT}>
          {l}
        </text>
      ))}
      {rows ? <Legend items={legend} x={pad} y={legendTop + 12} width={lineW} /> : null}
      {empty ? (
        emptyLines.map((l, i) => (
          <text
            key={`e${i}`}
            x={px(W / 2)}
            y={px(box.y + box.height / 2 + (i - (emptyLines.length - 1) / 2) * 19.5)}
            textAnchor="middle"
            fontSize={15}
            fill={SOFT}
          >
            {l}
          </text>
        ))
      ) : (
        <Plot data={data} box={box} />
      )}
      {foot.map((l, i) => (
        <text key={`f${i}`} x={pad} y={px(footY(i))} fontSize={11} fill={SOFT}>
          {l}
        </text>
      ))}
      {credit.map((l, i) => (
        <text key={`c${i}`} x={pad} y={px(creditY(i))} fontSize={12} fontWeight={700} fill={INK}>
          {l}
        </text>
      ))}
    </svg>
  );
}
