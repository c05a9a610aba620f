// Which page paths a signed-out visitor may open. Everything else redirects to sign-in in
// proxy.ts (the pages check again on the server; the proxy only saves a round trip). Add a
// public page here.
const PUBLIC_EXACT = new Set(["/", "/sign-in", "/sign-up", "/reset", "/check-email", "/favicon.ico", "/robots.txt"]);
const PUBLIC_PREFIXES = ["/api/", "/_next/", "/reset/", "/invitations/", "/calculator", "/fonts/"];

export function isPublicPath(pathname: string): boolean {
  if (PUBLIC_EXACT.has(pathname)) return true;
  if (PUBLIC_PREFIXES.some((p) => pathname.startsWith(p))) return true;
  // Static files served from public/ (anything with an extension at the end).
  return /\.[a-z0-9]{2,5}$/i.test(pathname);
}
