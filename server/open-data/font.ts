// The shipped font for server-rendered charts. resvg reads TrueType/OpenType only, and the Inter package
// ships WOFF 1.0, so we unwrap WOFF into a plain sfnt (W3C "WOFF File Format 1.0": each table is
// zlib-compressed unless compLength == origLength).
import { mkdirSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { inflateSync } from "node:zlib";

export function woffToSfnt(woff: Buffer): Buffer {
  if (woff.toString("ascii", 0, 4) !== "wOFF") throw new Error("not a WOFF 1.0 file");
  const flavor = woff.readUInt32BE(4);
  const numTables = woff.readUInt16BE(12);
  const tables: { tag: number; checksum: number; data: Buffer }[] = [];
  for (let i = 0; i < numTables; i++) {
    const at = 44 + i * 20;
    const offset = woff.readUInt32BE(at + 4);
    const compLength = woff.readUInt32BE(at + 8);
    const origLength = woff.readUInt32BE(at + 12);
    const raw = woff.subarray(offset, offset + compLength);
    tables.push({
      tag: woff.readUInt32BE(at),
      checksum: woff.readUInt32BE(at + 16),
      data: compLength === origLength ? raw : inflateSync(raw),
    });
  }
  let pow = 1;
  let log = 0;
  while (pow * 2 <= numTables) {
    pow *= 2;
    log++;
  }
  const headerLength = 12 + numTables * 16;
  const total = tables.reduce((n, t) => n + Math.ceil(t.data.length / 4) * 4, headerLength);
  const out = Buffer.alloc(total);
  out.writeUInt32BE(flavor, 0);
  out.writeUInt16BE(numTables, 4);
  out.writeUInt16BE(pow * 16, 6);
  out.writeUInt16BE(log, 8);
  out.writeUInt16BE(numTables * 16 - pow * 16, 10);
  let offset = headerLength;
  tables.forEach((t, i) => {
    const rec = 12 + i * 16;
    out.writeUInt32BE(t.tag, rec);
    out.writeUInt32BE(t.checksum, rec + 4);
    out.writeUInt32BE(offset, rec + 8);
    out.writeUInt32BE(t.data.length, rec + 12);
    t.data.copy(out, offset);
    offset += Math.ceil(t.data.length / 4) * 4;
  });
  return out;
}

let cached: string[] | null = null;

/** Inter 400 and 700 (latin) as sfnt files. resvg-js 2.6 takes font files, not buffers, so the unwrapped
 * fonts are written once per process into the temp directory. */
export function chartFontFiles(): string[] {
  if (!cached) {
    const dir = path.join(tmpdir(), "sagline-chart-fonts");
    mkdirSync(dir, { recursive: true });
    cached = ["400", "700"].map((w) => {
      const file = path.join(dir, `inter-latin-${w}.ttf`);
      writeFileSync(
        file,
        woffToSfnt(
          readFileSync(
            path.join(process.cwd(), "node_modules/@fontsource/inter/files", `inter-latin-${w}-normal.woff`),
          ),
        ),
      );
      return file;
    });
  }
  return cached;
}
