"use client";

import type { FieldValues, Path, UseFormSetError } from "react-hook-form";
import type { ActionResult } from "@/lib/auth/actions";

/**
 * Puts a failed server action's field errors on the form's fields and returns the message for
 * the form's alert (null when every problem has a field of its own).
 */
export function applyActionErrors<F extends FieldValues>(result: ActionResult<unknown>, setError: UseFormSetError<F>, fields: ReadonlyArray<Path<F>>): string | null {
  if (result.ok) return null;
  let unplaced = false;
  for (const [path, message] of Object.entries(result.fieldErrors)) {
    if ((fields as readonly string[]).includes(path)) setError(path as Path<F>, { type: "server", message });
    else unplaced = true;
  }
  return Object.keys(result.fieldErrors).length === 0 || unplaced ? result.message : null;
}
