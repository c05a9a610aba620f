/** Joins class names, skipping false/undefined; small enough not to need a package. */
export function cx(...parts: Array<string | false | null | undefined>): string {
  return parts.filter(Boolean).join(" ");
}
