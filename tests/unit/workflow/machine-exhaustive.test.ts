// Every move of the stage machine, exhaustively: each stage (and on-hold from each stage) × each
// action × each kind of actor × each missing guard, checked against the product's rules written
// out below as a plain decision table. The rules are the product's own (common practice of a
// custom shop, no source): no build before the deposit, no delivery before setup and balance, the
// client only withdraws a request, the owner alone steps back or cancels.
import { describe, expect, it } from "vitest";
import { availableTransitions, planTransition, type GuardFacts, type TransitionKind } from "@/lib/workflow/machine";
import { CANCELLED, DEFAULT_BUILD_STAGES, DELIVERED, DEPOSIT, FINAL_SETUP, ON_HOLD, SPEC, stageLine } from "@/lib/workflow/stages";
import { ACTORS, ALL_MET } from "./machine-fixtures";

const template = DEFAULT_BUILD_STAGES;
const line = stageLine(template);
const build = template.map((s) => s.key);
const ACTIONS: TransitionKind[] = ["advance", "back", "hold", "resume", "cancel"];

type ActorName = keyof typeof ACTORS;

const FACTS: Record<string, GuardFacts> = {
  allMet: ALL_MET,
  noApprovedSpec: { ...ALL_MET, approvedSpec: null },
  approvedSpecWithErrors: { ...ALL_MET, approvedSpec: { id: 1, hasErrors: true } },
  newerVersionWaiting: { ...ALL_MET, newerUnapprovedSpec: true },
  depositUnpaid: { ...ALL_MET, depositPaid: false },
  balanceUnpaid: { ...ALL_MET, balancePaid: false },
  setupSheetMissing: { ...ALL_MET, setupSheetSigned: false },
  signoffRequired: { ...ALL_MET, requireOwnerSignoff: true },
};

// Every state a commission can be in: each stage of the line, cancelled, a stage the template no
// longer has, and on hold from each open stage (and from a stage since removed).
const STATES: Array<{ stage: string; heldFrom: string | null }> = [
  ...line.map((stage) => ({ stage, heldFrom: null })),
  { stage: CANCELLED, heldFrom: null },
  { stage: "french_polish", heldFrom: null },
  ...line.slice(0, -1).map((s) => ({ stage: ON_HOLD, heldFrom: s })),
  { stage: ON_HOLD, heldFrom: "french_polish" },
];

type Expected = { ok: true; to: string; heldFrom: string | null; needsOwnerSignoff: boolean } | { ok: false; kind: "forbidden" | "conflict"; missing?: string[] };

const isBuild = (s: string) => build.includes(s);
const forbidden = (): Expected => ({ ok: false, kind: "forbidden" });
const conflict = (missing?: string[]): Expected => (missing ? { ok: false, kind: "conflict", missing } : { ok: false, kind: "conflict" });

/** The product's rules as a decision table, independent of the machine's code. */
function expected(state: { stage: string; heldFrom: string | null }, action: TransitionKind, who: ActorName, f: GuardFacts): Expected {
  const a = ACTORS[who];
  const { stage } = state;
  // Clients never move a build; their own client may withdraw it while it is still a request.
  if (a.role === "client") return action === "cancel" && stage === SPEC && a.isCommissionClient ? { ok: true, to: CANCELLED, heldFrom: null, needsOwnerSignoff: false } : forbidden();
  // Closed is closed, for everyone in the workshop.
  if (stage === DELIVERED || stage === CANCELLED) return conflict();
  const ownerOrAssigned = a.role === "owner" || a.isAssignedBuilder;
  switch (action) {
    case "advance": {
      if (stage === ON_HOLD || !line.includes(stage)) return conflict();
      const to = line[line.indexOf(stage) + 1]!;
      const may = a.role === "owner" || a.isAssignedBuilder || (a.role === "bookkeeper" && stage === DEPOSIT);
      if (!may) return forbidden();
      const missing: string[] = [];
      if (stage === SPEC) {
        if (!f.approvedSpec) missing.push("The client has not approved a spec version yet.");
        else if (f.approvedSpec.hasErrors) missing.push("The approved spec version has errors; draft a corrected version.");
        if (f.newerUnapprovedSpec) missing.push("A newer spec version is waiting for the client's approval.");
      }
      if (stage === DEPOSIT && !f.depositPaid) missing.push("The deposit has not been paid.");
      if (stage === FINAL_SETUP) {
        if (!f.setupSheetSigned) missing.push("The final setup sheet is not filled in and signed.");
        if (!f.balancePaid) missing.push("The balance has not been paid.");
      }
      if (missing.length) return conflict(missing);
      // A builder's move into, within or out of the build waits for the owner when the workshop asks.
      const needsOwnerSignoff = f.requireOwnerSignoff && a.role !== "owner" && stage !== DEPOSIT && (isBuild(stage) || isBuild(to));
      return { ok: true, to, heldFrom: null, needsOwnerSignoff };
    }
    case "back": {
      if (a.role !== "owner") return forbidden();
      if (stage === ON_HOLD || line.indexOf(stage) <= 0) return conflict();
      const to = line[line.indexOf(stage) - 1]!;
      if ((to === SPEC || to === DEPOSIT) && f.depositPaid) return conflict();
      return { ok: true, to, heldFrom: null, needsOwnerSignoff: false };
    }
    case "hold":
      if (!ownerOrAssigned) return forbidden();
      if (stage === ON_HOLD) return conflict();
      return { ok: true, to: ON_HOLD, heldFrom: stage, needsOwnerSignoff: false };
    case "resume":
      if (!ownerOrAssigned) return forbidden();
      if (stage !== ON_HOLD || !state.heldFrom || !line.includes(state.heldFrom)) return conflict();
      return { ok: true, to: state.heldFrom, heldFrom: null, needsOwnerSignoff: false };
    case "cancel":
      return a.role === "owner" ? { ok: true, to: CANCELLED, heldFrom: null, needsOwnerSignoff: false } : forbidden();
  }
}

