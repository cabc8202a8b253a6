// The measurement core on an uploaded or stored log, with its errors mapped to what a person sees:
// a bad log is a 422 on the file field (with the line), a log past the limit a 413.
import "server-only";
import { analyseLog, checkAgainstCard, isLogError, toPublicFigures, warningsBesideChecks } from "@/lib/analysis";
import type { AnalyseOptions, Analysis, LogPreview, StatedCard } from "@/lib/analysis";
import { AppError } from "@/lib/errors";
import { tooLarge } from "./body";

function logErrorToAppError(err: unknown, maxBytes: number, field: string, mappingField: string): unknown {
  if (!isLogError(err)) return err;
  if (err.code === "too-large") return tooLarge(maxBytes, field);
  if (err.code === "internal") return new AppError("internal", err.message);
  const message = err.line !== undefined ? `Line ${err.line}: ${err.message}` : err.message;
  // A mapping that names columns the log does not have is the mapping's fault, not the file's.
  const on = err.code === "bad-mapping" ? mappingField : field;
  return new AppError("validation", `The log could not be read: ${message}`, { [on]: [message] });
}

export async function analyseChunks(
  chunks: AsyncIterable<Uint8Array>,
  options: AnalyseOptions,
  maxBytes: number,
  field = "file",
  mappingField = field,
): Promise<Analysis> {
  // The core reports anything but its own LogError as an internal fault, so an error from the source
  // (too large, not text, storage gone) is kept here and thrown as it was.
  let sourceError: unknown = null;
  const source = (async function* () {
    try {
      for await (const chunk of chunks) yield chunk;
    } catch (err) {
      sourceError = err;
      throw err;
    }
  })();
  try {
    return await analyseLog(source, { ...options, maxBytes });
  } catch (err) {
    throw sourceError ?? logErrorToAppError(err, maxBytes, field, mappingField);
  }
}

export function previewOf(analysis: Analysis, card?: StatedCard): LogPreview {
  const figures = toPublicFigures(analysis);
  const checks = card ? checkAgainstCard(analysis.figures, card) : [];
  return {
    figures: { ...figures, warnings: warningsBesideChecks(figures.warnings, checks) },
    curve: analysis.curve,
    checks,
  };
}
