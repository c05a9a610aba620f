import { NextResponse } from "next/server";
import type { ZodType } from "zod";
import { AppError, toErrorBody } from "./errors";

/** JSON error response from anything thrown, with Retry-After when the error carries one. */
export function errorResponse(err: unknown): NextResponse {
  const { status, body } = toErrorBody(err);
  if (status >= 500 && !(err instanceof AppError)) console.error("[api]", err);
  const headers: Record<string, string> = {};
  if (body.error.retryAfterSeconds !== undefined) headers["Retry-After"] = String(body.error.retryAfterSeconds);
  return NextResponse.json(body, { status, headers });
}

/** Reads a JSON body: unparseable → 400; then validates it with the schema → 422 with field paths. */
export async function readJson<T>(req: Request, schema: ZodType<T>): Promise<T> {
  let raw: unknown;
  try {
    const text = await req.text();
    raw = text.length === 0 ? undefined : JSON.parse(text);
  } catch {
    throw new AppError("bad_request", "The request body is not valid JSON.", [{ path: "", message: "Invalid JSON" }]);
  }
  if (raw === undefined) {
    throw new AppError("bad_request", "The request needs a JSON body.", [{ path: "", message: "Required" }]);
  }
  const parsed = schema.safeParse(raw);
  if (!parsed.success) throw parsed.error;
  return parsed.data;
}

/** Validates a query string against a schema of string-ish fields (→ 422 with paths). */
export function readQuery<T>(req: Request, schema: ZodType<T>): T {
  const params = Object.fromEntries(new URL(req.url).searchParams.entries());
  const parsed = schema.safeParse(params);
  if (!parsed.success) throw parsed.error;
  return parsed.data;
}
