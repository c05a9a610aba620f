// Fuzzing every JSON body and query string the app reads: which routes (found in the source, as
// the matrix finds them), as whom (a caller the access table lets through), what to send (derived
// from the route's own zod schema, and from the row's valid request broken in one place), and what
// must hold for every answer: never a 5xx, never a stack trace or SQL text; our routes answer a
// rejection with our error body (400, or 422 with a field path on every issue; 404/409 when the
// input names something missing or the state forbids it); and nothing stored for the workshop
// changes on any rejected request (stored-state.ts, compared after every rejection).
import { join } from "node:path";
import fc from "fast-check";
import Stripe from "stripe";
import type { ZodType } from "zod";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { closeTestDb } from "../setup/test-db";
import { ACCESS_TABLE, type RouteRow } from "./access-table";
import { errorBodyProblems, leaksIn } from "./answer-checks";
import { findRoutes, ROOT, type FoundRoute, type SchemaRef } from "./inventory";
import { send, type RouteRequest } from "./send";
import { storedState } from "./stored-state";
import { makeWorld, type Caller, type World } from "./world";
import { broken, hostileValue, nearInvalid, nearValid, notJsonBody, queryString, wrongShapeBody } from "./zod-arbitrary";

export interface FuzzTarget {
  route: FoundRoute;
  row: RouteRow;
  part: "body" | "query";
  schemaRef: SchemaRef | null;
  /** Answers with our error body (made with our wrappers and readers), not a library's. */
  ours: boolean;
}

/** Every route that reads a body or a query string (and has its row), each part a target of its own. */
export function fuzzTargets(): FuzzTarget[] {
  const targets: FuzzTarget[] = [];
  for (const route of findRoutes()) {
    const row = ACCESS_TABLE[route.id];
    // A route without its row is the matrix's failure to report; it is fuzzed once it has one.
    if (!row || row.kind !== "route") continue;
    const ours = !route.library;
    const body = route.reads.body ?? null;
    const query = route.reads.query ?? null;
    const opaque = route.library || route.readsRaw;
    if (body || (opaque && route.method !== "GET")) targets.push({ route, row, part: "body", schemaRef: body, ours });
    if (query || (opaque && route.method === "GET")) targets.push({ route, row, part: "query", schemaRef: query, ours });
  }
  return targets;
}

/** The schema a target names, imported from its module (null for one defined inside a route file). */
export async function loadSchema(ref: SchemaRef | null): Promise<ZodType | null> {
  if (!ref?.from) return null;
  const file = ref.from.startsWith("@/") ? join(ROOT, ref.from.slice(2)) : ref.from;
  const mod = (await import(/* @vite-ignore */ file)) as Record<string, unknown>;
  return (mod[ref.name] as ZodType | undefined) ?? null;
}

/**
 * Who sends the fuzz: for a public route (the same answer signed out as for the owner) nobody;
 * otherwise the first of owner, builder, bookkeeper, client whom the access table lets through
 * (for a workshop's route a 404 means "not a member": not through).
 */
export function fuzzCaller(t: FuzzTarget): Caller {
  const { row, route } = t;
  if (row.expect.anonymous === row.expect.owner) return "anonymous";
  const refused = route.wrapper === "withWorkshop" ? [401, 403, 404] : [401, 403];
  const through = (["owner", "builder", "bookkeeper", "client"] as const).find((c) => !refused.includes(row.expect[c]));
  if (!through) throw new Error("no caller gets through this route");
  return through;
}

/** One fuzz input: a JSON value, a raw text body, or a query string; headers to add. */
export interface FuzzInput {
  json?: unknown;
  raw?: string;
  query?: string;
  headers?: Record<string, string>;
  /** Signed as the payment processor would (a library's answer to an event it cannot use may be a retryable 503). */
  signed?: boolean;
}

const stripeSigner = new Stripe("sk_test_fuzz_signer", { telemetry: false });
const STRIPE_EVENT_TYPES = [
  "checkout.session.completed",
  "checkout.session.expired",
  "checkout.session.async_payment_succeeded",
  "payment_intent.succeeded",
  "payment_intent.payment_failed",
  "charge.refunded",
  "refund.updated",
  "customer.created",
];

