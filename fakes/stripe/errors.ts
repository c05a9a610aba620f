// Errors in the shape the Stripe API returns: `{ error: { type, code, message, param, ... } }`.
// The SDK maps them by status: 400/404 → StripeInvalidRequestError, 401 → StripeAuthenticationError,
// 402 → StripeCardError, 5xx → StripeAPIError.

export type StripeErrorType = "invalid_request_error" | "card_error" | "api_error" | "idempotency_error";

export class StripeFakeError extends Error {
  constructor(
    readonly status: number,
    readonly type: StripeErrorType,
    message: string,
    readonly code?: string,
    readonly param?: string,
    readonly extra: Record<string, unknown> = {},
  ) {
    super(message);
  }

  toBody(): { error: Record<string, unknown> } {
    const error: Record<string, unknown> = { type: this.type, message: this.message, ...this.extra };
    if (this.code) error.code = this.code;
    if (this.param) error.param = this.param;
    return { error };
  }
}

export const invalid = (message: string, param?: string, code = "parameter_invalid") =>
  new StripeFakeError(400, "invalid_request_error", message, code, param);

export const missingParam = (param: string) =>
  new StripeFakeError(400, "invalid_request_error", `Missing required param: ${param}.`, "parameter_missing", param);

/** The object, or the API's 404 for it. */
export function found<T>(obj: T | undefined, what: string, id: string, param = "id"): T {
  if (obj === undefined) throw noSuch(what, id, param);
  return obj;
}

export const noSuch = (what: string, id: string, param = "id") =>
  new StripeFakeError(404, "invalid_request_error", `No such ${what}: '${id}'`, "resource_missing", param);
