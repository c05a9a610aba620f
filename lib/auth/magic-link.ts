// E-mail sign-in links: sent through the outbox, and minted directly for someone who has just
// proved they own an address (by accepting an invitation), so they land signed in.
import { randomBytes } from "node:crypto";
import { inTransaction } from "@/lib/data/transaction";
import { findUserByEmail } from "@/lib/data/users";
import { insertVerificationToken } from "@/lib/data/verification-tokens";
import { enqueueEmail } from "@/lib/outbox/enqueue";
import { appLink, onAppOrigin } from "./links";

export const EMAIL_PROVIDER_ID = "email-link";
/** A sign-in link is valid this long. */
export const SIGN_IN_LINK_MAX_AGE_S = 15 * 60;

/**
 * Auth.js's sendVerificationRequest: queues the link for existing accounts only, and says nothing
 * either way, so the form does not reveal which addresses have accounts.
 */
export async function queueSignInLinkEmail(params: { identifier: string; url: string; expires: Date }): Promise<void> {
  const user = await findUserByEmail(params.identifier);
  if (!user) return;
  await inTransaction((trx) =>
    enqueueEmail(trx, {
      workshopId: null,
      to: user.email,
      template: "magic-link",
      props: { signInUrl: onAppOrigin(params.url), expiresAt: params.expires.toISOString() },
    }),
  );
}

/** Auth.js stores sha256(token + secret) in hex; so do we, so its callback accepts our link. */
async function authJsTokenHash(token: string): Promise<string> {
  const secret = process.env.AUTH_SECRET ?? "";
  const digest = await crypto.subtle.digest("SHA-256", new TextEncoder().encode(`${token}${secret}`));
  return Buffer.from(digest).toString("hex");
}

/** A one-time sign-in URL for `email`, valid five minutes, that ends at `callbackPath`. */
export async function mintSignInUrl(email: string, callbackPath: string): Promise<string> {
  const token = randomBytes(32).toString("hex");
  await insertVerificationToken({ identifier: email, token: await authJsTokenHash(token), expires: new Date(Date.now() + 5 * 60_000) });
  const q = new URLSearchParams({ callbackUrl: appLink(callbackPath), token, email });
  return appLink(`/api/auth/callback/${EMAIL_PROVIDER_ID}?${q}`);
}
