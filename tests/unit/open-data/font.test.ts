import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { woffToSfnt } from "@/server/open-data/font";

describe("WOFF 1.0 → sfnt (W3C WOFF File Format 1.0)", () => {
  it("unwraps the shipped Inter font into a TrueType file with the same tables", () => {
    const woff = readFileSync(
      path.join(process.cwd(), "node_modules/@fontsource/inter/files/inter-latin-400-normal.woff"),
    );
    const sfnt = woffToSfnt(woff);
    expect(sfnt.readUInt32BE(0)).toBe(woff.readUInt32BE(4)); // flavor
    const numTables = sfnt.readUInt16BE(4);
    expect(numTables).toBe(woff.readUInt16BE(12));
    const tags = Array.from({ length: numTables }, (_, i) => sfnt.toString("ascii", 12 + i * 16, 16 + i * 16));
    expect(tags).toEqual(expect.arrayContaining(["head", "name", "cmap"]));
    // The totalSfntSize header field states the size of the unwrapped font.
    expect(sfnt.length).toBe(woff.readUInt32BE(16));
  });
  it("refuses other files", () => {
    expect(() => woffToSfnt(Buffer.from("not a font at all, clearly not one"))).toThrow();
  });
});
