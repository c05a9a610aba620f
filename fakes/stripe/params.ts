// Reading form-encoded Stripe parameters (`metadata[x]=y`, `line_items[0][quantity]=1`), with
// errors that name the parameter the way the API does.
import qs from "qs";
import { invalid, missingParam } from "./errors";
import type { Metadata } from "./types";

export type Params = Record<string, unknown>;

/** Parses a form body or query string into nested objects and arrays. */
export function parseForm(text: string): Params {
  return qs.parse(text, { depth: 10, arrayLimit: 200, parameterLimit: 5000, allowDots: false }) as Params;
}

export function optString(p: Params, key: string, path = key, max = 5000): string | null {
  const v = p[key];
  if (v === undefined || v === "") return null;
  if (typeof v !== "string") throw invalid(`Invalid string: ${path} must be a string.`, path);
  if (v.length > max) throw invalid(`Invalid string: ${path} must be at most ${max} characters.`, path);
  return v;
}

export function reqString(p: Params, key: string, path = key, max = 5000): string {
  const v = optString(p, key, path, max);
  if (v === null) throw missingParam(path);
  return v;
}

export function optInt(p: Params, key: string, path = key, min = 0): number | null {
  const v = p[key];
  if (v === undefined || v === "") return null;
  if (typeof v !== "string" || !/^-?\d+$/.test(v)) throw invalid(`Invalid integer: ${String(v)}`, path, "parameter_invalid_integer");
  const n = Number(v);
  if (!Number.isSafeInteger(n) || n < min) throw invalid(`This value must be greater than or equal to ${min}.`, path, "parameter_invalid_integer");
  return n;
}

export function optObject(p: Params, key: string, path = key): Params | null {
  const v = p[key];
  if (v === undefined || v === "") return null;
  if (typeof v !== "object" || v === null || Array.isArray(v)) throw invalid(`Invalid object: ${path}`, path);
  return v as Params;
}

export function optArray(p: Params, key: string, path = key): unknown[] {
  const v = p[key];
  if (v === undefined || v === "") return [];
  if (Array.isArray(v)) return v;
  // qs turns sparse or very long arrays into objects keyed "0", "1", …
  if (typeof v === "object" && v !== null && Object.keys(v).every((k) => /^\d+$/.test(k))) return Object.values(v);
  if (typeof v === "string") return [v];
  throw invalid(`Invalid array: ${path}`, path);
}

/** Metadata as Stripe limits it: at most 50 keys, keys up to 40 characters, values up to 500. */
export function metadata(p: Params, key = "metadata", path = key): Metadata {
  const v = optObject(p, key, path);
  if (!v) return {};
  const out: Metadata = {};
  const entries = Object.entries(v);
  if (entries.length > 50) throw invalid("You can specify up to 50 keys in metadata.", path);
  for (const [k, val] of entries) {
    if (k.length > 40) throw invalid(`Metadata keys must be at most 40 characters (${k}).`, `${path}[${k}]`);
    if (typeof val !== "string") throw invalid("Metadata values must be strings.", `${path}[${k}]`);
    if (val.length > 500) throw invalid("Metadata values must be at most 500 characters.", `${path}[${k}]`);
    if (val !== "") out[k] = val;
  }
  return out;
}

/** `expand[]` as a list of dotted paths. */
export function expandList(p: Params): string[] {
  return optArray(p, "expand").filter((x): x is string => typeof x === "string");
}

/** Filters such as `created[gte]=…` or `created=…` on an integer field. */
export function rangeFilter(p: Params, key: string): ((n: number) => boolean) | null {
  const v = p[key];
  if (v === undefined || v === "") return null;
  if (typeof v === "string") {
    const exact = optInt(p, key);
    return (n) => n === exact;
  }
  const r = optObject(p, key) ?? {};
  const bounds = ["gt", "gte", "lt", "lte"].map((op) => [op, optInt(r, op, `${key}[${op}]`)] as const);
  return (n) =>
    bounds.every(([op, b]) => b === null || (op === "gt" ? n > b : op === "gte" ? n >= b : op === "lt" ? n < b : n <= b));
}

/** An admin JSON body as Params: numbers and booleans become strings, like form fields. */
export function jsonParams(body: unknown): Params {
  if (!body || typeof body !== "object" || Array.isArray(body)) return {};
  return Object.fromEntries(
    Object.entries(body).map(([k, v]) => [k, typeof v === "number" || typeof v === "boolean" ? String(v) : v]),
  );
}
