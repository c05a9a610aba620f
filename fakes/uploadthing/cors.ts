// CORS as the browser client needs it: the upload HEAD and PUT (with Range, x-uploadthing-version,
// b3 and traceparent headers) come from the app's origin and must read x-ut-range-start.
// Other origins get no CORS headers, so the browser blocks them.
import type { IncomingMessage, ServerResponse } from "node:http";

const ALLOWED_HEADERS = ["range", "x-uploadthing-version", "x-uploadthing-package", "b3", "traceparent", "content-type"];

/** Sets CORS headers; answers preflights itself and returns true when it did. */
export function handleCors(req: IncomingMessage, res: ServerResponse, allowedOrigins: string[]): boolean {
  const origin = req.headers.origin;
  const allowed = origin !== undefined && allowedOrigins.includes(origin);
  if (allowed) {
    res.setHeader("Access-Control-Allow-Origin", origin);
    res.setHeader("Vary", "Origin");
    res.setHeader("Access-Control-Expose-Headers", "x-ut-range-start, content-length, etag");
  }
  if (req.method !== "OPTIONS") return false;
  if (!allowed) {
    res.writeHead(403, { "Content-Type": "text/plain" });
    res.end("Origin not allowed");
    return true;
  }
  const asked = String(req.headers["access-control-request-headers"] ?? "")
    .split(",")
    .map((h) => h.trim().toLowerCase())
    .filter(Boolean);
  res.writeHead(204, {
    "Access-Control-Allow-Methods": "GET, HEAD, PUT, POST, OPTIONS",
    "Access-Control-Allow-Headers": asked.filter((h) => ALLOWED_HEADERS.includes(h)).join(", ") || ALLOWED_HEADERS.join(", "),
    "Access-Control-Max-Age": "600",
  });
  res.end();
  return true;
}
