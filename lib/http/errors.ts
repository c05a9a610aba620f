import { ZodError } from "zod";

/** The closed set of error codes every route and action may return, with their HTTP status. */
export const ERROR_STATUS = {
  bad_request: 400,
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  validation_failed: 422,
  rate_limited: 429,
  internal: 500,
  unavailable: 503,
} as const;

export type ErrorCode = keyof typeof ERROR_STATUS;

/** One problem with one input field; `path` is the field's location, e.g. "strings.2.gaugeIn". */
export interface FieldIssue {
  path: string;
  message: string;
}

export interface ErrorBody {
  error: { code: ErrorCode; message: string; issues?: FieldIssue[]; retryAfterSeconds?: number };
}

/** The one error type the app throws on purpose; anything else is an internal error. */
export class AppError extends Error {
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly issues?: FieldIssue[],
    readonly retryAfterSeconds?: number,
  ) {
    super(message);
    this.name = "AppError";
  }

  get status(): number {
    return ERROR_STATUS[this.code];
  }
}

export const notFound = (what = "Not found") => new AppError("not_found", what);
export const forbidden = (why = "You do not have permission to do this.") => new AppError("forbidden", why);
export const conflict = (why: string) => new AppError("conflict", why);
export const unauthenticated = () => new AppError("unauthenticated", "Sign in to continue.");

/** Turns zod's issues into `{path, message}` with dotted paths ("" for the whole body). */
export function zodIssues(err: ZodError): FieldIssue[] {
  return err.issues.map((i) => ({ path: i.path.map(String).join("."), message: i.message }));
}

const DB_DOWN_CODES = new Set([
  "ECONNREFUSED",
  "ECONNRESET",
  "PROTOCOL_CONNECTION_LOST",
  "ETIMEDOUT",
  "EPIPE",
  "ER_CON_COUNT_ERROR",
  "ER_SERVER_SHUTDOWN",
]);

/** True when the error means the database cannot be reached right now (→ 503, retry later). */
export function isDatabaseUnavailable(err: unknown): boolean {
  if (!err || typeof err !== "object") return false;
  const code = (err as { code?: unknown }).code;
  if (typeof code === "string" && DB_DOWN_CODES.has(code)) return true;
  const name = (err as { name?: unknown }).name;
  if (name === "KnexTimeoutError") return true;
  const fatal = (err as { fatal?: unknown }).fatal;
  return fatal === true;
}

/** A deadlock victim after its retries, or a lock wait that timed out: busy, not broken. */
function isLockContention(err: unknown): boolean {
  const code = err && typeof err === "object" ? (err as { code?: unknown }).code : undefined;
  return code === "ER_LOCK_DEADLOCK" || code === "ER_LOCK_WAIT_TIMEOUT";
}

/** Maps any thrown value to a status and a body that is safe to show: no stack, no SQL. */
export function toErrorBody(err: unknown): { status: number; body: ErrorBody } {
  if (err instanceof AppError) {
    const body: ErrorBody = { error: { code: err.code, message: err.message } };
    if (err.issues) body.error.issues = err.issues;
    if (err.retryAfterSeconds !== undefined) body.error.retryAfterSeconds = err.retryAfterSeconds;
    return { status: err.status, body };
  }
  if (err instanceof ZodError) {
    return {
      status: 422,
      body: { error: { code: "validation_failed", message: "Some fields are not valid.", issues: zodIssues(err) } },
    };
  }
  if (isLockContention(err)) {
    return {
      status: 503,
      body: { error: { code: "unavailable", message: "Too many changes at once; nothing was changed. Try again in a moment.", retryAfterSeconds: 1 } },
    };
  }
  if (isDatabaseUnavailable(err)) {
    return {
      status: 503,
      body: {
        error: {
          code: "unavailable",
          message: "The database is not reachable right now. Nothing was changed; try again in a moment.",
          retryAfterSeconds: 5,
        },
      },
    };
  }
  return { status: 500, body: { error: { code: "internal", message: "Something went wrong on our side." } } };
}
