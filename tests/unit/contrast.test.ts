// Contrast of the colours a reader must see (issue 15): the focus ring and links, in the light and the dark
// scheme, on every background of that scheme, and inside embeds. Relative luminance and contrast ratio as
// defined by WCAG 2.2 (W3C Recommendation, 2023, "relative luminance" and "contrast ratio" in its glossary);
// 3:1 for the focus ring and other non-text marks (success criteria 1.4.11 and 2.4.13), 4.5:1 for link text
// (1.4.3). The colours are read from tailwind.config.ts and the embed's own table, so a changed token is
// measured here.
import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { EMBED_COLOURS } from "@/components/charts/embed/embed-document";
import config from "@/tailwind.config";

type Palette = Record<string, Record<string, string> | string>;
const colours = (config.theme?.extend?.colors ?? {}) as Palette;
const token = (name: string): string => {
  const [group, shade = "DEFAULT"] = name.split("-");
  const g = colours[group ?? ""];
  const hex = typeof g === "string" ? g : g?.[shade];
  if (!hex) throw new Error(`no colour ${name} in tailwind.config.ts`);
  return hex;
};

function luminance(hex: string): number {
  const n = Number.parseInt(hex.replace("#", ""), 16);
  const [r, g, b] = [(n >> 16) & 255, (n >> 8) & 255, n & 255].map((c) => {
    const s = c / 255;
    return s <= 0.04045 ? s / 12.92 : ((s + 0.055) / 1.055) ** 2.4;
  }) as [number, number, number];
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}
export function contrast(a: string, b: string): number {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x) as [number, number];
  return (hi + 0.05) / (lo + 0.05);
}

const css = fs.readFileSync(path.join(process.cwd(), "app/globals.css"), "utf8");
const light = ["paper", "paper-raised", "paper-sunk"];
const dark = ["night", "night-raised", "night-sunk"];

describe("contrast (WCAG 2.2)", () => {
  it("computes WCAG's own reference points: black on white 21:1, a colour on itself 1:1", () => {
    expect(contrast("#000000", "#ffffff")).toBeCloseTo(21, 5);
    expect(contrast("#777777", "#777777")).toBe(1);
    // #767676 on white is the lightest grey that passes 4.5:1 (common practice, from memory: 4.54:1).
    expect(contrast("#767676", "#ffffff")).toBeCloseTo(4.54, 2);
  });

  it("the focus ring is at least 3:1 on every background of its scheme", () => {
    const rule = /:focus-visible \{\s*@apply ([^;]+);/.exec(css)?.[1] ?? "";
    const lightRing = /(?:^| )outline-((?:charge|cell|ink|paper|night)-\d+)/.exec(rule)?.[1];
    const darkRing = /dark:outline-([a-z]+-\d+)/.exec(rule)?.[1];
    expect(lightRing && darkRing, `focus rule: ${rule}`).toBeTruthy();
    for (const bg of light) expect(contrast(token(lightRing ?? ""), token(bg)), bg).toBeGreaterThanOrEqual(3);
    for (const bg of dark) expect(contrast(token(darkRing ?? ""), token(bg)), bg).toBeGreaterThanOrEqual(3);
  });

  it("links are at least 4.5:1 on every background of their scheme", () => {
    const rule = /\n  a \{\s*@apply ([^;]+);/.exec(css)?.[1] ?? "";
    const lightLink = /(?:^| )text-([a-z]+-\d+)/.exec(rule)?.[1];
    const darkLink = /dark:text-([a-z]+-\d+)/.exec(rule)?.[1];
    for (const bg of light) expect(contrast(token(lightLink ?? ""), token(bg)), bg).toBeGreaterThanOrEqual(4.5);
    for (const bg of dark) expect(contrast(token(darkLink ?? ""), token(bg)), bg).toBeGreaterThanOrEqual(4.5);
  });

  it("inside an embed: links 4.5:1 and the focus ring 3:1, light and dark", () => {
    for (const scheme of [EMBED_COLOURS.light, EMBED_COLOURS.dark]) {
      expect(contrast(scheme.link, scheme.background)).toBeGreaterThanOrEqual(4.5);
      expect(contrast(scheme.soft, scheme.background)).toBeGreaterThanOrEqual(4.5);
      expect(contrast(scheme.text, scheme.background)).toBeGreaterThanOrEqual(4.5);
      expect(contrast(scheme.focus, scheme.background)).toBeGreaterThanOrEqual(3);
    }
  });

  it("the compare picker's remove button (×) is at least 4.5:1 in both schemes", () => {
    const file = fs.readFileSync(
      path.join(process.cwd(), "app/(public)/compare/_components/compare-picker-client.tsx"),
      "utf8",
    );
    const dark = /dark:text-\[(#[0-9a-f]{6})\]/i.exec(file)?.[1] ?? "";
    expect(contrast(token("warn"), token("paper"))).toBeGreaterThanOrEqual(4.5);
    expect(contrast(dark, token("night-raised"))).toBeGreaterThanOrEqual(4.5);
  });
});
