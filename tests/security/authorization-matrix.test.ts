// The authorization matrix, generated from the code: every route handler (each exported HTTP
// method of every app/**/route.ts) and every server action (each export of every "use server"
// module) found by reading the source is called as every caller of tests/security/world.ts
// against the app `npm test` serves, and its answers are compared with ONE table
// (tests/security/access-table.ts). A route or action without a row fails, as does a row without a
// route or action. Actions are called over HTTP the way the browser calls them (server-actions.ts).
// Also checked on every answer: no stack trace or SQL; our error body with the code of the status;
// the permission table's own 403 and 401 words; a member of another workshop answered exactly like
// a workshop that does not exist; workshop answers never cacheable by a shared cache.
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { closeTestDb } from "../setup/test-db";
import { ACCESS_TABLE, type ActionRow, type Expect, type Row, type RouteRow } from "./access-table";
import { errorBodyProblems, leaksIn } from "./answer-checks";
import { findActions, findInlineActions, findRoutes, type FoundAction, type FoundRoute } from "./inventory";
import { send } from "./send";
import { actionOutcome, builtActions, callAction, pageFor, pagePath, type BuiltAction } from "./server-actions";
import { CALLERS, makeWorld, type Caller, type World } from "./world";

const routes = findRoutes();
const actions = findActions();
const built = new Map(builtActions().map((a) => [`${a.filename}#${a.exportedName}`, a]));
const UNKNOWN_SLUG = "no-such-workshop-here";
const NO_PERMISSION = "You do not have permission to do this.";

let w: World;
beforeAll(async () => {
  w = await makeWorld();
}, 180_000);
afterAll(closeTestDb);
// Each row makes its own objects (some walk a commission to final setup) and calls 8 callers.
vi.setConfig({ testTimeout: 120_000 });

describe("the access table covers the code", () => {
  it("finds the route handlers and server actions by reading the source", () => {
    expect(routes.length).toBeGreaterThan(40);
    expect(actions.length).toBeGreaterThan(20);
    expect(findInlineActions(), "inline \"use server\" functions: move them into an actions.ts").toEqual([]);
  });

  it("has a row for every route handler and server action, and none for one that is gone", () => {
    const found = new Set([...routes.map((r) => r.id), ...actions.map((a) => a.id)]);
    const rows = Object.keys(ACCESS_TABLE);
    expect({ withoutRow: [...found].filter((id) => !(id in ACCESS_TABLE)), rowWithoutCode: rows.filter((id) => !found.has(id)) }).toEqual({ withoutRow: [], rowWithoutCode: [] });
    for (const r of routes) expect(ACCESS_TABLE[r.id]?.kind, r.id).toBe("route");
    for (const a of actions) expect(ACCESS_TABLE[a.id]?.kind, a.id).toBe("action");
  });

  it("finds the same server actions in the build the test app runs (each reachable from a page)", () => {
    expect([...built.keys()].sort()).toEqual(actions.map((a) => a.id).sort());
  });
});

interface Answer {
  status: number;
  text: string;
  headers: Headers;
  /** A route's JSON body or an action's return value. */
  body: unknown;
}

async function retryWhileUnavailable(row: Row, attempt: () => Promise<Answer>): Promise<Answer> {
  for (let n = 1; ; n++) {
    const a = await attempt();
    if (!row.usesUploads || a.status !== 503 || n >= 20) return a;
    await new Promise((r) => setTimeout(r, 1_000));
  }
}

async function callRoute(row: RouteRow, t: unknown, who: Caller, slug = w.slug): Promise<Answer> {
  const req = row.request(w, t, who);
  if (slug !== w.slug) req.path = req.path.replace(`/api/workshops/${w.slug}/`, `/api/workshops/${slug}/`);
  const res = await send(w.as[who], req);
  const text = await res.text();
  let body: unknown;
  try {
    body = (res.headers.get("content-type") ?? "").includes("json") ? JSON.parse(text) : undefined;
  } catch {
    body = undefined;
  }
  return { status: res.status, text, headers: res.headers, body };
}

async function callServerAction(row: ActionRow, found: BuiltAction, t: unknown, who: Caller, slug = w.slug): Promise<Answer> {
  const args = row.args(w, t, who);
  if (slug !== w.slug && args[0] === w.slug) args[0] = slug;
  const path = pagePath(pageFor(found), { workshop: w.slug, token: "matrix-token", ...(row.segments?.(w, t) ?? {}) });
  const a = await callAction(w.as[who], found.id, path, args);
  return { status: actionOutcome(a), text: a.text, headers: new Headers(), body: a.result };
}

