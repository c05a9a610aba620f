// Who is signed in, read once per request: the session cookie names a user id, and the database
// must still agree (the account exists and no password change has ended the session since).
import { getToken } from "next-auth/jwt";
import { headers } from "next/headers";
import { cache } from "react";
import { findUserById } from "@/lib/data/users";
import { unauthenticated } from "@/lib/http/errors";
import { usesSecureCookies } from "./config";

export interface SignedInUser {
  id: number;
  email: string;
  name: string;
  hasPassword: boolean;
}

type Claims = { sub?: string; authTime?: number };

// Decrypting the cookie costs about a millisecond (key derivation, AES and HMAC through WebCrypto)
// and the same cookie comes with every request of a session, so the claims of a token are kept for
// a few minutes — never past the token's own expiry, and keyed by the whole token, which only the
// app's secret can produce. The account is still re-read on every request (a password change still
// ends the session at once).
const decoded = new Map<string, Claims & { until: number }>();
const DECODED_MAX = 2000;
const DECODED_TTL_MS = 5 * 60_000;

/**
 * The session token's claims from the session cookie, decrypted and checked (integrity, expiry)
 * with the app's secret — what Auth.js's `auth()` reads, without the refreshed token it would also
 * encrypt and then discard outside a sign-in route. Only the cookie counts (never an Authorization
 * header), and any failure is "no session".
 */
async function sessionClaims(): Promise<Claims | null> {
  try {
    const cookie = (await headers()).get("cookie") ?? "";
    const params = { req: { headers: { cookie } }, secret: process.env.AUTH_SECRET, secureCookie: usesSecureCookies() };
    const raw = await getToken({ ...params, raw: true });
    if (!raw) return null;
    const now = Date.now();
    const hit = decoded.get(raw);
    if (hit && hit.until > now) return hit;
    const token = await getToken(params);
    if (!token) return null;
    const until = Math.min(now + DECODED_TTL_MS, typeof token.exp === "number" ? token.exp * 1000 : now);
    if (decoded.size >= DECODED_MAX) decoded.delete(decoded.keys().next().value!);
    decoded.set(raw, { sub: token.sub, authTime: token.authTime, until });
    return token;
  } catch {
    return null;
  }
}

export const currentUser = cache(async (): Promise<SignedInUser | null> => {
  const token = await sessionClaims();
  const id = Number(token?.sub);
  if (!Number.isInteger(id) || id <= 0) return null;
  const user = await findUserById(id);
  if (!user) return null;
  if (user.sessionsValidAfter && (token?.authTime ?? 0) < user.sessionsValidAfter.getTime()) return null;
  return { id: user.id, email: user.email, name: user.name, hasPassword: user.hasPassword };
});

/** The signed-in user, or an AppError "unauthenticated" (401 for the API). */
export async function requireUser(): Promise<SignedInUser> {
  const user = await currentUser();
  if (!user) throw unauthenticated();
  return user;
}
