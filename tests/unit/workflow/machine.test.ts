// The commission stage machine: every legal and illegal move. The rules are the product's own
// (what a workshop expects: no build before the deposit, no delivery before setup and balance).
import { describe, expect, it } from "vitest";
import { availableTransitions, planTransition, type TransitionKind } from "@/lib/workflow/machine";
import { CANCELLED, DEFAULT_BUILD_STAGES, DELIVERED, DEPOSIT, FINAL_SETUP, ON_HOLD, SPEC, stageLine, templateProblems } from "@/lib/workflow/stages";
import { ACTORS, ALL_MET } from "./machine-fixtures";

const template = DEFAULT_BUILD_STAGES;
const line = stageLine(template);
const firstBuild = template[0]!.key;
const lastBuild = template[template.length - 1]!.key;

const allMet = ALL_MET;
const { owner, assignedBuilder: builder, otherBuilder, bookkeeper, ownClient: client } = ACTORS;

const at = (stage: string, heldFrom: string | null = null) => ({ stage, heldFrom });

describe("stage line", () => {
  it("runs spec → deposit → the template → final setup → delivered", () => {
    expect(line).toEqual([SPEC, DEPOSIT, ...template.map((s) => s.key), FINAL_SETUP, DELIVERED]);
    expect(template).toHaveLength(6);
  });

  it("checks a template an owner edits", () => {
    expect(templateProblems(template)).toEqual([]);
    expect(templateProblems([])).toEqual([{ path: "stages", message: "Keep at least one build stage." }]);
    const bad = templateProblems([
      { key: "spec", label: "Spec again" },
      { key: "Bad Key", label: "" },
      { key: "x_y", label: "A" },
      { key: "x_y", label: "B" },
    ]);
    expect(bad.map((p) => p.path)).toEqual(["stages.0.key", "stages.1.key", "stages.1.label", "stages.3.key"]);
  });
});

describe("advance", () => {
  it("walks the whole line when every guard is met, the owner moving it", () => {
    let state = at(SPEC);
    const visited = [state.stage];
    for (let i = 0; i < line.length - 1; i++) {
      const r = planTransition(state, { kind: "advance" }, allMet, owner);
      expect(r.ok, `from ${state.stage}`).toBe(true);
      if (!r.ok) return;
      state = at(r.to);
      visited.push(r.to);
    }
    expect(visited).toEqual(line);
    expect(planTransition(state, { kind: "advance" }, allMet, owner)).toMatchObject({ ok: false, kind: "conflict" });
  });

  it("keeps the spec stage until a spec version without errors is approved", () => {
    const none = planTransition(at(SPEC), { kind: "advance" }, { ...allMet, approvedSpec: null }, builder);
    expect(none).toMatchObject({ ok: false, kind: "conflict", missing: ["The client has not approved a spec version yet."], missingGuards: ["spec_approval"] });
    const withErrors = planTransition(at(SPEC), { kind: "advance" }, { ...allMet, approvedSpec: { id: 2, hasErrors: true } }, builder);
    expect(withErrors.ok).toBe(false);
    const newer = planTransition(at(SPEC), { kind: "advance" }, { ...allMet, newerUnapprovedSpec: true }, builder);
    expect(newer).toMatchObject({ ok: false, missing: ["A newer spec version is waiting for the client's approval."] });
    expect(planTransition(at(SPEC), { kind: "advance" }, allMet, builder)).toMatchObject({ ok: true, to: DEPOSIT });
  });

  it("keeps the deposit stage until the deposit is paid; the bookkeeper may move it on then", () => {
    const unpaid = { ...allMet, depositPaid: false };
    const r = planTransition(at(DEPOSIT), { kind: "advance" }, unpaid, owner);
    expect(r).toMatchObject({ ok: false, kind: "conflict", missingGuards: ["deposit"] });
    if (!r.ok) expect(r.reason).toMatch(/deposit has not been paid/);
    expect(planTransition(at(DEPOSIT), { kind: "advance" }, allMet, bookkeeper)).toMatchObject({ ok: true, to: firstBuild });
    expect(planTransition(at(firstBuild), { kind: "advance" }, allMet, bookkeeper)).toMatchObject({ ok: false, kind: "forbidden" });
  });

  it("delivers only with a signed setup sheet and the balance paid, saying what is missing", () => {
    const r = planTransition(at(FINAL_SETUP), { kind: "advance" }, { ...allMet, setupSheetSigned: false, balancePaid: false }, owner);
    expect(r).toMatchObject({
      ok: false,
      kind: "conflict",
      missing: ["The final setup sheet is not filled in and signed.", "The balance has not been paid."],
      missingGuards: ["setup_sheet", "balance"],
    });
    expect(planTransition(at(FINAL_SETUP), { kind: "advance" }, allMet, builder)).toMatchObject({ ok: true, to: DELIVERED });
  });

  it("lets only the assigned builder or the owner advance build stages", () => {
    expect(planTransition(at(firstBuild), { kind: "advance" }, allMet, builder)).toMatchObject({ ok: true, to: template[1]!.key });
    expect(planTransition(at(firstBuild), { kind: "advance" }, allMet, otherBuilder)).toMatchObject({ ok: false, kind: "forbidden" });
    expect(planTransition(at(firstBuild), { kind: "advance" }, allMet, client)).toMatchObject({ ok: false, kind: "forbidden" });
  });

  it("holds the client's notice for the owner's sign-off when the workshop asks for it", () => {
    const signoff = { ...allMet, requireOwnerSignoff: true };
    expect(planTransition(at(firstBuild), { kind: "advance" }, signoff, builder)).toMatchObject({
      ok: true,
      needsOwnerSignoff: true,
      notifyClient: false,
    });
    expect(planTransition(at(lastBuild), { kind: "advance" }, signoff, builder)).toMatchObject({ ok: true, to: FINAL_SETUP, needsOwnerSignoff: true });
    // The owner's own moves, and leaving the deposit stage, need no sign-off.
    expect(planTransition(at(firstBuild), { kind: "advance" }, signoff, owner)).toMatchObject({ ok: true, needsOwnerSignoff: false, notifyClient: true });
    expect(planTransition(at(DEPOSIT), { kind: "advance" }, signoff, builder)).toMatchObject({ ok: true, needsOwnerSignoff: false });
  });

  it("refuses a stage the template no longer has", () => {
    expect(planTransition(at("french_polish"), { kind: "advance" }, allMet, owner)).toMatchObject({ ok: false, kind: "conflict" });
  });
});

