// The start of a chosen file split into columns, in the browser (nothing is sent): what the column picker
// shows before a log is analysed or uploaded.
import { PREVIEW_CHARS, previewLog, type LogTablePreview } from "@/lib/analysis";

/** Bytes read for a preview: enough for PREVIEW_CHARS characters even when every one takes 4 bytes. */
const PREVIEW_BYTES = PREVIEW_CHARS * 4;

export async function previewFile(file: Blob): Promise<LogTablePreview> {
  const text = await file.slice(0, PREVIEW_BYTES).text();
  return previewLog(text);
}
