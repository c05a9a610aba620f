// The commission stage machine: which moves are legal from where, for whom, and what each needs.
// Pure: the caller loads the facts (approved spec, payments, setup sheet) and applies the result.
import {
  CANCELLED,
  DELIVERED,
  DEPOSIT,
  FINAL_SETUP,
  ON_HOLD,
  SPEC,
  isBuildStage,
  stageLabel,
  stageLine,
  type BuildStage,
} from "./stages";

export type Role = "owner" | "builder" | "bookkeeper" | "client";

/** What someone asks the machine to do. */
export type TransitionAction =
  | { kind: "advance" } // to the next stage of the line
  | { kind: "back" } // one stage back (owner; corrections)
  | { kind: "hold" }
  | { kind: "resume" }
  | { kind: "cancel" };

export type TransitionKind = TransitionAction["kind"];

export interface CommissionState {
  stage: string;
  /** Where an on-hold commission returns to. */
  heldFrom: string | null;
}

/** The facts the guards need, loaded by the caller. */
export interface GuardFacts {
  template: readonly BuildStage[];
  /** The latest spec version approved by the client, if any, and whether it has error-level issues. */
  approvedSpec: { id: number; hasErrors: boolean } | null;
  /** True when a spec version newer than the approved one exists (it needs approval again). */
  newerUnapprovedSpec: boolean;
  depositPaid: boolean;
  balancePaid: boolean;
  /** Whether the final setup sheet exists and is signed off; null while that feature has no sheet. */
  setupSheetSigned: boolean;
  /** The workshop requires the owner's sign-off before the client is told of a build stage. */
  requireOwnerSignoff: boolean;
}

export interface Actor {
  role: Role;
  /** The builder assigned to this commission is the actor. */
  isAssignedBuilder: boolean;
  /** The client of this commission is the actor. */
  isCommissionClient: boolean;
}

export interface PlannedTransition {
  ok: true;
  kind: TransitionKind;
  from: string;
  to: string;
  heldFrom: string | null;
  /** Tell the client now (false while the owner's sign-off is pending). */
  notifyClient: boolean;
  /** The move waits for the owner's sign-off before the client is told. */
  needsOwnerSignoff: boolean;
}

/** What a guard waits for: the client's approval, the deposit, the signed setup sheet, the balance. */
export type MissingGuard = "spec_approval" | "deposit" | "setup_sheet" | "balance";

export interface RefusedTransition {
  ok: false;
  /** "forbidden": this person may not; "conflict": nobody may right now (409). */
  kind: "forbidden" | "conflict";
  reason: string;
  /** What is missing, one line each, when a guard refused. */
  missing?: string[];
  /** The guard behind each line of `missing`, in the same order (pages link to where it is fixed). */
  missingGuards?: MissingGuard[];
}

export type TransitionResult = PlannedTransition | RefusedTransition;

const isClosed = (stage: string) => stage === DELIVERED || stage === CANCELLED;

function refuse(kind: RefusedTransition["kind"], reason: string, missing?: Array<{ guard: MissingGuard; text: string }>): RefusedTransition {
  return missing ? { ok: false, kind, reason, missing: missing.map((m) => m.text), missingGuards: missing.map((m) => m.guard) } : { ok: false, kind, reason };
}

/** Who may move a commission forward out of `stage`. */
function mayAdvance(stage: string, actor: Actor, template: readonly BuildStage[]): boolean {
  if (actor.role === "owner") return true;
  if (actor.role === "builder") return actor.isAssignedBuilder && (stage === SPEC || stage === DEPOSIT || isBuildStage(stage, template) || stage === FINAL_SETUP);
  // Recording a deposit is the bookkeeper's job; moving past it follows from that.
  if (actor.role === "bookkeeper") return stage === DEPOSIT;
  return false;
}

/** Guards for leaving `from` forward; empty when nothing is missing. */
function missingToLeave(from: string, facts: GuardFacts): Array<{ guard: MissingGuard; text: string }> {
  const missing: Array<{ guard: MissingGuard; text: string }> = [];
  const add = (guard: MissingGuard, text: string) => missing.push({ guard, text });
  if (from === SPEC) {
    if (!facts.approvedSpec) add("spec_approval", "The client has not approved a spec version yet.");
    else if (facts.approvedSpec.hasErrors) add("spec_approval", "The approved spec version has errors; draft a corrected version.");
    if (facts.newerUnapprovedSpec) add("spec_approval", "A newer spec version is waiting for the client's approval.");
  }
  if (from === DEPOSIT && !facts.depositPaid) add("deposit", "The deposit has not been paid.");
  if (from === FINAL_SETUP) {
    if (!facts.setupSheetSigned) add("setup_sheet", "The final setup sheet is not filled in and signed.");
    if (!facts.balancePaid) add("balance", "The balance has not been paid.");
  }
  return missing;
}

