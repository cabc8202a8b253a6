// Looks into the S3 stand-in's test bucket (integration tests set S3_BUCKET=sagline-test).
import { ListObjectsV2Command } from "@aws-sdk/client-s3";
import { env } from "@/server/env";
import { getObjectText, storageClient } from "@/server/storage";

export async function keysUnder(prefix: string): Promise<string[]> {
  const out = await storageClient().send(new ListObjectsV2Command({ Bucket: env().S3_BUCKET, Prefix: prefix }));
  return (out.Contents ?? []).map((o) => o.Key ?? "").filter(Boolean);
}

export { getObjectText };

/** The smallest byte strings that start like each picture format (enough for the magic-byte check). */
export const PNG_BYTES = new Uint8Array([
  0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 0x49, 0x48, 0x44, 0x52, 1, 2, 3, 4,
]);
export const JPEG_BYTES = new Uint8Array([0xff, 0xd8, 0xff, 0xe0, 0, 16, 0x4a, 0x46, 0x49, 0x46, 0, 1, 2, 3]);
