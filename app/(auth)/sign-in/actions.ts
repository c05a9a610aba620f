"use server";

import { publicAction } from "@/lib/auth/actions";
import { signIn } from "@/lib/auth/auth";
import { parseSignInCode } from "@/lib/auth/errors";
import { EMAIL_PROVIDER_ID } from "@/lib/auth/magic-link";
import { describeRetry } from "@/lib/auth/rate-limit";
import { AppError } from "@/lib/http/errors";
import { callbackPathSchema, magicLinkSchema, passwordSignInSchema } from "@/lib/schemas/auth";

/** Turns Auth.js's refusal into a message a person can act on (with the retry time when limited). */
function refusal(err: unknown): never {
  const code = (err as { code?: string } | null)?.code;
  const r = parseSignInCode(code);
  if (r.kind === "rate_limited") {
    throw new AppError("rate_limited", `Too many failed sign-ins. ${describeRetry(r.retryAfterSeconds)}`, undefined, r.retryAfterSeconds);
  }
  if (r.kind === "invalid_credentials") {
    throw new AppError("unauthenticated", "That e-mail address and password do not match an account.", [
      { path: "password", message: "Check the address and the password, or sign in with an e-mailed link." },
    ]);
  }
  throw err;
}

const passwordInput = passwordSignInSchema.extend({ callbackUrl: callbackPathSchema });

export const signInWithPasswordAction = publicAction(passwordInput, async ({ email, password, callbackUrl }) => {
  try {
    await signIn("credentials", { email, password, redirect: false });
  } catch (err) {
    refusal(err);
  }
  return { redirectTo: callbackUrl };
});

export const sendSignInLinkAction = publicAction(magicLinkSchema.extend({ callbackUrl: callbackPathSchema }), async ({ email, callbackUrl }) => {
  await signIn(EMAIL_PROVIDER_ID, { email, redirect: false, redirectTo: callbackUrl });
  return { email };
});
