"use client";

import type { FieldValues, Path, UseFormSetError } from "react-hook-form";
import { ApiError, errorMessage } from "@/lib/http/api-client";

/**
 * Puts an API refusal's field issues (422 with paths) on the form's fields; `prefix` strips a
 * leading path part ("spec." for the spec form). Returns the message for the form's alert, or
 * null when every issue found its field.
 */
export function applyApiErrors<F extends FieldValues>(err: unknown, setError: UseFormSetError<F>, fields: ReadonlyArray<string> | "any", prefix = ""): string | null {
  if (!(err instanceof ApiError) || err.issues.length === 0) return errorMessage(err);
  let unplaced = false;
  for (const issue of err.issues) {
    const path = prefix && issue.path.startsWith(prefix) ? issue.path.slice(prefix.length) : issue.path;
    if (path && (fields === "any" || fields.includes(path))) setError(path as Path<F>, { type: "server", message: issue.message });
    else unplaced = true;
  }
  return unplaced ? err.message : null;
}
