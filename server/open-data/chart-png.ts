// PNG from the chart SVG, rendered on the server with resvg and the shipped Inter font (no system fonts,
// so every server draws the same picture). `scale` is device pixels per SVG pixel (the route allows 1–3).
import "server-only";
import { Resvg } from "@resvg/resvg-js";
import { DEFAULT_PNG_SCALE } from "@/lib/open-data/chart-size";
import { chartFontFiles } from "./font";

export function svgToPng(svg: string, scale = DEFAULT_PNG_SCALE): Buffer {
  const resvg = new Resvg(svg, {
    fitTo: { mode: "zoom", value: scale },
    font: { fontFiles: chartFontFiles(), loadSystemFonts: false, defaultFontFamily: "Inter" },
    background: "#ffffff",
  });
  return resvg.render().asPng();
}
