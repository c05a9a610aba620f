/**
 * The address a request came from: the X-Forwarded-For entry TRUSTED_PROXY_HOPS places from the
 * right (default 1, the last one). `next start` fills that header from the socket when no proxy
 * sent one; behind a reverse proxy that appends the address it saw, 1 is still right; with two
 * proxies, 2. A client talking straight to `next start` can send its own header, so per-IP limits
 * only hold with a proxy in front (per-account limits hold either way).
 */
export function clientIp(headers: Headers, hops = Number(process.env.TRUSTED_PROXY_HOPS ?? 1)): string {
  const forwarded = headers.get("x-forwarded-for");
  const parts = forwarded?.split(",").map((s) => s.trim()).filter(Boolean) ?? [];
  const pick = parts[Math.max(0, parts.length - Math.max(1, hops))] ?? headers.get("x-real-ip")?.trim() ?? "unknown";
  return pick.replace(/^::ffff:/, "").slice(0, 64) || "unknown";
}
