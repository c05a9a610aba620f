// The shareable calculator link: the spec as base64url-encoded JSON in `?spec=`. The browser
// encodes; the page decodes and validates with the one schema (spec-url-decode.ts), so a
// hand-edited or truncated link cannot produce a bad spec. No zod here: the calculator imports it.
import type { InstrumentSpec } from "@/lib/schemas/instrument-spec";

export const SPEC_QUERY_PARAM = "spec";

function toBase64Url(text: string): string {
  const bytes = new TextEncoder().encode(text);
  let bin = "";
  for (const b of bytes) bin += String.fromCharCode(b);
  return btoa(bin).replace(/\+/g, "-").replace(/\//g, "_").replace(/=+$/, "");
}

function fromBase64Url(token: string): string {
  const b64 = token.replace(/-/g, "+").replace(/_/g, "/");
  const bin = atob(b64 + "=".repeat((4 - (b64.length % 4)) % 4));
  return new TextDecoder().decode(Uint8Array.from(bin, (ch) => ch.charCodeAt(0)));
}

/** Drops undefined keys so the link stays short and stable. */
function compact(spec: InstrumentSpec): InstrumentSpec {
  return JSON.parse(JSON.stringify(spec)) as InstrumentSpec;
}

export function encodeSpec(spec: InstrumentSpec): string {
  return toBase64Url(JSON.stringify(compact(spec)));
}

/** The JSON a link token carries, not yet validated; null when it is not base64url JSON or too long. */
export function readSpecToken(token: string | null | undefined): unknown {
  if (!token || token.length > 8000) return null;
  try {
    return JSON.parse(fromBase64Url(token));
  } catch {
    return null;
  }
}
