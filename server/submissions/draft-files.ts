// A draft lives in the contributor's browser, so the server learns that it is still open only when the
// form is opened again: it then renews the draft's files (server/storage#touchObject), which keeps them
// from the storage sweep for another INCOMING_MAX_AGE_DAYS, and says which are gone, so the form can ask
// for them again before the contributor reaches Submit.
import "server-only";
import { enforceRateLimit, limits } from "@/server/rate-limit";
import { isOwnIncomingLogKey, isOwnIncomingPhotoKey, touchObject } from "@/server/storage";
import type { KeepDraftFilesInput } from "@/lib/validations/result";

export type KeptDraftFiles = { logMissing: boolean; missingPhotoKeys: string[] };

export async function keepDraftFilesFor(userId: string, input: KeepDraftFilesInput): Promise<KeptDraftFiles> {
  await enforceRateLimit(`keep-draft:${userId}`, limits.keepDraftPerUser);
  // Someone else's key is treated as missing: never touched, and nothing said about it.
  const logMissing =
    input.logKey !== null && !(isOwnIncomingLogKey(input.logKey, userId) && (await touchObject(input.logKey)));
  const missingPhotoKeys: string[] = [];
  for (const key of input.photoKeys)
    if (!(isOwnIncomingPhotoKey(key, userId) && (await touchObject(key)))) missingPhotoKeys.push(key);
  return { logMissing, missingPhotoKeys };
}
