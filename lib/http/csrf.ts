// Cross-site request forgery guard for the JSON API. Session cookies are SameSite=Lax, which keeps
// them off cross-site POSTs in current browsers; this is the second lock: a state-changing request
// that a browser marks as coming from another site is refused before any handler runs. Requests
// without those headers (servers, scripts, the fakes' callbacks) carry no ambient browser cookies
// and pass. Server actions are checked by Next.js itself (Origin against Host).

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

/** Routes called by other servers with their own signatures, never by a signed-in browser. */
const SERVER_TO_SERVER = ["/api/webhooks/", "/api/uploadthing"];

export interface CsrfInput {
  method: string;
  pathname: string;
  origin: string | null;
  secFetchSite: string | null;
  /** Origins the app is served on (APP_URL's, and the request's own). */
  allowedOrigins: readonly string[];
}

/** Null when the request may go on, else the reason it is refused (answered 403). */
export function csrfRefusal(r: CsrfInput): string | null {
  if (SAFE_METHODS.has(r.method.toUpperCase())) return null;
  if (!r.pathname.startsWith("/api/")) return null;
  if (SERVER_TO_SERVER.some((p) => r.pathname.startsWith(p))) return null;
  if (r.secFetchSite === "cross-site") return "This request came from another site and was refused.";
  if (r.origin && r.origin !== "null" && !r.allowedOrigins.includes(r.origin)) return "This request came from another site and was refused.";
  if (r.origin === "null") return "This request came from a page without an origin and was refused.";
  return null;
}
