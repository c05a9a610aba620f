import { CredentialsSignin } from "@auth/core/errors";

// What a refused password sign-in reports. Auth.js puts `code` in the redirect
// (/sign-in?error=CredentialsSignin&code=…) and rethrows the error to a server action.

export class InvalidCredentials extends CredentialsSignin {
  code = "invalid_credentials";
}

export class SignInRateLimited extends CredentialsSignin {
  constructor(readonly retryAfterSeconds: number) {
    super();
    this.code = `rate_limited:${retryAfterSeconds}`;
  }
}

export type SignInRefusal = { kind: "invalid_credentials" } | { kind: "rate_limited"; retryAfterSeconds: number } | { kind: "other" };

/** Reads the `code` of a refused sign-in (from the error or the redirect's query string). */
export function parseSignInCode(code: string | null | undefined): SignInRefusal {
  if (code === "invalid_credentials") return { kind: "invalid_credentials" };
  const m = code?.match(/^rate_limited:(\d+)$/);
  if (m) return { kind: "rate_limited", retryAfterSeconds: Number(m[1]) };
  return { kind: "other" };
}
