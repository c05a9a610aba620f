// Fuzzing the input of every server action of a workshop's pages, sent over HTTP as the browser
// sends it (server-actions.ts): the access row's valid input broken in one place (or two), wrong
// shapes, by a member whose role the row lets through. Every answer: the action ran (never a 5xx),
// no stack trace or SQL text, a refusal is `{ ok: false, code, message, fieldErrors }` with the code
// of a 400/422 (bad input) or 404/409 (something named is missing, the state forbids it), and
// nothing stored for the workshop changed on a refusal (stored-state.ts). About 600 cases shared.
import fc from "fast-check";
import { expect } from "vitest";
import { ACCESS_TABLE, type ActionRow } from "./access-table";
import { leaksIn } from "./answer-checks";
import { describeFuzzOf } from "./fuzz-harness";
import { findActions } from "./inventory";
import { actionOutcome, builtActions, callAction, pageFor, pagePath } from "./server-actions";
import { storedState } from "./stored-state";
import type { Caller } from "./world";
import { broken, wrongShapeBody } from "./zod-arbitrary";

const built = new Map(builtActions().map((a) => [`${a.filename}#${a.exportedName}`, a]));
const REFUSALS = new Set([400, 404, 409, 422]);

interface ActionTarget {
  id: string;
  row: ActionRow;
}

const targets: ActionTarget[] = findActions()
  .map((a) => ({ id: a.id, row: ACCESS_TABLE[a.id] as ActionRow }))
  // A workshop's actions: (slug, input), a member lets through (the account and sign-in actions
  // are per-person and rate-limited per address; their forms are covered by their own tests).
  // (Signed out 401, another workshop's owner 404, the workshop's owner let through.)
  .filter((t) => t.row?.kind === "action" && t.row.expect.anonymous === 401 && t.row.expect.outsider === 404 && t.row.expect.owner !== 404);

/** The first member the row lets through (a 401/403/404 is a refusal of who, not of what). */
function throughCaller(row: ActionRow): Caller {
  const who = (["owner", "builder", "bookkeeper", "client"] as const).find((c) => ![401, 403, 404].includes(row.expect[c]));
  if (!who) throw new Error("no member gets through this action");
  return who;
}

describeFuzzOf<ActionTarget>("fuzzing the input of every workshop server action", targets, {
  budget: 600,
  minTargets: 15,
  key: (t) => `action ${t.id}`,
  label: (t) => t.id,
  async run(w, t, { numRuns, tally }) {
    const prepared = await t.row.prepare?.(w);
    const who = throughCaller(t.row);
    const [slug, input, ...rest] = t.row.args(w, prepared, who);
    expect(slug, "a workshop action's first argument is the slug").toBe(w.slug);
    const found = built.get(t.id);
    if (!found) throw new Error(`${t.id} is not in the build's server-reference manifest`);
    const path = pagePath(pageFor(found), { workshop: w.slug, ...(t.row.segments?.(w, prepared) ?? {}) });
    let current = await storedState(w.a.id);
    const inputs = fc.oneof({ weight: 5, arbitrary: broken(fc.constant(input)) }, { weight: 1, arbitrary: wrongShapeBody });
    await fc.assert(
      fc.asyncProperty(inputs, async (bad) => {
        const a = await callAction(w.as[who], found.id, path, [slug, bad, ...rest]);
        const what = `${t.id}(${JSON.stringify(bad)?.slice(0, 200)})`;
        tally.cases++;
        expect(a.httpStatus < 500, `${a.httpStatus} for ${what}: ${a.text.slice(0, 300)}`).toBe(true);
        expect(leaksIn(a.text), what).toEqual([]);
        const outcome = actionOutcome(a);
        tally.byStatus[outcome] = (tally.byStatus[outcome] ?? 0) + 1;
        if (outcome >= 400) {
          expect(REFUSALS.has(outcome), `${outcome} for ${what}`).toBe(true);
          const r = a.result as { message?: unknown; fieldErrors?: unknown };
          expect(typeof r.message === "string" && r.message.length > 2 && typeof r.fieldErrors === "object", what).toBe(true);
        }
        const after = await storedState(w.a.id);
        if (outcome >= 400) expect(after, `a refused action (${outcome}) changed what is stored: ${what}`).toEqual(current);
        current = after;
      }),
      { numRuns },
    );
  },
});
