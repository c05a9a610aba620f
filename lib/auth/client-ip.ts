/**
 * The address a request came from. Next fills X-Forwarded-For with the socket's address when the
 * request has none; behind a reverse proxy that appends to the header, the right-most entry is
 * the one the proxy saw. (Without such a proxy a client can choose this value, so the per-IP
 * limit only holds behind one; the per-account limit holds either way.)
 */
export function clientIp(headers: Headers): string {
  const forwarded = headers.get("x-forwarded-for");
  const last = forwarded?.split(",").map((s) => s.trim()).filter(Boolean).pop();
  const ip = last ?? headers.get("x-real-ip") ?? "unknown";
  return ip.replace(/^::ffff:/, "").slice(0, 64);
}
