// Storage keys (no I/O here). Files uploaded while filling in the submission form land under
// incoming/<contributor>/, so a submission can only use files its own contributor uploaded; on submit
// they are copied to their lasting place (logs/ by content hash, photos/ by contributor). Abandoned
// drafts' files are left under incoming/ until `npm run storage:sweep` (server/storage/sweep.ts) removes
// them; hosted buckets also expire incoming/ with a lifecycle rule.
export const INCOMING_PREFIX = "incoming/";
const UUID = "[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}";
export const PHOTO_EXTENSIONS = ["jpg", "png", "webp"] as const;
export type PhotoExtension = (typeof PHOTO_EXTENSIONS)[number];

const INCOMING_LOG = new RegExp(`^incoming/([^/]+)/${UUID}\\.csv$`);
const INCOMING_PHOTO = new RegExp(`^incoming/([^/]+)/photo-${UUID}\\.(${PHOTO_EXTENSIONS.join("|")})$`);

/** Logs are stored under their content hash, so the same file is stored once. */
export function logKey(sha256: string): string {
  return `logs/${sha256.slice(0, 2)}/${sha256}.csv`;
}

export function incomingLogKey(userId: string): string {
  return `incoming/${userId}/${crypto.randomUUID()}.csv`;
}

export function isOwnIncomingLogKey(key: string, userId: string): boolean {
  return INCOMING_LOG.exec(key)?.[1] === userId;
}

export function incomingPhotoKey(userId: string, ext: PhotoExtension): string {
  return `incoming/${userId}/photo-${crypto.randomUUID()}.${ext}`;
}

export function isOwnIncomingPhotoKey(key: string, userId: string): boolean {
  return INCOMING_PHOTO.exec(key)?.[1] === userId;
}

/** Where a submitted photo lives: photos/<contributor>/<uuid>.<ext>. */
export function storedPhotoKey(incomingKey: string): string {
  return incomingKey.replace(/^incoming\//, "photos/").replace("/photo-", "/");
}
