// Series styles: the Okabe–Ito colour-blind-safe palette (M. Okabe and K. Ito, "Color Universal Design",
// 2008), black left out so series stay visible in dark mode, each colour paired with a dash pattern and a
// marker shape, so colour is never the only cue.
export type MarkerShape = "circle" | "square" | "triangle" | "diamond" | "cross" | "triangle-down";

export type SeriesStyle = { color: string; dash: string | undefined; shape: MarkerShape; name: string };

const SERIES_STYLES: SeriesStyle[] = [
  { color: "#0072B2", dash: undefined, shape: "circle", name: "blue, solid, circles" },
  { color: "#E69F00", dash: "7 4", shape: "square", name: "orange, dashed, squares" },
  { color: "#009E73", dash: "2 3", shape: "triangle", name: "green, dotted, triangles" },
  { color: "#D55E00", dash: "9 3 2 3", shape: "diamond", name: "vermillion, dash-dot, diamonds" },
  { color: "#CC79A7", dash: "12 4", shape: "cross", name: "purple, long dashes, crosses" },
  { color: "#56B4E9", dash: "3 2 3 6", shape: "triangle-down", name: "sky blue, paired dashes, down-triangles" },
  { color: "#F0E442", dash: "1 4", shape: "circle", name: "yellow, sparse dots, circles" },
];

/** The palette's colours in order (marker ids name a colour by its place here). */
export const PALETTE_COLOURS: readonly string[] = SERIES_STYLES.map((s) => s.color);

export function seriesStyle(index: number): SeriesStyle {
  return SERIES_STYLES[index % SERIES_STYLES.length] as SeriesStyle;
}

/** Label check: packs that reach their label vs packs that fall short. */
export const MEETS_STYLE: SeriesStyle = { color: "#0072B2", dash: undefined, shape: "circle", name: "blue circles" };
export const SHORT_STYLE: SeriesStyle = {
  color: "#D55E00",
  dash: undefined,
  shape: "triangle-down",
  name: "vermillion down-triangles",
};
