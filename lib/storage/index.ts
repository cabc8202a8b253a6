// Upload storage through the S3 API only (locally the s3rver stand-in; hosted, any S3-compatible bucket).
import { randomUUID } from "node:crypto";
import type { Readable } from "node:stream";
import {
  CopyObjectCommand, DeleteObjectCommand, GetObjectCommand, HeadBucketCommand, HeadObjectCommand, PutObjectCommand, S3Client,
} from "@aws-sdk/client-s3";
import { Upload } from "@aws-sdk/lib-storage";
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

export function unavailable(err: unknown): AppError {
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

function notFound(err: unknown): boolean {
  if (!err || typeof err !== "object") return false;
  const e = err as { name?: string; $metadata?: { httpStatusCode?: number } };
  return e.name === "NoSuchKey" || e.name === "NotFound" || e.$metadata?.httpStatusCode === 404;
}

/**
 * Streams a body of unknown length to storage in parts (multipart upload), never holding more than
 * a couple of parts in memory. `abort()` stops it and removes what was sent.
 */
export function startStreamUpload(key: string, body: Readable, contentType: string): { done: Promise<void>; abort: () => Promise<void> } {
  const upload = new Upload({
    client: storageClient(),
    params: { Bucket: env().S3_BUCKET, Key: key, Body: body, ContentType: contentType },
    queueSize: 2,
    partSize: 5 * 1024 * 1024,
    leavePartsOnError: false,
  });
  const done = upload.done().then(
    () => undefined,
    (err: unknown) => {
      throw unavailable(err);
    },
  );
  return { done, abort: () => upload.abort().catch(() => undefined) };
}

/** The stored object's size, or null when there is none. */
export async function objectBytes(key: string): Promise<number | null> {
  try {
    const out = await storageClient().send(new HeadObjectCommand({ Bucket: env().S3_BUCKET, Key: key }));
    return out.ContentLength ?? 0;
  } catch (err) {
    if (notFound(err)) return null;
    throw unavailable(err);
  }
}

/** The stored object as a stream of bytes, or null when there is none. */
export async function getObjectChunks(key: string): Promise<AsyncIterable<Uint8Array> | null> {
  try {
    const out = await storageClient().send(new GetObjectCommand({ Bucket: env().S3_BUCKET, Key: key }));
    return (out.Body as (Readable & AsyncIterable<Uint8Array>) | undefined) ?? null;
  } catch (err) {
    if (notFound(err)) return null;
    throw unavailable(err);
  }
}

export async function copyObject(fromKey: string, toKey: string): Promise<void> {
  try {
    await storageClient().send(new CopyObjectCommand({ Bucket: env().S3_BUCKET, CopySource: `${env().S3_BUCKET}/${fromKey}`, Key: toKey }));
  } catch (err) {
    throw unavailable(err);
  }
}

export async function deleteObject(key: string): Promise<void> {
  try {
    await storageClient().send(new DeleteObjectCommand({ Bucket: env().S3_BUCKET, Key: key }));
  } catch (err) {
    if (!notFound(err)) throw unavailable(err);
  }
}

// Uploads made while filling in the form land under the contributor's own prefix, so a submission can
// only use files its contributor uploaded. Abandoned drafts' files expire by a bucket lifecycle rule
// on the incoming/ prefix (hosted deployments; the local stand-in keeps them).
const UUID = "[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}";
export const PHOTO_EXTENSIONS = ["jpg", "png", "webp"] as const;
export type PhotoExtension = (typeof PHOTO_EXTENSIONS)[number];

export function incomingLogKey(userId: string): string {
  return `incoming/${userId}/${randomUUID()}.csv`;
}

export function isOwnIncomingLogKey(key: string, userId: string): boolean {
  return key.startsWith(`incoming/${userId}/`) && new RegExp(`^incoming/[^/]+/${UUID}\\.csv$`).test(key);
}

export function photoKey(userId: string, ext: PhotoExtension): string {
  return `photos/${userId}/${randomUUID()}.${ext}`;
}

export function isOwnPhotoKey(key: string, userId: string): boolean {
  return key.startsWith(`photos/${userId}/`) && new RegExp(`^photos/[^/]+/${UUID}\\.(${PHOTO_EXTENSIONS.join("|")})$`).test(key);
}
