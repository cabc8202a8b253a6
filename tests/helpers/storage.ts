// Looks into the S3 stand-in's test bucket (integration tests set S3_BUCKET=sagline-test).
import { ListObjectsV2Command } from "@aws-sdk/client-s3";
import sharp from "sharp";
import { env } from "@/server/env";
import { getObjectText, storageClient } from "@/server/storage";

export async function keysUnder(prefix: string): Promise<string[]> {
  const out = await storageClient().send(new ListObjectsV2Command({ Bucket: env().S3_BUCKET, Prefix: prefix }));
  return (out.Contents ?? []).map((o) => o.Key ?? "").filter(Boolean);
}

export { getObjectText };

const swatch = () => sharp({ create: { width: 8, height: 4, channels: 3, background: "#e08a12" } });

/** Small real pictures (uploads are decoded and encoded again, so a picture's first bytes alone do not pass). */
export const PNG_BYTES = new Uint8Array(await swatch().png().toBuffer());
export const JPEG_BYTES = new Uint8Array(await swatch().jpeg().toBuffer());

/** The text a camera would leave in a photo: who took it and where. Uploads must not keep any of it. */
export const EXIF_SECRETS = { artist: "Private Bench Owner 4711", gps: "GPSLatitude" } as const;
/** An 8×4 JPEG with EXIF (an artist, a GPS position) saying "rotate 90° to show upright" (orientation 6). */
export const JPEG_WITH_EXIF = new Uint8Array(
  await swatch()
    .jpeg()
    .withExif({
      IFD0: { Artist: EXIF_SECRETS.artist },
      IFD3: { GPSLatitudeRef: "N", GPSLatitude: "51/1 30/1 0/1" },
    })
    .withMetadata({ orientation: 6 })
    .toBuffer(),
);