/**
 * Plans a move of one commission. Returns what to store (to, heldFrom) and whether to tell the
 * client, or a refusal with the reason in words.
 */
export function planTransition(state: CommissionState, action: TransitionAction, facts: GuardFacts, actor: Actor): TransitionResult {
  const { stage } = state;
  const line = stageLine(facts.template);
  const label = (s: string) => stageLabel(s, facts.template);

  if (actor.role === "client" && !(action.kind === "cancel" && stage === SPEC && actor.isCommissionClient)) {
    return refuse("forbidden", "Clients follow the build; the workshop moves it between stages.");
  }
  if (isClosed(stage)) return refuse("conflict", `The commission is ${label(stage).toLowerCase()}; it cannot change stage any more.`);

  switch (action.kind) {
    case "advance": {
      if (stage === ON_HOLD) return refuse("conflict", "The commission is on hold; resume it first.");
      const i = line.indexOf(stage);
      if (i < 0) return refuse("conflict", `The stage "${stage}" is no longer in the workshop's template; move it back to a known stage.`);
      const to = line[i + 1];
      if (!to) return refuse("conflict", "There is no stage after this one.");
      if (!mayAdvance(stage, actor, facts.template)) {
        return refuse("forbidden", actor.role === "builder" ? "Only the builder assigned to this commission or the owner can move it on." : "You cannot move this commission on.");
      }
      const missing = missingToLeave(stage, facts);
      if (missing.length) return refuse("conflict", `It cannot leave ${label(stage)} yet: ${missing.map((m) => m.text).join(" ")}`, missing);
      // Sign-off applies to moves between build stages and out of the last one, made by a builder.
      const intoOrWithinBuild = isBuildStage(stage, facts.template) || isBuildStage(to, facts.template);
      const needsOwnerSignoff = facts.requireOwnerSignoff && actor.role !== "owner" && intoOrWithinBuild && stage !== DEPOSIT;
      return { ok: true, kind: "advance", from: stage, to, heldFrom: null, notifyClient: !needsOwnerSignoff, needsOwnerSignoff };
    }
    case "back": {
      if (actor.role !== "owner") return refuse("forbidden", "Only the owner can move a commission back a stage.");
      if (stage === ON_HOLD) return refuse("conflict", "The commission is on hold; resume it first.");
      const i = line.indexOf(stage);
      if (i <= 0) return refuse("conflict", "There is no stage before this one.");
      const to = line[i - 1]!;
      // Going back into the deposit or spec stage is only sensible before money has moved.
      if ((to === DEPOSIT || to === SPEC) && facts.depositPaid) {
        return refuse("conflict", "The deposit is paid; the build cannot go back to the deposit or spec stage. Refund first, or draft a new spec version within the build.");
      }
      return { ok: true, kind: "back", from: stage, to, heldFrom: null, notifyClient: true, needsOwnerSignoff: false };
    }
    case "hold": {
      if (actor.role !== "owner" && !(actor.role === "builder" && actor.isAssignedBuilder)) {
        return refuse("forbidden", "Only the owner or the assigned builder can put a commission on hold.");
      }
      if (stage === ON_HOLD) return refuse("conflict", "The commission is already on hold.");
      return { ok: true, kind: "hold", from: stage, to: ON_HOLD, heldFrom: stage, notifyClient: true, needsOwnerSignoff: false };
    }
    case "resume": {
      if (actor.role !== "owner" && !(actor.role === "builder" && actor.isAssignedBuilder)) {
        return refuse("forbidden", "Only the owner or the assigned builder can resume a commission.");
      }
      if (stage !== ON_HOLD) return refuse("conflict", "The commission is not on hold.");
      const to = state.heldFrom && (line.includes(state.heldFrom) ? state.heldFrom : null);
      if (!to) return refuse("conflict", "The stage it was held in no longer exists in the template; the owner must choose where it resumes.");
      return { ok: true, kind: "resume", from: ON_HOLD, to, heldFrom: null, notifyClient: true, needsOwnerSignoff: false };
    }
    case "cancel": {
      const clientMay = actor.role === "client" && actor.isCommissionClient && stage === SPEC;
      if (actor.role !== "owner" && !clientMay) return refuse("forbidden", "Only the owner can cancel a commission (a client can withdraw a request while it is in the spec stage).");
      return { ok: true, kind: "cancel", from: stage, to: CANCELLED, heldFrom: null, notifyClient: true, needsOwnerSignoff: false };
    }
  }
}

/** Every move this actor could make now, with the refusals — for showing the right buttons. */
export function availableTransitions(state: CommissionState, facts: GuardFacts, actor: Actor): Array<{ action: TransitionKind; result: TransitionResult }> {
  const kinds: TransitionKind[] = ["advance", "back", "hold", "resume", "cancel"];
  return kinds.map((k) => ({ action: k, result: planTransition(state, { kind: k }, facts, actor) }));
}
