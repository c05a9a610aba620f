import { hash, verify } from "@node-rs/argon2";

// argon2id with the library's defaults (m=19 MiB, t=2, p=1: the OWASP minimum); ≈ 70 ms here.
export async function hashPassword(plain: string): Promise<string> {
  return hash(plain);
}

/** False for a user with no password (magic-link only) instead of throwing. */
export async function verifyPassword(passwordHash: string | null | undefined, plain: string): Promise<boolean> {
  if (!passwordHash) return false;
  try {
    return await verify(passwordHash, plain);
  } catch {
    return false;
  }
}
