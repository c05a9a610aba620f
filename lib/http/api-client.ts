// The browser's side of our JSON API: one fetch wrapper that turns the error shape every route
// answers (`{ error: { code, message, issues? } }`) into an ApiError the screens can show.
import type { ErrorCode, FieldIssue } from "./errors";

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: ErrorCode | "network",
    message: string,
    readonly issues: FieldIssue[] = [],
  ) {
    super(message);
    this.name = "ApiError";
  }
}

/** GET (or `method` with a JSON body) a same-origin API path; resolves to the parsed JSON. */
export async function apiFetch<T>(path: string, init: { method?: string; json?: unknown; signal?: AbortSignal } = {}): Promise<T> {
  let res: Response;
  try {
    res = await fetch(path, {
      method: init.method ?? (init.json === undefined ? "GET" : "POST"),
      headers: init.json === undefined ? { accept: "application/json" } : { accept: "application/json", "content-type": "application/json" },
      body: init.json === undefined ? undefined : JSON.stringify(init.json),
      credentials: "same-origin",
      signal: init.signal,
    });
  } catch (err) {
    if ((err as { name?: string }).name === "AbortError") throw err;
    throw new ApiError(0, "network", "The server could not be reached. Check the connection and try again.");
  }
  const text = await res.text();
  let body: unknown = null;
  try {
    body = text ? JSON.parse(text) : null;
  } catch {
    body = null;
  }
  if (!res.ok) {
    const e = (body as { error?: { code?: ErrorCode; message?: string; issues?: FieldIssue[] } } | null)?.error;
    throw new ApiError(res.status, e?.code ?? "internal", e?.message ?? `The server answered ${res.status}.`, e?.issues ?? []);
  }
  return body as T;
}

/** The message to show for anything a query or mutation threw. */
export function errorMessage(err: unknown): string {
  if (err instanceof ApiError) return err.message;
  return "Something went wrong. Try again.";
}
