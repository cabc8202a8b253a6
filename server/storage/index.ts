// Upload storage through the S3 API only (locally the s3rver stand-in; hosted, any S3-compatible bucket).
import type { Readable } from "node:stream";
import {
  CopyObjectCommand,
  DeleteObjectCommand,
  GetObjectCommand,
  HeadObjectCommand,
  ListObjectsV2Command,
  PutObjectCommand,
  S3Client,
} from "@aws-sdk/client-s3";
import { Upload } from "@aws-sdk/lib-storage";
import { env } from "@/server/env";
import { AppError } from "@/lib/errors";

export * from "@/lib/storage-keys";

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
  return new AppError(
    "unavailable",
    "File storage is not reachable right now. Nothing was saved; please try again shortly.",
  );
}

export async function putObject(key: string, body: string | Uint8Array, contentType: string): Promise<void> {
  try {
    await storageClient().send(
      new PutObjectCommand({ Bucket: env().S3_BUCKET, Key: key, Body: body, ContentType: contentType }),
    );
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

function notFound(err: unknown): boolean {
  if (!err || typeof err !== "object") return false;
  const e = err as { name?: string; $metadata?: { httpStatusCode?: number } };
  return e.name === "NoSuchKey" || e.name === "NotFound" || e.$metadata?.httpStatusCode === 404;
}

/**
 * Streams a body of unknown length to storage in parts (multipart upload), never holding more than
 * a couple of parts in memory. `abort()` stops it and removes what was sent.
 */
export function startStreamUpload(
  key: string,
  body: Readable,
  contentType: string,
): { done: Promise<void>; abort: () => Promise<void> } {
  const upload = new Upload({
    client: storageClient(),
    params: { Bucket: env().S3_BUCKET, Key: key, Body: body, ContentType: contentType },
    queueSize: 2,
    partSize: 5 * 1024 * 1024,
    leavePartsOnError: false,
  });
  let aborted = false;
  const done = upload.done().then(
    () => undefined,
    (err: unknown) => {
      // An abort we asked for (a bad log) is not a storage fault worth logging.
      throw aborted ? new AppError("bad_request", "Upload stopped.") : unavailable(err);
    },
  );
  const abort = async () => {
    aborted = true;
    await upload.abort().catch(() => undefined);
  };
  return { done, abort };
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
    const body = out.Body as (Readable & AsyncIterable<Uint8Array>) | undefined;
    if (!body) return null;
    return (async function* () {
      try {
        for await (const chunk of body) yield chunk;
      } catch (err) {
        throw unavailable(err);
      }
    })();
  } catch (err) {
    if (notFound(err)) return null;
    throw unavailable(err);
  }
}

export async function copyObject(fromKey: string, toKey: string): Promise<void> {
  try {
    await storageClient().send(
      new CopyObjectCommand({ Bucket: env().S3_BUCKET, CopySource: `${env().S3_BUCKET}/${fromKey}`, Key: toKey }),
    );
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

export type StoredObject = { key: string; bytes: number; lastModified: Date };

/** Every object under a prefix, page by page (1,000 keys a request). */
export async function* listObjects(prefix: string): AsyncGenerator<StoredObject> {
  let token: string | undefined;
  do {
    let page;
    try {
      page = await storageClient().send(
        new ListObjectsV2Command({ Bucket: env().S3_BUCKET, Prefix: prefix, ContinuationToken: token }),
      );
    } catch (err) {
      throw unavailable(err);
    }
    for (const o of page.Contents ?? [])
      if (o.Key) yield { key: o.Key, bytes: o.Size ?? 0, lastModified: o.LastModified ?? new Date(0) };
    token = page.IsTruncated ? page.NextContinuationToken : undefined;
  } while (token);
}

// When a draft last used its file: S3 sets LastModified when the object is written (a copy onto itself
// counts), but some S3-compatible stores (the local stand-in among them) keep it on such a copy, so the
// time is also written into the object's metadata.
const USED_AT = "draft-used-at";

export type ObjectInfo = {
  bytes: number;
  contentType: string | undefined;
  lastUsedAt: Date;
  touchedAt: Date | null;
  metadata: Record<string, string>;
};

/** The object's size, content type and last use (the later of LastModified and its draft-used-at), or null. */
export async function objectInfo(key: string): Promise<ObjectInfo | null> {
  try {
    const out = await storageClient().send(new HeadObjectCommand({ Bucket: env().S3_BUCKET, Key: key }));
    const metadata = out.Metadata ?? {};
    const usedAt = Date.parse(metadata[USED_AT] ?? "");
    const modified = out.LastModified?.getTime() ?? 0;
    const touchedAt = Number.isFinite(usedAt) ? new Date(usedAt) : null;
    return {
      bytes: out.ContentLength ?? 0,
      contentType: out.ContentType,
      lastUsedAt: new Date(Math.max(modified, touchedAt?.getTime() ?? 0)),
      touchedAt,
      metadata,
    };
  } catch (err) {
    if (notFound(err)) return null;
    throw unavailable(err);
  }
}

/**
 * Marks an object as used now (a copy onto itself with the time in its metadata), unless it was marked in
 * the last `minIntervalMs` (so a busy draft costs at most one copy an hour). False when there is no such object.
 */
export async function touchObject(key: string, now = new Date(), minIntervalMs = 60 * 60 * 1000): Promise<boolean> {
  const info = await objectInfo(key);
  if (!info) return false;
  if (info.touchedAt && now.getTime() - info.touchedAt.getTime() < minIntervalMs) return true;
  try {
    await storageClient().send(
      new CopyObjectCommand({
        Bucket: env().S3_BUCKET,
        Key: key,
        CopySource: `${env().S3_BUCKET}/${key}`,
        MetadataDirective: "REPLACE",
        ContentType: info.contentType,
        Metadata: { ...info.metadata, [USED_AT]: now.toISOString() },
      }),
    );
    return true;
  } catch (err) {
    if (notFound(err)) return false;
    throw unavailable(err);
  }
}