describe("back, hold, resume, cancel", () => {
  it("lets the owner step back one stage, but not into deposit/spec once the deposit is paid", () => {
    expect(planTransition(at(template[2]!.key), { kind: "back" }, allMet, owner)).toMatchObject({ ok: true, to: template[1]!.key });
    expect(planTransition(at(firstBuild), { kind: "back" }, allMet, owner)).toMatchObject({ ok: false, kind: "conflict" });
    expect(planTransition(at(DEPOSIT), { kind: "back" }, { ...allMet, depositPaid: false }, owner)).toMatchObject({ ok: true, to: SPEC });
    expect(planTransition(at(SPEC), { kind: "back" }, allMet, owner)).toMatchObject({ ok: false, kind: "conflict" });
    expect(planTransition(at(template[2]!.key), { kind: "back" }, allMet, builder)).toMatchObject({ ok: false, kind: "forbidden" });
  });

  it("puts on hold from any open stage and resumes where it was", () => {
    for (const stage of line.slice(0, -1)) {
      const hold = planTransition(at(stage), { kind: "hold" }, allMet, builder);
      expect(hold).toMatchObject({ ok: true, to: ON_HOLD, heldFrom: stage });
      const resume = planTransition(at(ON_HOLD, stage), { kind: "resume" }, allMet, owner);
      expect(resume).toMatchObject({ ok: true, to: stage, heldFrom: null });
    }
    expect(planTransition(at(ON_HOLD, firstBuild), { kind: "hold" }, allMet, owner)).toMatchObject({ ok: false, kind: "conflict" });
    expect(planTransition(at(ON_HOLD, firstBuild), { kind: "advance" }, allMet, owner)).toMatchObject({ ok: false, kind: "conflict" });
    expect(planTransition(at(firstBuild), { kind: "resume" }, allMet, owner)).toMatchObject({ ok: false, kind: "conflict" });
    expect(planTransition(at(ON_HOLD, "gone_stage"), { kind: "resume" }, allMet, owner)).toMatchObject({ ok: false, kind: "conflict" });
    expect(planTransition(at(firstBuild), { kind: "hold" }, allMet, otherBuilder)).toMatchObject({ ok: false, kind: "forbidden" });
  });

  it("cancels by the owner from any open stage; the client only withdraws a request in the spec stage", () => {
    for (const stage of [...line.slice(0, -1), ON_HOLD]) {
      expect(planTransition(at(stage, stage === ON_HOLD ? firstBuild : null), { kind: "cancel" }, allMet, owner)).toMatchObject({ ok: true, to: CANCELLED });
    }
    expect(planTransition(at(SPEC), { kind: "cancel" }, allMet, client)).toMatchObject({ ok: true, to: CANCELLED });
    expect(planTransition(at(DEPOSIT), { kind: "cancel" }, allMet, client)).toMatchObject({ ok: false, kind: "forbidden" });
    expect(planTransition(at(SPEC), { kind: "cancel" }, allMet, builder)).toMatchObject({ ok: false, kind: "forbidden" });
  });

  it("never moves a delivered or cancelled commission", () => {
    const kinds: TransitionKind[] = ["advance", "back", "hold", "resume", "cancel"];
    for (const stage of [DELIVERED, CANCELLED]) {
      for (const k of kinds) expect(planTransition(at(stage), { kind: k }, allMet, owner)).toMatchObject({ ok: false, kind: "conflict" });
    }
  });

  it("lists what an actor can do now", () => {
    const ok = availableTransitions(at(firstBuild), allMet, builder)
      .filter((t) => t.result.ok)
      .map((t) => t.action);
    expect(ok).toEqual(["advance", "hold"]);
  });
});
