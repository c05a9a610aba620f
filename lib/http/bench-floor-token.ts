// The benchmark floors' switch: BENCH_FLOOR_TOKEN, set only by `npm run bench*` in the bench's own
// server. Unset (or shorter than 16 characters), every floor route is a 404 and no floor scope can
// be made (lib/auth/workshop-access.ts checks it too).
import { timingSafeEqual } from "node:crypto";

/** The server's floor token, or null when the floors are off. */
export function benchFloorToken(): string | null {
  const token = process.env.BENCH_FLOOR_TOKEN;
  return token && token.length >= 16 ? token : null;
}

/** True when the floors are on and `given` (the request's x-bench-token) is the token. */
export function benchFloorTokenMatches(given: string | null): boolean {
  const token = benchFloorToken();
  if (!token || !given || given.length !== token.length) return false;
  return timingSafeEqual(Buffer.from(given), Buffer.from(token));
}
