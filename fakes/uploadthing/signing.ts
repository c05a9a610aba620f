// The signatures UploadThing uses, with the API key as the HMAC-SHA256 secret:
// - presigned URLs: `…&signature=hmac-sha256=<hex>` over the full URL before "&signature=";
// - callbacks to the app: `x-uploadthing-signature: hmac-sha256=<hex>` over the raw JSON body.
import { createHmac, timingSafeEqual } from "node:crypto";

const PREFIX = "hmac-sha256=";

export function sign(payload: string, apiKey: string): string {
  return PREFIX + createHmac("sha256", apiKey).update(payload).digest("hex");
}

export function verify(payload: string, signature: string | null | undefined, apiKey: string): boolean {
  if (!signature?.startsWith(PREFIX)) return false;
  const want = Buffer.from(sign(payload, apiKey));
  const got = Buffer.from(signature);
  return want.length === got.length && timingSafeEqual(want, got);
}

export type UrlCheck = { ok: true; url: URL } | { ok: false; status: number; message: string };

/** Checks a presigned or signed file URL exactly as it arrived: signature, then expiry. */
export function verifySignedUrl(fullUrl: string, apiKey: string, now = Date.now()): UrlCheck {
  const at = fullUrl.lastIndexOf("&signature=");
  if (at < 0) return { ok: false, status: 403, message: "Missing signature" };
  const signed = fullUrl.slice(0, at);
  let signature: string;
  try {
    signature = decodeURIComponent(fullUrl.slice(at + "&signature=".length));
  } catch {
    return { ok: false, status: 403, message: "Invalid signature" };
  }
  if (!verify(signed, signature, apiKey)) return { ok: false, status: 403, message: "Invalid signature" };
  const url = new URL(fullUrl);
  const expires = Number(url.searchParams.get("expires"));
  if (!Number.isFinite(expires) || expires < now) return { ok: false, status: 403, message: "URL expired" };
  return { ok: true, url };
}

/** Makes a signed URL the way the SDK does (for files the fake hands out). */
export function signUrl(base: string, apiKey: string, ttlSeconds: number): string {
  const url = new URL(base);
  url.searchParams.append("expires", String(Date.now() + ttlSeconds * 1000));
  url.searchParams.append("signature", sign(url.toString(), apiKey));
  return url.href;
}
