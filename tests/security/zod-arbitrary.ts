// fast-check inputs derived from a zod schema (zod 4's own definition objects, read through
// `schema._zod.def`): a value close to what the schema accepts, and the same value broken in one
// place — a wrong type, a missing field, a huge or negative number, a number as text, unicode,
// deep nesting, extra fields, empty and oversized strings, an array where an object belongs.
import fc from "fast-check";
import type { ZodType } from "zod";

type Def = { type: string; [k: string]: any };
const defOf = (s: unknown): Def => (s as { _zod: { def: Def } })._zod.def;

type CheckDef = { check: string; value?: number; inclusive?: boolean; minimum?: number; maximum?: number; format?: string; pattern?: RegExp };
const checksOf = (d: Def): CheckDef[] => ((d.checks ?? []) as Array<{ _zod: { def: CheckDef } }>).map((c) => c._zod.def);

/** Strings, numbers and values that break parsers and databases, whatever the field. */
export const HOSTILE_SCALARS: unknown[] = [
  null,
  true,
  false,
  0,
  -1,
  -0,
  1.5,
  1e308,
  -1e308,
  2 ** 53 + 2,
  2 ** 63,
  -(2 ** 31) - 1,
  2 ** 32,
  "",
  " ",
  "NaN",
  "Infinity",
  "-Infinity",
  "1e309",
  "0x1F",
  "1_000",
  "null",
  "undefined",
  "true",
  "[]",
  "{}",
  "2027-02-30",
  "2027-13-01",
  "0000-00-00",
  "9999-12-31",
  "2027-03-31T25:61:00Z",
  "\u0000",
  "\u202e\u0301\ud83c\udfb8",
  "' OR '1'='1",
  "1; DROP TABLE users; --",
  "\\",
  "%",
  "_",
  "<script>alert(1)</script>",
  "__proto__",
  "constructor",
  "../../etc/passwd",
];

const OVERSIZED_STRING = "x".repeat(100_000);

/** n arrays inside each other around a value. */
const nest = (depth: number, inner: unknown): unknown => {
  let v = inner;
  for (let i = 0; i < depth; i++) v = [v];
  return v;
};

/** One value that does not belong in a field: hostile scalars, unicode, oversized, nested, wrong shapes. */
export const hostileValue: fc.Arbitrary<unknown> = fc.oneof(
  { weight: 6, arbitrary: fc.constantFrom(...HOSTILE_SCALARS) },
  { weight: 2, arbitrary: fc.string({ unit: "grapheme", maxLength: 40 }) },
  { weight: 1, arbitrary: fc.string({ unit: "binary", maxLength: 20 }) },
  { weight: 2, arbitrary: fc.oneof(fc.integer(), fc.double({ noNaN: false }), fc.bigInt().map(String), fc.double().map(String)) },
  { weight: 1, arbitrary: fc.constantFrom(OVERSIZED_STRING, Array.from({ length: 5_000 }, (_, i) => i), nest(500, 1), { a: { b: { c: { d: nest(50, {}) } } } }) },
  // JSON.parse makes "__proto__" an own key, as a request body would.
  { weight: 2, arbitrary: fc.constantFrom([], {}, [1, 2, 3], [null], { $gt: "" }, JSON.parse('{"__proto__":{"admin":true}}')) },
  { weight: 1, arbitrary: fc.jsonValue({ maxDepth: 3 }) },
);

function numberArb(d: Def): fc.Arbitrary<number> {
  let min = -1_000_000;
  let max = 1_000_000;
  let integer = false;
  for (const c of checksOf(d).concat(d.check ? [d as unknown as CheckDef] : [])) {
    if (c.check === "greater_than" && c.value !== undefined) min = c.value + (c.inclusive ? 0 : 1e-9);
    if (c.check === "less_than" && c.value !== undefined) max = c.value - (c.inclusive ? 0 : 1e-9);
    if (c.check === "number_format" && c.format && /int/.test(c.format)) integer = true;
  }
  if (min > max) [min, max] = [max, min];
  const [lo, hi] = [Math.ceil(Math.max(min, Number.MIN_SAFE_INTEGER)), Math.floor(Math.min(max, Number.MAX_SAFE_INTEGER))];
  const whole = lo <= hi ? fc.integer({ min: lo, max: hi }) : null;
  if (integer) return whole ?? fc.constant(lo);
  const real = fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
  return whole ? fc.oneof(whole, real) : real;
}

