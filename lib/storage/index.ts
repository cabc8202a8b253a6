// Upload storage through the S3 API only (locally the s3rver stand-in; hosted, any S3-compatible bucket).
import { GetObjectCommand, HeadBucketCommand, PutObjectCommand, S3Client } from "@aws-sdk/client-s3";
import { env } from "@/lib/env";
import { AppError } from "@/lib/errors";

let client: S3Client | undefined;

export function storageClient(): S3Client {
  const e = env();
  client ??= new S3Client({
    endpoint: e.S3_ENDPOINT,
    region: e.S3_REGION,
    forcePathStyle: e.S3_FORCE_PATH_STYLE,
    credentials: { accessKeyId: e.S3_ACCESS_KEY_ID, secretAccessKey: e.S3_SECRET_ACCESS_KEY },
    maxAttempts: 2,
  });
  return client;
}

function unavailable(err: unknown): AppError {
  console.error("[storage]", err instanceof Error ? err.message : err);
  return new AppError("unavailable", "File storage is not reachable right now. Nothing was saved; please try again shortly.");
}

export async function putObject(key: string, body: string | Uint8Array, contentType: string): Promise<void> {
  try {
    await storageClient().send(new PutObjectCommand({ Bucket: env().S3_BUCKET, Key: key, Body: body, ContentType: contentType }));
  } catch (err) {
    throw unavailable(err);
  }
}

export async function getObjectText(key: string): Promise<string | null> {
  try {
    const out = await storageClient().send(new GetObjectCommand({ Bucket: env().S3_BUCKET, Key: key }));
    return (await out.Body?.transformToString("utf-8")) ?? null;
  } catch (err) {
    if (err && typeof err === "object" && "name" in err && (err as { name: string }).name === "NoSuchKey") return null;
    throw unavailable(err);
  }
}

export async function storageReachable(): Promise<boolean> {
  try {
    await storageClient().send(new HeadBucketCommand({ Bucket: env().S3_BUCKET }));
    return true;
  } catch {
    return false;
  }
}

/** Logs are stored under their content hash, so the same file is stored once. */
export function logKey(sha256: string): string {
  return `logs/${sha256.slice(0, 2)}/${sha256}.csv`;
}
