// One error type for the whole app, with codes mapped to HTTP statuses. Unknown errors are logged and
// shown as a plain message without internals.
import { ZodError } from "zod";

const errorStatus = {
  bad_request: 400,
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  payload_too_large: 413,
  unsupported_media_type: 415,
  validation: 422,
  rate_limited: 429,
  internal: 500,
  unavailable: 503,
} as const;
export type ErrorCode = keyof typeof errorStatus;
export type FieldErrors = Record<string, string[]>;

export class AppError extends Error {
  constructor(
    public readonly code: ErrorCode,
    message: string,
    public readonly fieldErrors?: FieldErrors,
    public readonly retryAfterS?: number,
  ) {
    super(message);
    this.name = "AppError";
  }
  get status(): number {
    return errorStatus[this.code];
  }
}

function fieldErrorsOf(err: ZodError): FieldErrors {
  const out: FieldErrors = {};
  for (const issue of err.issues) {
    const key = issue.path.length ? issue.path.join(".") : "_form";
    (out[key] ??= []).push(issue.message);
  }
  return out;
}

// Connection refused/reset, server shutting down or starting, connection failures (PostgreSQL SQLSTATE
// classes 57P and 08), and pg's own "Connection terminated" — looked for through Drizzle's wrapping `cause`.
const DOWN_CODES = new Set([
  "ECONNREFUSED",
  "ECONNRESET",
  "ETIMEDOUT",
  "57P01",
  "57P02",
  "57P03",
  "08000",
  "08001",
  "08003",
  "08006",
]);

export function isDatabaseDown(err: unknown): boolean {
  for (
    let e: unknown = err, depth = 0;
    e && typeof e === "object" && depth < 5;
    e = (e as { cause?: unknown }).cause, depth++
  ) {
    const code = "code" in e ? String((e as { code: unknown }).code) : "";
    if (DOWN_CODES.has(code)) return true;
    const message = e instanceof Error ? e.message : "";
    if (/Connection terminated|timeout exceeded when trying to connect|connect ECONNREFUSED/i.test(message))
      return true;
  }
  return false;
}

/** Normalise anything thrown into an AppError; unknown errors are logged here, once. */
export function toAppError(err: unknown): AppError {
  if (err instanceof AppError) return err;
  if (err instanceof ZodError) return new AppError("validation", "Some values are not valid.", fieldErrorsOf(err));
  if (isDatabaseDown(err)) {
    return new AppError(
      "unavailable",
      "The database is not reachable right now. Nothing was saved; please try again in a moment.",
    );
  }
  console.error("[sagline] unexpected error:", err);
  return new AppError("internal", "Something went wrong on our side. Nothing was saved; please try again.");
}

type ErrorBody = { error: { code: ErrorCode; message: string; fieldErrors?: FieldErrors } };

export function errorResponse(err: unknown, headers: HeadersInit = {}): Response {
  const e = toAppError(err);
  const h = new Headers(headers);
  if (e.retryAfterS !== undefined) h.set("Retry-After", String(Math.max(1, Math.ceil(e.retryAfterS))));
  const body: ErrorBody = {
    error: { code: e.code, message: e.message, ...(e.fieldErrors ? { fieldErrors: e.fieldErrors } : {}) },
  };
  return Response.json(body, { status: e.status, headers: h });
}

/** What every server action returns, for useActionState. */
export type ActionResult<T = undefined> =
  | { ok: true; data: T; error?: undefined; fieldErrors?: undefined }
  | { ok: false; error: string; code: ErrorCode; fieldErrors?: FieldErrors };

export function actionError(err: unknown): ActionResult<never> {
  const e = toAppError(err);
  return { ok: false, error: e.message, code: e.code, ...(e.fieldErrors ? { fieldErrors: e.fieldErrors } : {}) };
}