function stringArb(d: Def): fc.Arbitrary<string> {
  const checks = checksOf(d);
  const format = d.format ?? checks.find((c) => c.check === "string_format")?.format;
  const pattern: RegExp | undefined = d.pattern ?? checks.find((c) => c.check === "string_format")?.pattern;
  if (format === "date") return fc.date({ min: new Date("2000-01-01"), max: new Date("2100-12-31"), noInvalidDate: true }).map((x) => x.toISOString().slice(0, 10));
  if (format === "datetime") return fc.date({ min: new Date("2000-01-01"), max: new Date("2100-12-31"), noInvalidDate: true }).map((x) => x.toISOString());
  if (format === "email") return fc.emailAddress().map((e) => e.replace(/@.*$/, "@example.com"));
  if (pattern) return fc.stringMatching(pattern, { size: "small" });
  const min = checks.find((c) => c.check === "min_length")?.minimum ?? 0;
  const max = Math.min(checks.find((c) => c.check === "max_length")?.maximum ?? 60, Math.max(min, 60));
  return fc.string({ minLength: min, maxLength: max, unit: fc.oneof({ weight: 5, arbitrary: fc.constantFrom(..."abcdefghijklmnopqrstuvwxyz ") }, { weight: 1, arbitrary: fc.string({ unit: "grapheme", minLength: 1, maxLength: 1 }) }) });
}

/**
 * A value the schema is likely to accept (constraints it declares are respected where zod exposes
 * them; refinements are not, so some of these are still refused — also worth sending).
 */
export function nearValid(schema: ZodType, depth = 0): fc.Arbitrary<unknown> {
  const d = defOf(schema);
  if (depth > 8) return fc.constant(null);
  const inner = (s: unknown) => nearValid(s as ZodType, depth + 1);
  switch (d.type) {
    case "object": {
      const shape = d.shape as Record<string, ZodType>;
      const entries = Object.entries(shape);
      const optional = (s: ZodType) => ["optional", "default", "prefault"].includes(defOf(s).type);
      return fc.record(Object.fromEntries(entries.map(([k, s]) => [k, inner(s)])), { requiredKeys: entries.filter(([, s]) => !optional(s)).map(([k]) => k) });
    }
    case "string":
      return stringArb(d);
    case "number":
      return numberArb(d);
    case "int":
      return numberArb({ ...d, checks: [...(d.checks ?? [])] }).map(Math.round);
    case "bigint":
      return fc.bigInt({ min: -(2n ** 40n), max: 2n ** 40n }).map(String);
    case "boolean":
      return fc.boolean();
    case "enum":
      return fc.constantFrom(...Object.values(d.entries as Record<string, string | number>));
    case "literal":
      return fc.constantFrom(...(d.values as unknown[]));
    case "array": {
      const max = checksOf(d).find((c) => c.check === "max_length")?.maximum ?? 4;
      const min = checksOf(d).find((c) => c.check === "min_length")?.minimum ?? 0;
      return fc.array(inner(d.element), { minLength: min, maxLength: Math.max(min, Math.min(max, 4)) });
    }
    case "tuple":
      return fc.tuple(...(d.items as ZodType[]).map(inner));
    case "record":
      return fc.dictionary(fc.string({ minLength: 1, maxLength: 12 }), inner(d.valueType), { maxKeys: 4 });
    case "optional":
      return fc.option(inner(d.innerType), { nil: undefined, freq: 4 });
    case "nullable":
      return fc.option(inner(d.innerType), { nil: null, freq: 4 });
    case "default":
    case "prefault":
      return fc.option(inner(d.innerType), { nil: undefined, freq: 3 });
    case "catch":
    case "readonly":
    case "nonoptional":
      return inner(d.innerType);
    case "union":
      return fc.oneof(...(d.options as ZodType[]).map(inner));
    case "intersection":
      return fc.tuple(inner(d.left), inner(d.right)).map(([l, r]) => (isPlainObject(l) && isPlainObject(r) ? { ...l, ...r } : l));
    case "pipe":
      return inner(defOf(d.in).type === "transform" ? d.out : d.in);
    case "lazy":
      return inner(d.getter());
    case "null":
      return fc.constant(null);
    case "date":
      return fc.date({ noInvalidDate: true }).map((x) => x.toISOString());
    default:
      return fc.jsonValue({ maxDepth: 2 });
  }
}

const isPlainObject = (v: unknown): v is Record<string, unknown> => typeof v === "object" && v !== null && !Array.isArray(v);

/** Every path into a JSON value (objects and arrays), the root included as []. */
function pathsOf(v: unknown, at: Array<string | number> = [], out: Array<Array<string | number>> = []): Array<Array<string | number>> {
  out.push(at);
  if (Array.isArray(v)) v.forEach((x, i) => pathsOf(x, [...at, i], out));
  else if (isPlainObject(v)) for (const [k, x] of Object.entries(v)) pathsOf(x, [...at, k], out);
  return out;
}

