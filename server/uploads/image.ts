// Label photos: the file's first bytes decide what it is, never its name or the type the browser claims.
import type { PhotoExtension } from "@/lib/storage-keys";

const SIGNATURES: { ext: PhotoExtension; contentType: string; test: (b: Uint8Array) => boolean }[] = [
  // JPEG: SOI marker then another marker (JFIF, Exif, or a table).
  {
    ext: "jpg",
    contentType: "image/jpeg",
    test: (b) => b.length >= 4 && b[0] === 0xff && b[1] === 0xd8 && b[2] === 0xff,
  },
  // PNG: the eight-byte signature from the PNG specification.
  {
    ext: "png",
    contentType: "image/png",
    test: (b) => [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a].every((x, k) => b[k] === x),
  },
  // WebP: a RIFF container whose form type is WEBP.
  {
    ext: "webp",
    contentType: "image/webp",
    test: (b) =>
      b.length >= 12 &&
      String.fromCharCode(...b.subarray(0, 4)) === "RIFF" &&
      String.fromCharCode(...b.subarray(8, 12)) === "WEBP",
  },
];

export type DetectedImage = { ext: PhotoExtension; contentType: string };

export function detectImage(bytes: Uint8Array): DetectedImage | null {
  const hit = SIGNATURES.find((s) => s.test(bytes));
  return hit ? { ext: hit.ext, contentType: hit.contentType } : null;
}

/** Pictures larger than this many pixels are refused before decoding (a decompression bomb's defence). */
const MAX_PIXELS = 60_000_000;

/**
 * The picture as it is stored: decoded and encoded again in the same format by sharp (libvips), turned upright
 * from its EXIF orientation first. Nothing of the original's metadata survives — EXIF (with any GPS position
 * and camera serial), XMP, IPTC and comments are dropped, as sharp does unless asked to keep them. Null when
 * the bytes do not decode as the picture they claim to be.
 */
export async function cleanImage(bytes: Uint8Array, image: DetectedImage): Promise<Uint8Array | null> {
  const sharp = (await import("sharp")).default;
  try {
    const pipeline = sharp(bytes, { failOn: "error", limitInputPixels: MAX_PIXELS }).rotate();
    const out =
      image.ext === "jpg"
        ? pipeline.jpeg({ quality: 90, mozjpeg: true })
        : image.ext === "png"
          ? pipeline.png({ compressionLevel: 9 })
          : pipeline.webp({ quality: 90 });
    return new Uint8Array(await out.toBuffer());
  } catch {
    return null;
  }
}
