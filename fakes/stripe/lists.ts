// List endpoints as Stripe pages them: newest first, `limit` 1–100 (default 10), cursors
// `starting_after` / `ending_before` naming an object id, and `has_more`.
import { noSuch, invalid } from "./errors";
import { optInt, optString, type Params } from "./params";
import type { ListObject } from "./types";

export function paginate<T extends { id: string }>(newestFirst: T[], p: Params, url: string, what: string): ListObject<T> {
  const limit = optInt(p, "limit", "limit", 1) ?? 10;
  if (limit > 100) throw invalid("This value must be less than or equal to 100.", "limit", "parameter_invalid_integer");
  const after = optString(p, "starting_after");
  const before = optString(p, "ending_before");
  if (after && before) throw invalid("You may only specify one of these parameters: starting_after, ending_before.", "starting_after");
  const position = (id: string, param: string) => {
    const i = newestFirst.findIndex((o) => o.id === id);
    if (i < 0) throw noSuch(what, id, param);
    return i;
  };
  if (before) {
    const end = position(before, "ending_before");
    const start = Math.max(0, end - limit);
    return { object: "list", data: newestFirst.slice(start, end), has_more: start > 0, url };
  }
  const start = after ? position(after, "starting_after") + 1 : 0;
  const data = newestFirst.slice(start, start + limit);
  return { object: "list", data, has_more: start + limit < newestFirst.length, url };
}

/** The values of a collection, newest first (collections keep insertion order). */
export function newestFirst<T>(collection: Record<string, T>): T[] {
  return Object.values(collection).reverse();
}
