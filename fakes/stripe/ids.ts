// Object ids the way Stripe spells them: a type prefix and random base62 characters.
import { randomBytes } from "node:crypto";

const ALPHABET = "0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz";

export function newId(prefix: string, length = 24): string {
  const bytes = randomBytes(length);
  let out = "";
  for (const b of bytes) out += ALPHABET[b % ALPHABET.length];
  return `${prefix}_${out}`;
}

/** Unix seconds, as every Stripe timestamp. */
export const nowSeconds = () => Math.floor(Date.now() / 1000);
