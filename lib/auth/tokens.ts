import { createHash, randomBytes } from "node:crypto";

/** A fresh URL-safe secret (32 random bytes) and the SHA-256 hex digest stored in its place. */
export function newToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString("base64url");
  return { token, hash: hashToken(token) };
}

export function hashToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}