describe("stage machine, every state × action × actor × guard", () => {
  const cases: Array<[string, { stage: string; heldFrom: string | null }, TransitionKind, ActorName, string]> = [];
  for (const state of STATES) for (const action of ACTIONS) for (const who of Object.keys(ACTORS) as ActorName[]) for (const facts of Object.keys(FACTS)) cases.push([`${state.stage}${state.heldFrom ? `(${state.heldFrom})` : ""} ${action} by ${who}, ${facts}`, state, action, who, facts]);

  it(`covers ${cases.length} combinations`, () => {
    expect(cases.length).toBe(STATES.length * ACTIONS.length * 6 * Object.keys(FACTS).length);
  });

  it("plans exactly what the rules allow and refuses the rest with the right kind", () => {
    const wrong: string[] = [];
    for (const [name, state, action, who, facts] of cases) {
      const got = planTransition(state, { kind: action }, FACTS[facts]!, ACTORS[who]);
      const want = expected(state, action, who, FACTS[facts]!);
      const gotShape = got.ok
        ? { ok: true, to: got.to, heldFrom: got.heldFrom, needsOwnerSignoff: got.needsOwnerSignoff }
        : { ok: false, kind: got.kind, ...(got.missing ? { missing: got.missing } : {}) };
      if (JSON.stringify(gotShape) !== JSON.stringify(want)) wrong.push(`${name}: got ${JSON.stringify(gotShape)}, want ${JSON.stringify(want)}`);
    }
    expect(wrong).toEqual([]);
  });

  it("gives every refusal a reason in words and every allowed move its bookkeeping", () => {
    for (const [name, state, action, who, facts] of cases) {
      const got = planTransition(state, { kind: action }, FACTS[facts]!, ACTORS[who]);
      if (!got.ok) {
        expect(got.reason, name).toMatch(/^[A-Z].{10,}[.)]$/);
        if (got.missing) expect(got.reason, name).toContain(got.missing[0]!);
      } else {
        expect(got.from, name).toBe(state.stage);
        expect(got.kind, name).toBe(action);
        // The client is told of every move at once unless the owner's sign-off is pending.
        expect(got.notifyClient, name).toBe(!got.needsOwnerSignoff);
      }
    }
  });

  it("lists the same answers for the buttons as planning each move", () => {
    for (const state of STATES) {
      for (const who of Object.keys(ACTORS) as ActorName[]) {
        const listed = availableTransitions(state, ALL_MET, ACTORS[who]);
        expect(listed.map((l) => l.action)).toEqual(ACTIONS);
        for (const l of listed) expect(l.result).toEqual(planTransition(state, { kind: l.action }, ALL_MET, ACTORS[who]));
      }
    }
  });

  it("lets a commission reach delivered only through every stage of the line in order", () => {
    // Breadth-first over every legal move of every actor with all guards met: the states reachable
    // from spec, and that delivered is never reached without passing final setup.
    const seen = new Set<string>([`${SPEC}|`]);
    const queue: Array<{ stage: string; heldFrom: string | null; path: string[] }> = [{ stage: SPEC, heldFrom: null, path: [SPEC] }];
    let deliveredPaths = 0;
    while (queue.length) {
      const s = queue.shift()!;
      for (const action of ACTIONS) {
        for (const who of Object.keys(ACTORS) as ActorName[]) {
          const r = planTransition(s, { kind: action }, ALL_MET, ACTORS[who]);
          if (!r.ok) continue;
          if (r.to === DELIVERED) {
            deliveredPaths++;
            expect(s.stage).toBe(FINAL_SETUP);
          }
          const key = `${r.to}|${r.heldFrom ?? ""}`;
          if (!seen.has(key)) {
            seen.add(key);
            queue.push({ stage: r.to, heldFrom: r.heldFrom, path: [...s.path, r.to] });
          }
        }
      }
    }
    expect(deliveredPaths).toBeGreaterThan(0);
    // Every stage of the line, cancelled, and on hold from each open stage.
    expect(seen.size).toBe(line.length + 1 + (line.length - 1));
  });
});