/** Events with a valid signature and arbitrary content: what the webhook does once it trusts the bytes. */
function signedStripeEvents(): fc.Arbitrary<FuzzInput> {
  const object = fc.oneof(
    fc.record({ id: fc.oneof(fc.constant("cs_test_fuzz"), fc.string({ maxLength: 30 })), object: fc.constantFrom("checkout.session", "payment_intent", "charge", "refund"), metadata: fc.dictionary(fc.constantFrom("scalewright_workshop_id", "scalewright_commission_id", "scalewright_invoice", "x"), hostileValue) }),
    fc.jsonValue({ maxDepth: 3 }),
  );
  return fc
    .record({ id: fc.string({ maxLength: 30 }), type: fc.oneof(fc.constantFrom(...STRIPE_EVENT_TYPES), fc.string({ maxLength: 40 })), data: fc.oneof(fc.record({ object }), hostileValue), created: fc.integer() }, { requiredKeys: [] })
    .map((event) => {
      const payload = JSON.stringify(event);
      const header = stripeSigner.webhooks.generateTestHeaderString({ payload, secret: process.env.STRIPE_WEBHOOK_SECRET ?? "whsec_fake_local_secret" });
      return { raw: payload, headers: { "content-type": "application/json", "stripe-signature": header }, signed: true };
    });
}

/** What to send to a target: schema-derived, the row's own request broken, wrong shapes, not JSON. */
export function inputsFor(t: FuzzTarget, schema: ZodType | null, valid: RouteRequest): fc.Arbitrary<FuzzInput> {
  if (t.part === "query") {
    const given = valid.path.includes("?") ? valid.path.slice(valid.path.indexOf("?") + 1) : "";
    const known = [...new URLSearchParams(given).keys()];
    return fc.oneof(queryString(schema, known).map((query) => ({ query })), queryString(schema, known).map((q) => ({ query: given ? `${given}&${q}` : q })));
  }
  const form = valid.headers?.["content-type"] === "application/x-www-form-urlencoded";
  if (form) {
    // A form post (Auth.js): arbitrary fields and values, with the row's own fields broken.
    const fields = fc.dictionary(fc.constantFrom("email", "password", "csrfToken", "callbackUrl", "redirect", "json", "token"), hostileValue.map((v) => (typeof v === "string" ? v : JSON.stringify(v) ?? "")), { maxKeys: 5 });
    return fields.map((f) => ({ raw: new URLSearchParams(f).toString(), headers: { "content-type": "application/x-www-form-urlencoded" } }));
  }
  const json = (a: fc.Arbitrary<unknown>) => a.map((v) => ({ json: v, headers: valid.headers }));
  const options: Array<fc.WeightedArbitrary<FuzzInput>> = [
    { weight: 3, arbitrary: json(broken(fc.constant(valid.json))) },
    { weight: 1, arbitrary: json(wrongShapeBody) },
    { weight: 1, arbitrary: notJsonBody.map((raw) => ({ raw, headers: { ...valid.headers, "content-type": "application/json" } })) },
  ];
  if (schema) options.push({ weight: 4, arbitrary: json(nearInvalid(schema)) }, { weight: 1, arbitrary: json(nearValid(schema)) });
  if (t.route.pattern === "/api/webhooks/stripe") options.push({ weight: 3, arbitrary: signedStripeEvents() });
  return fc.oneof(...options);
}

/** The request of one fuzz input, on the row's own path and method. */
export function requestOf(valid: RouteRequest, input: FuzzInput): RouteRequest {
  const path = valid.path.split("?")[0]!;
  if (input.query !== undefined) return { ...valid, path: input.query ? `${path}?${input.query}` : path };
  const req: RouteRequest = { path: valid.path, method: valid.method ?? "POST", headers: { ...valid.headers, ...input.headers } };
  if (input.raw !== undefined) req.body = input.raw;
  else if (input.json !== undefined) req.json = input.json;
  return req;
}

/** Statuses a rejection of ours may have besides 400/422: something named is missing, or the state forbids it. */
const OTHER_REJECTIONS = new Set([404, 409]);

export interface FuzzTally {
  cases: number;
  byStatus: Record<number, number>;
}

/**
 * Runs `numRuns` inputs at a target as `who` and checks each answer (fast-check shrinks a failing
 * input to a small one and prints it with its seed).
 */
