// Moving a submission's files from the contributor's incoming/ drafts to where results keep them: the
// log under its content hash, photos under photos/<contributor>/. Copies first (the drafts stay until the
// database has the result), so a failure at any point loses nothing the contributor uploaded. A failed
// write removes the photo copies; a log copied under its hash stays (another result may share it).
import "server-only";
import { copyObject, deleteObject, logKey, objectBytes, storedPhotoKey } from "@/server/storage";

export type MovedFiles = {
  logKey: string;
  photoKeys: string[];
  /** After a failed write: remove the copies this call made. */
  undo: () => Promise<void>;
  /** After the result is committed: remove the drafts. */
  discardDrafts: () => Promise<void>;
};

export async function moveFiles(
  incomingLog: string | null,
  sha256: string | null,
  incomingPhotos: string[],
): Promise<MovedFiles> {
  const made: string[] = [];
  const undo = async () => {
    await Promise.all(made.map((k) => deleteObject(k).catch(() => undefined)));
  };
  try {
    let finalLog = "";
    if (incomingLog && sha256) {
      finalLog = logKey(sha256);
      // Never undone: another submission of the same file may rely on it (it is the same bytes either way).
      if ((await objectBytes(finalLog)) === null) await copyObject(incomingLog, finalLog);
    }
    const photoKeys: string[] = [];
    for (const key of incomingPhotos) {
      const to = storedPhotoKey(key);
      await copyObject(key, to);
      made.push(to);
      photoKeys.push(to);
    }
    const drafts = [...(incomingLog ? [incomingLog] : []), ...incomingPhotos];
    return {
      logKey: finalLog,
      photoKeys,
      undo,
      discardDrafts: async () => void (await Promise.all(drafts.map((k) => deleteObject(k)))),
    };
  } catch (err) {
    await undo();
    throw err;
  }
}
