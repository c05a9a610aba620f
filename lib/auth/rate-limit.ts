// Failed password sign-ins are limited per account and per IP over a sliding window, counted in
// MariaDB so the limit holds across restarts and across app processes.
import { deleteSignInFailuresForAccount, insertSignInFailure, pruneSignInFailures, recentSignInFailures } from "@/lib/data/sign-in-failures";

export interface SignInLimits {
  windowMs: number;
  perAccount: number;
  perIp: number;
}

/**
 * Defaults: 5 failures per account and 20 per IP in 15 minutes. The IP limit is higher because a
 * school's class signs in from behind one address; it still stops one machine trying many accounts.
 */
export function signInLimitsFromEnv(env: Record<string, string | undefined> = process.env): SignInLimits {
  const n = (name: string, fallback: number) => (Number(env[name]) > 0 ? Number(env[name]) : fallback);
  return {
    windowMs: n("SIGN_IN_WINDOW_MINUTES", 15) * 60_000,
    perAccount: n("SIGN_IN_MAX_FAILURES_PER_ACCOUNT", 5),
    perIp: n("SIGN_IN_MAX_FAILURES_PER_IP", 20),
  };
}

/**
 * Seconds until one more attempt is allowed, or null when it is allowed now. `newestFirst` holds
 * the newest `limit` failures in the window; once the oldest of them leaves the window, the count
 * drops below the limit.
 */
export function retryAfterSeconds(newestFirst: Date[], limit: number, windowMs: number, now: Date): number | null {
  if (newestFirst.length < limit) return null;
  const oldest = newestFirst[limit - 1]!;
  const wait = oldest.getTime() + windowMs - now.getTime();
  return wait > 0 ? Math.ceil(wait / 1000) : null;
}

export type SignInGate = { allowed: true } | { allowed: false; retryAfterSeconds: number; reason: "account" | "ip" };

export async function checkSignInAllowed(accountKey: string, ip: string, limits = signInLimitsFromEnv(), now = new Date()): Promise<SignInGate> {
  const since = new Date(now.getTime() - limits.windowMs);
  const [byAccount, byIp] = await Promise.all([
    recentSignInFailures({ accountKey }, since, limits.perAccount),
    recentSignInFailures({ ip }, since, limits.perIp),
  ]);
  const account = retryAfterSeconds(byAccount, limits.perAccount, limits.windowMs, now);
  const address = retryAfterSeconds(byIp, limits.perIp, limits.windowMs, now);
  if (account === null && address === null) return { allowed: true };
  return (account ?? 0) >= (address ?? 0)
    ? { allowed: false, retryAfterSeconds: account!, reason: "account" }
    : { allowed: false, retryAfterSeconds: address!, reason: "ip" };
}

export async function recordFailedSignIn(accountKey: string, ip: string, limits = signInLimitsFromEnv()): Promise<void> {
  await insertSignInFailure(accountKey, ip);
  // Keep the table small: anything older than a day can go (cheap, indexed).
  if (Math.random() < 0.05) await pruneSignInFailures(new Date(Date.now() - Math.max(limits.windowMs, 86_400_000)));
}

export async function clearFailedSignIns(accountKey: string): Promise<void> {
  await deleteSignInFailuresForAccount(accountKey);
}

/** "Try again in 12 minutes (at 14:32 UTC)." */
export function describeRetry(seconds: number, now = new Date()): string {
  const at = new Date(now.getTime() + seconds * 1000);
  const hhmm = at.toISOString().slice(11, 16);
  const minutes = Math.ceil(seconds / 60);
  return `Try again in ${minutes} minute${minutes === 1 ? "" : "s"} (at ${hhmm} UTC).`;
}