export async function fuzzTarget(w: World, t: FuzzTarget, opts: { numRuns: number; tally: FuzzTally; prepared: unknown; who: Caller }): Promise<void> {
  const schema = await loadSchema(t.schemaRef);
  const valid = t.row.request(w, opts.prepared, opts.who);
  const session = w.as[opts.who];
  let current = await storedState(w.a.id);
  let n = 0;
  await fc.assert(
    fc.asyncProperty(inputsFor(t, schema, valid), async (input) => {
      const req = requestOf(valid, input);
      // Spread over many source addresses, so per-IP limits (public routes) never answer instead.
      const res = await send(session, req, { localAddress: `127.0.9.${10 + (n++ % 200)}` });
      const text = await res.text();
      opts.tally.cases++;
      opts.tally.byStatus[res.status] = (opts.tally.byStatus[res.status] ?? 0) + 1;
      const json = (res.headers.get("content-type") ?? "").includes("json");
      const what = `${req.method ?? "GET"} ${req.path} ${req.body ?? JSON.stringify(req.json) ?? ""}`.slice(0, 300);
      const retryable = input.signed && res.status === 503 && /"code":"unavailable"/.test(text);
      expect(res.status < 500 || retryable, `${res.status} for ${what}: ${text.slice(0, 300)}`).toBe(true);
      if (res.status >= 400 || json) expect(leaksIn(text), `${what}: ${text.slice(0, 300)}`).toEqual([]);
      if (t.ours && res.status >= 400 && !retryable) {
        expect(res.status === 400 || res.status === 422 || OTHER_REJECTIONS.has(res.status), `${res.status} for ${what}: ${text.slice(0, 300)}`).toBe(true);
        expect(errorBodyProblems(res.status, json ? JSON.parse(text) : text), what).toEqual([]);
      }
      const after = await storedState(w.a.id);
      if (res.status >= 400) expect(after, `a rejected request (${res.status}) changed what is stored: ${what}`).toEqual(current);
      current = after;
    }),
    { numRuns: opts.numRuns },
  );
}

/**
 * Runs per target: the file's budget of cases shared by its targets (at least `floor` each), so
 * more routes do not make the run longer; FUZZ_RUNS (one number for every target) overrides it.
 */
export function runsPerTarget(budget: number, targets: number, floor = 30): number {
  if (Number(process.env.FUZZ_RUNS) > 0) return Number(process.env.FUZZ_RUNS);
  return Math.max(floor, Math.floor(budget / Math.max(1, targets)));
}

/** A line per target and the total, for the test log (how many cases ran and how they were answered). */
export function tallyReport(tallies: Map<string, FuzzTally>): string {
  let total = 0;
  const lines = [...tallies].map(([id, t]) => {
    total += t.cases;
    const statuses = Object.entries(t.byStatus).map(([s, n]) => `${s}×${n}`).join(" ");
    return `  ${id}: ${t.cases} cases (${statuses})`;
  });
  return `fuzzed ${tallies.size} targets, ${total} cases\n${lines.join("\n")}`;
}

/**
 * One fuzz file: a world of its own, a test per target (its share of `budget` cases, run by
 * `run`), and the tally of cases and statuses printed at the end.
 */
export function describeFuzzOf<T>(
  title: string,
  targets: T[],
  opts: { budget: number; minTargets: number; key: (t: T) => string; label: (t: T) => string; run: (w: World, t: T, o: { numRuns: number; tally: FuzzTally }) => Promise<void> },
): void {
  const runs = runsPerTarget(opts.budget, targets.length);
  const tallies = new Map<string, FuzzTally>();
  let w: World;
  beforeAll(async () => {
    w = await makeWorld();
  }, 180_000);
  afterAll(async () => {
    console.log(tallyReport(tallies));
    await closeTestDb();
  });
  vi.setConfig({ testTimeout: 300_000 });
  describe(title, () => {
    it("finds the targets in the source", () => {
      if (targets.length < opts.minTargets) throw new Error(`only ${targets.length} targets found`);
    });
    for (const t of targets) {
      it(opts.label(t), async () => {
        const tally: FuzzTally = { cases: 0, byStatus: {} };
        tallies.set(opts.key(t), tally);
        await opts.run(w, t, { numRuns: runs, tally });
      });
    }
  });
}

/** A fuzz file of route targets (fuzzTargets), each sent inputsFor it by fuzzCaller. */
export function describeFuzz(title: string, targets: FuzzTarget[], opts: { budget: number; minTargets: number; label: (t: FuzzTarget) => string }): void {
  describeFuzzOf(title, targets, {
    ...opts,
    key: (t) => `${t.part} ${t.route.id}`,
    run: async (w, t, { numRuns, tally }) => fuzzTarget(w, t, { numRuns, tally, prepared: await t.row.prepare?.(w), who: fuzzCaller(t) }),
  });
}
