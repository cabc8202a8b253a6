/**
 * The one error the measurement core throws on bad input. Anything else escaping
 * `analyseLog` is a bug: callers show `message` (and `line` when present) as is.
 */
export type LogErrorCode =
  | "too-large"
  | "empty"
  | "no-columns"
  | "columns-not-found"
  | "bad-mapping"
  | "too-few-samples"
  | "time-backwards"
  | "too-many-broken-lines"
  /** A quote opened and never closed: the rest of the log would be one field. */
  | "unclosed-quote"
  | "no-discharge"
  | "bad-option"
  /** A fault in Sagline's own code, reported as a message instead of a stack. Tests treat it as a failure. */
  | "internal";

export class LogError extends Error {
  readonly code: LogErrorCode;
  readonly line?: number;

  constructor(code: LogErrorCode, message: string, line?: number) {
    super(message);
    this.name = "LogError";
    this.code = code;
    if (line !== undefined) this.line = line;
  }
}

export function isLogError(value: unknown): value is LogError {
  return value instanceof LogError;
}
