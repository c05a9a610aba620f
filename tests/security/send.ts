// Sending one request as one caller, the way a browser would, without letting the answer change
// the caller: Set-Cookie is read but never kept (a sign-out or sign-up answered to the owner must
// not sign the owner out of the rest of the matrix). Every request leaves from SOURCE_ADDRESS, so
// the per-IP limits it meets (sign-in failures, /api/compute) are its own and no other test's.
import { appUrl } from "../http/app-url";
import { httpRequest } from "../http/client";
import type { HttpSession } from "../http/session";

export const SOURCE_ADDRESS = "127.0.9.1";

export interface RouteRequest {
  /** Path (with query) under the app. */
  path: string;
  method?: string;
  /** A JSON body (sent with content-type application/json). */
  json?: unknown;
  /** A raw body, sent as it is (set the content type in headers). */
  body?: string;
  headers?: Record<string, string>;
}

/** The cookie header of a session's jar ("" for anonymous). */
export const cookiesOf = (s: HttpSession) => [...s.cookies].map(([k, v]) => `${k}=${v}`).join("; ");

/** Sends a request as `s`; the app's own origin is sent as the browser would for a same-origin call. */
export async function send(s: HttpSession, r: RouteRequest, opts: { localAddress?: string } = {}): Promise<Response> {
  const headers: Record<string, string> = { origin: new URL(appUrl()).origin, ...(r.headers ?? {}) };
  const cookie = cookiesOf(s);
  if (cookie) headers.cookie = cookie;
  let body = r.body;
  if (r.json !== undefined) {
    headers["content-type"] = "application/json";
    body = JSON.stringify(r.json);
  }
  return httpRequest(appUrl(r.path), { method: r.method ?? "GET", headers, body, localAddress: opts.localAddress ?? SOURCE_ADDRESS });
}
