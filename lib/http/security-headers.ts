/**
 * Security headers for every response the proxy sees. Scripts need 'unsafe-inline' because the
 * App Router inlines its flight data; everything else is locked to our own origin plus the
 * upload service the browser talks to directly.
 */
export function securityHeaders(opts: { uploadOrigin?: string; dev?: boolean } = {}): Record<string, string> {
  const extra = opts.uploadOrigin ? ` ${opts.uploadOrigin}` : "";
  const csp = [
    "default-src 'self'",
    `script-src 'self' 'unsafe-inline'${opts.dev ? " 'unsafe-eval'" : ""}`,
    "style-src 'self' 'unsafe-inline'",
    `img-src 'self' data: blob:${extra}`,
    "font-src 'self'",
    `connect-src 'self'${extra}${opts.dev ? " ws:" : ""}`,
    "frame-ancestors 'none'",
    "form-action 'self'",
    "base-uri 'self'",
    "object-src 'none'",
  ].join("; ");
  return {
    "Content-Security-Policy": csp,
    "X-Content-Type-Options": "nosniff",
    "Referrer-Policy": "strict-origin-when-cross-origin",
    "X-Frame-Options": "DENY",
    "Permissions-Policy": "camera=(), microphone=(), geolocation=()",
  };
}
