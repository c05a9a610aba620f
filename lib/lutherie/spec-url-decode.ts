// The spec a calculator link carries, validated with THE instrument spec schema (server side: the
// calculator page). Encoding, which the browser does, is in spec-url.ts without zod.
import { instrumentSpecSchema, type InstrumentSpec } from "@/lib/schemas/instrument-spec";
import { readSpecToken } from "./spec-url";

/** The spec in a link token, or null when the token is not a valid spec. */
export function decodeSpec(token: string | null | undefined): InstrumentSpec | null {
  const parsed = instrumentSpecSchema.safeParse(readSpecToken(token));
  return parsed.success ? parsed.data : null;
}