type Mutation = "replace" | "remove" | "extra" | "wrap-array" | "empty-string" | "stringify";

/** Changes a copy of `value` at `path` in one way. */
function mutate(value: unknown, path: Array<string | number>, how: Mutation, bad: unknown, extraKey: string): unknown {
  const copy = value === undefined ? undefined : JSON.parse(JSON.stringify(value));
  if (path.length === 0) {
    if (how === "extra" && isPlainObject(copy)) return { ...copy, [extraKey]: bad };
    if (how === "wrap-array") return [copy];
    if (how === "stringify") return JSON.stringify(copy);
    return bad;
  }
  let parent: any = copy;
  for (const key of path.slice(0, -1)) parent = parent[key];
  const last = path[path.length - 1]!;
  const current = parent[last];
  switch (how) {
    case "remove":
      if (Array.isArray(parent)) parent.splice(Number(last), 1);
      else delete parent[last];
      break;
    case "extra":
      if (isPlainObject(current)) current[extraKey] = bad;
      else parent[last] = bad;
      break;
    case "wrap-array":
      parent[last] = [current];
      break;
    case "empty-string":
      parent[last] = "";
      break;
    case "stringify":
      parent[last] = typeof current === "string" ? Number(current) : String(current);
      break;
    default:
      parent[last] = bad;
  }
  return copy;
}

/** Values from `base` broken in one place (or two). */
export function broken(base: fc.Arbitrary<unknown>): fc.Arbitrary<unknown> {
  const once = (from: fc.Arbitrary<unknown>) =>
    fc
      .tuple(from, fc.nat(), fc.constantFrom<Mutation>("replace", "replace", "replace", "remove", "extra", "wrap-array", "empty-string", "stringify"), hostileValue, fc.constantFrom("extra", "__proto__", "workshopId", "workshop_id", "role", "id", "constructor"))
      .map(([v, n, how, bad, key]) => {
        const paths = pathsOf(v);
        return mutate(v, paths[n % paths.length]!, how, bad, key);
      });
  const one = once(base);
  return fc.oneof({ weight: 4, arbitrary: one }, { weight: 1, arbitrary: once(one) });
}

/** A near-valid value of the schema broken in one place (or two). */
export const nearInvalid = (schema: ZodType) => broken(nearValid(schema));

/** A whole body that is not the right shape at all. */
export const wrongShapeBody: fc.Arbitrary<unknown> = fc.oneof(
  fc.constantFrom(null, 0, "", "text", [], [{}], true, nest(2_000, 0)),
  fc.jsonValue({ maxDepth: 4 }),
  fc.array(fc.jsonValue({ maxDepth: 2 }), { maxLength: 5 }),
);

/** Raw request bodies that are not JSON (or barely): sent as they are, with a JSON content type. */
export const notJsonBody: fc.Arbitrary<string> = fc.oneof(
  fc.constantFrom("", "{", "}", "{'a':1}", '{"a":}', "\ufeff{}", "nul", "[1,]", '{"a":1}{"b":2}', "\u0000", `{"a":"${"\\u0000".repeat(10)}"}`, "1e999999", "-"),
  fc.string({ unit: "grapheme", maxLength: 60 }),
);

/** Longest query value sent: node answers a request line over 16 KB with 431 before the app sees it. */
const QUERY_VALUE_MAX = 2_000;

/** Query strings near the schema's field names (and `alsoKnown`), with values from the hostile pool (as text). */
export function queryString(schema: ZodType | null, alsoKnown: string[] = []): fc.Arbitrary<string> {
  const known = [...new Set([...(schema && defOf(schema).type === "object" ? Object.keys(defOf(schema).shape as object) : []), ...alsoKnown])];
  const key = fc.oneof({ weight: 4, arbitrary: known.length ? fc.constantFrom(...known) : fc.constant("q") }, { weight: 1, arbitrary: fc.string({ unit: "grapheme", maxLength: 12 }) }, { weight: 1, arbitrary: fc.constantFrom("__proto__", "workshopId", "a[b]", "a[]", "") });
  const text = (v: unknown) => (typeof v === "string" ? v : JSON.stringify(v) ?? "").slice(0, QUERY_VALUE_MAX);
  const valid = schema && defOf(schema).type === "object" ? nearValid(schema).map((o) => Object.entries(o as object).filter(([, v]) => v !== undefined).map(([k, v]) => [k, text(v)] as [string, string])) : fc.constant([] as Array<[string, string]>);
  const hostile = fc.array(fc.tuple(key, hostileValue.map(text)), { maxLength: 5 });
  return fc.tuple(valid, hostile).map(([good, bad]) => new URLSearchParams([...good, ...bad]).toString());
}
