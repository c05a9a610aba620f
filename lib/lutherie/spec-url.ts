// The shareable calculator link: the spec as base64url-encoded JSON in `?spec=`. Decoding
// validates with the one schema, so a hand-edited or truncated link cannot produce a bad spec.
import { instrumentSpecSchema, type InstrumentSpec } from "@/lib/schemas/instrument-spec";

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

/** The spec in a link token, or null when the token is not a valid spec. */
export function decodeSpec(token: string | null | undefined): InstrumentSpec | null {
  if (!token || token.length > 8000) return null;
  try {
    const parsed = instrumentSpecSchema.safeParse(JSON.parse(fromBase64Url(token)));
    return parsed.success ? parsed.data : null;
  } catch {
    return null;
  }
}