/** What must hold for one answer besides its status. */
function answerProblems(row: Row, route: FoundRoute | null, who: Caller, want: number, a: Answer): string[] {
  const problems = leaksIn(a.text).map((l) => `${who}: ${l} in the answer`);
  if (a.status >= 500) problems.push(`${who}: ${a.status}`);
  const ruled = row.ruleRefusals?.includes(who) ?? false;
  if (route?.wrapper) {
    // Answers that depend on who asks: never stored by a shared cache.
    if (!/\b(private|no-store)\b/.test(a.headers.get("cache-control") ?? "")) problems.push(`${who}: Cache-Control ${a.headers.get("cache-control")}`);
    if (a.status >= 400) problems.push(...errorBodyProblems(a.status, a.body).map((p) => `${who}: ${p}`));
    const e = (a.body as { error?: { message?: string } } | undefined)?.error;
    if (a.status === 401 && !ruled && e?.message !== "Sign in to continue.") problems.push(`${who}: 401 says ${e?.message}`);
    if (a.status === 403 && want === 403 && !ruled && e?.message !== NO_PERMISSION) problems.push(`${who}: 403 says ${e?.message}`);
    if (a.status === 403 && ruled && e?.message === NO_PERMISSION) problems.push(`${who}: a rule's 403 should say why, not the generic refusal`);
  }
  if (row.kind === "action" && a.status !== 200 && a.status !== 303) {
    const r = a.body as { ok?: boolean; code?: string; message?: string; fieldErrors?: unknown } | undefined;
    if (!r || r.ok !== false || typeof r.message !== "string" || typeof r.fieldErrors !== "object") problems.push(`${who}: action failure without { ok: false, code, message, fieldErrors }`);
    else {
      if (a.status === 401 && !ruled && r.message !== "Sign in to continue.") problems.push(`${who}: 401 says ${r.message}`);
      if (a.status === 403 && !ruled && r.message !== NO_PERMISSION) problems.push(`${who}: 403 says ${r.message}`);
    }
  }
  return problems;
}

/** Calls one row as every caller; then, for a workshop's row, as its owner under an unknown slug. */
async function runRow(id: string, route: FoundRoute | null, found: BuiltAction | null) {
  const row = ACCESS_TABLE[id];
  if (!row) throw new Error(`${id} has no row in tests/security/access-table.ts: add one (DEVELOPERS.md, "Authorization matrix")`);
  const t = await row.prepare?.(w);
  const call = (who: Caller, slug?: string) =>
    retryWhileUnavailable(row, () => (row.kind === "route" ? callRoute(row, t, who, slug) : callServerAction(row, found!, t, who, slug)));
  const got = {} as Expect;
  const problems: string[] = [];
  let outsider: Answer | undefined;
  for (const who of CALLERS) {
    const a = await call(who);
    got[who] = a.status;
    problems.push(...answerProblems(row, route, who, row.expect[who], a));
    if (who === "outsider") outsider = a;
  }
  const aboutWorkshop = route ? route.wrapper === "withWorkshop" : (row as ActionRow).args(w, t, "owner")[0] === w.slug;
  if (aboutWorkshop && row.expect.outsider === 404) {
    // Not a member and no such workshop must be indistinguishable.
    const unknown = await call("owner", UNKNOWN_SLUG);
    const notFound = row.kind === "route" ? { error: { code: "not_found", message: "No such workshop." } } : { ok: false, code: "not_found", message: "No such workshop.", fieldErrors: {} };
    expect({ outsider: outsider!.body, unknownWorkshop: unknown.body }).toEqual({ outsider: notFound, unknownWorkshop: notFound });
  }
  expect({ status: got, problems }).toEqual({ status: row.expect, problems: [] });
}

describe("every route handler, as every caller", () => {
  for (const r of routes) it(r.id, () => runRow(r.id, r, null));
});

describe("every server action, over HTTP as the browser calls it, as every caller", () => {
  for (const a of actions) {
    it(a.id, () => {
      const found = built.get(a.id);
      if (!found) throw new Error(`${a.id} is not in the build's server-reference manifest`);
      return runRow(a.id, null, found);
    });
  }
});
