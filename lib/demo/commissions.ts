// The demo commissions of one workshop: about 30, spread over every stage of its line, each with a
// believable past — spec versions, approvals, payments, builders' stage moves, comments — dated
// backwards from `now`. Pure and deterministic for a given workshop, template and time: every move
// is planned by the stage machine itself, so the story obeys the same rules as the app.
import { money, percentOf } from "@/lib/money/money";
import type { BuildOptions } from "@/lib/schemas/build-options";
import type { InstrumentSpec } from "@/lib/schemas/instrument-spec";
import { planTransition, type Actor, type GuardFacts, type TransitionAction } from "@/lib/workflow/machine";
import { SPEC, stageLabel, type BuildStage } from "@/lib/workflow/stages";
import { DEMO_DESIGNS } from "./commission-designs";
import { seededRandom } from "./seeded-random";
import { BUILD_TALK, CANCEL_NOTES, changeTalk, DELIVERY_TALK, HOLD_REASONS, NOTES_INTO, REQUEST_NOTES, SPEC_TALK, type Exchange } from "./commission-story";

/** Where a demo commission stands today, and the path that led there. */
export type Situation =
  | { at: "spec"; versions: "none" | "draft" | "sent" | "sent-revised"; openedByClient?: boolean; unassigned?: boolean }
  | { at: "deposit"; partPaid?: boolean }
  | { at: "build"; index: number; respec?: "approved" | "sent"; pendingSignoff?: boolean }
  | { at: "final_setup"; balancePaid: boolean }
  | { at: "delivered" }
  | { at: "on_hold"; from: "deposit" | "build" }
  | { at: "cancelled"; from: "spec" | "deposit" };

/** The 30 situations of a workshop's demo, in order (build indices wrap around the template). */
export const DEMO_SITUATIONS: ReadonlyArray<Situation & { overdue?: boolean }> = [
  { at: "spec", versions: "none", openedByClient: true, unassigned: true },
  { at: "spec", versions: "none", openedByClient: true },
  { at: "spec", versions: "draft" },
  { at: "spec", versions: "draft" },
  { at: "spec", versions: "sent" },
  { at: "spec", versions: "sent-revised" },
  { at: "deposit" },
  { at: "deposit", partPaid: true },
  { at: "deposit" },
  ...[0, 1, 2, 3, 4, 5].flatMap((index) => [
    { at: "build" as const, index, respec: index === 2 ? ("approved" as const) : undefined, overdue: index === 1 },
    { at: "build" as const, index, respec: index === 4 ? ("sent" as const) : undefined, pendingSignoff: index === 3 || index === 5 },
  ]),
  { at: "final_setup", balancePaid: true },
  { at: "final_setup", balancePaid: false, overdue: true },
  { at: "delivered" },
  { at: "delivered" },
  { at: "delivered" },
  { at: "on_hold", from: "build", overdue: true },
  { at: "on_hold", from: "deposit" },
  { at: "cancelled", from: "spec" },
  { at: "cancelled", from: "deposit" },
];

/** People by e-mail address (the seed finds their ids); clients with their names for titles. */
export interface DemoCast {
  owner: string;
  bookkeeper: string;
  builders: readonly string[];
  clients: ReadonlyArray<{ email: string; name: string }>;
}

export interface DemoVersion {
  version: number;
  spec: InstrumentSpec;
  options: BuildOptions;
  createdBy: string;
  createdAt: Date;
  submittedAt: Date | null;
  approvedAt: Date | null;
  approvedBy: string | null;
}

export interface DemoMove {
  from: string | null;
  to: string;
  kind: "open" | TransitionAction["kind"];
  actor: string;
  note: string | null;
  createdAt: Date;
  needsSignoff: boolean;
  signedOffAt: Date | null;
  signedOffBy: string | null;
  clientNotifiedAt: Date | null;
}

export interface DemoCommission {
  /** Unique within the workshop: how a second seed run recognises it. */
  title: string;
  client: string;
  builder: string | null;
  priceMinor: number;
  depositMinor: number;
  targetDate: string | null;
  stage: string;
  clientStage: string;
  heldFrom: string | null;
  requestNotes: string;
  openedAt: Date;
  stageEnteredAt: Date;
  updatedAt: Date;
  versions: DemoVersion[];
  history: DemoMove[];
  payments: Array<{ kind: "deposit" | "balance"; amountMinor: number; reference: string; paidAt: Date; recordedBy: string }>;
  comments: Array<{ author: string; body: string; createdAt: Date }>;
}

const DAY = 86_400_000;

/** Demo workshops whose owner signs off each builder's stage before the client hears of it (a school). */
export const DEMO_SIGNOFF_WORKSHOPS: readonly string[] = ["fernhollow"];

const ALL_MET = { approvedSpec: { id: 1, hasErrors: false }, newerUnapprovedSpec: false, depositPaid: true, balancePaid: true, setupSheetSigned: true };

/** Builds one workshop's demo commissions. `now` anchors every date (the story ends before it). */
export function demoCommissions(input: {
  slug: string;
  template: readonly BuildStage[];
  cast: DemoCast;
  currency: string;
  depositPercent: number;
  requireOwnerSignoff: boolean;
  now: Date;
}): DemoCommission[] {
  const { template, cast } = input;
  const facts: GuardFacts = { ...ALL_MET, template, requireOwnerSignoff: input.requireOwnerSignoff };
  return DEMO_SITUATIONS.map((situation, i) => {
    const rnd = seededRandom(`${input.slug}:${i}`);
    const days = (min: number, max: number) => min + rnd() * (max - min);
    const design = DEMO_DESIGNS[(i * 5 + input.slug.length) % DEMO_DESIGNS.length]!;
    // Shifted every 12 so that no client gets the same design twice (titles stay unique).
    const clientPerson = cast.clients[(i + Math.floor(i / DEMO_DESIGNS.length)) % cast.clients.length]!;
    const client = clientPerson.email;
    const builder = cast.builders[(i + Math.floor(i / cast.builders.length)) % cast.builders.length]!;
    const unassigned = situation.at === "spec" && !!situation.unassigned;
    const openedByClient = situation.at === "spec" && !!situation.openedByClient;
    const priced = !(situation.at === "spec" && situation.versions === "none");
    const priceMinor = priced ? Math.round(days(34, 62)) * 10_000 : 0;
    const depositMinor = percentOf(money(priceMinor, input.currency), input.depositPercent).amountMinor;

    // The story in days since opening; shifted onto the calendar at the end.
    let t = 0;
    let stage = SPEC;
    let heldFrom: string | null = null;
    let clientStage = SPEC;
    const versions: Array<Omit<DemoVersion, "createdAt" | "submittedAt" | "approvedAt"> & { createdAt: number; submittedAt: number | null; approvedAt: number | null }> = [];
    const moves: Array<Omit<DemoMove, "createdAt" | "signedOffAt" | "clientNotifiedAt"> & { createdAt: number; signedOffAt: number | null; clientNotifiedAt: number | null }> = [];
    const payments: Array<{ kind: "deposit" | "balance"; amountMinor: number; reference: string; paidAt: number; recordedBy: string }> = [];
    const comments: Array<{ author: string; body: string; createdAt: number }> = [];
    const who = (w: "client" | "builder" | "owner") => (w === "client" ? client : w === "builder" ? builder : cast.owner);
    const talk = (x: Exchange) => {
      for (const [w, body] of x.lines) comments.push({ author: who(w), body, createdAt: (t += days(0.1, 1.5)) });
    };
    const draft = (spec: InstrumentSpec, options: BuildOptions) => {
      versions.push({ version: versions.length + 1, spec, options, createdBy: builder, createdAt: (t += days(2, 8)), submittedAt: null, approvedAt: null, approvedBy: null });
    };
    const send = () => void (versions.at(-1)!.submittedAt = t += days(0.3, 2.5));
    const approve = () => {
      const v = versions.at(-1)!;
      v.approvedAt = t += days(0.5, 5);
      v.approvedBy = client;
    };
    // `role` is whom the machine checks: the app plans an approval's and a payment's move as the owner's.
    const move = (kind: TransitionAction["kind"], actor: string, role: Actor["role"], note: string | null, opts: { pendingSignoff?: boolean } = {}) => {
      const planned = planTransition({ stage, heldFrom }, { kind }, facts, { role, isAssignedBuilder: role === "builder", isCommissionClient: role === "client" });
      if (!planned.ok) throw new Error(`demo ${input.slug} #${i}: ${kind} from ${stage} refused: ${planned.reason}`);
      const at = t;
      const signedOffAt = planned.needsOwnerSignoff && !opts.pendingSignoff ? at + days(0.3, 2) : null;
      moves.push({
        from: planned.from,
        to: planned.to,
        kind,
        actor,
        note,
        createdAt: at,
        needsSignoff: planned.needsOwnerSignoff,
        signedOffAt,
        signedOffBy: signedOffAt === null ? null : cast.owner,
        clientNotifiedAt: planned.needsOwnerSignoff ? signedOffAt : at,
      });
      stage = planned.to;
      heldFrom = planned.heldFrom;
      if (!planned.needsOwnerSignoff || !opts.pendingSignoff) clientStage = stage;
    };
    const noteInto = (to: string) => NOTES_INTO[to]?.[i % 2] ?? `${stageLabel(stage, template)} done.`;
    const advanceBuild = (pendingSignoff = false) => {
      t += days(8, 26); // a build stage takes one to four weeks
      const next = stageAfter(stage);
      move("advance", builder, "builder", noteInto(next), { pendingSignoff });
    };
    const stageAfter = (s: string) => {
      const planned = planTransition({ stage: s, heldFrom: null }, { kind: "advance" }, facts, { role: "owner", isAssignedBuilder: false, isCommissionClient: false });
      return planned.ok ? planned.to : s;
    };

    // Opening.
    moves.push({ from: null, to: SPEC, kind: "open", actor: openedByClient ? client : cast.owner, note: null, createdAt: 0, needsSignoff: false, signedOffAt: null, signedOffBy: null, clientNotifiedAt: 0 });
    const reachesSpecVersions = !(situation.at === "spec" && situation.versions === "none");
    if (reachesSpecVersions) {
      draft(structuredClone(design.spec), structuredClone(design.options));
      if (i % 3 === 0) talk(SPEC_TALK[i % SPEC_TALK.length]!);
    }
    const stopsInSpec = situation.at === "spec" || (situation.at === "cancelled" && situation.from === "spec");
    if (situation.at === "spec" && situation.versions !== "none" && situation.versions !== "draft") {
      send();
      if (situation.versions === "sent-revised") {
        const r = design.revise(versions.at(-1)!.spec, versions.at(-1)!.options);
        talk(changeTalk(r.why, 2));
        draft(r.spec, r.options);
        send();
      }
    }
    if (situation.at === "cancelled" && situation.from === "spec") {
      t += days(3, 12);
      move("cancel", client, "client", CANCEL_NOTES.spec);
    }
    if (!stopsInSpec) {
      send();
      approve();
      move("advance", client, "owner", null); // the client's approval moves it on to the deposit
      if (situation.at === "deposit") {
        if (situation.partPaid) {
          t += days(2, 6);
          payments.push({ kind: "deposit", amountMinor: Math.round(depositMinor / 2), reference: `Bank transfer, first half (${input.slug.slice(0, 2).toUpperCase()}-${1000 + i})`, paidAt: t, recordedBy: cast.bookkeeper });
        }
      } else if (situation.at === "on_hold" && situation.from === "deposit") {
        t += days(2, 8);
        move("hold", cast.owner, "owner", HOLD_REASONS.deposit);
      } else if (situation.at === "cancelled") {
        t += days(5, 15);
        move("cancel", cast.owner, "owner", CANCEL_NOTES.deposit);
      } else {
        t += days(2, 12);
        payments.push({ kind: "deposit", amountMinor: depositMinor, reference: `Bank transfer ${input.slug.slice(0, 2).toUpperCase()}-${2000 + i}`, paidAt: t, recordedBy: cast.bookkeeper });
        move("advance", cast.bookkeeper, "owner", "Deposit received."); // as recordOfflinePayment does
        const lastIndex = template.length - 1;
        const target =
          situation.at === "build" ? situation.index % template.length : situation.at === "on_hold" ? Math.min(2, lastIndex) : lastIndex + 1; // past the last build stage
        for (let k = 0; k < target; k++) {
          const last = k === target - 1;
          if (k === 1 && i % 2 === 0) talk(BUILD_TALK[i % BUILD_TALK.length]!);
          advanceBuild(last && situation.at === "build" && !!situation.pendingSignoff && input.requireOwnerSignoff);
          if (situation.at === "build" && situation.respec === "approved" && k === 0) {
            const r = design.revise(versions.at(-1)!.spec, versions.at(-1)!.options);
            talk(changeTalk(r.why, versions.length + 1));
            draft(r.spec, r.options);
            send();
            approve();
          }
        }
        if (situation.at === "build" && situation.respec === "sent") {
          const r = design.revise(versions.at(-1)!.spec, versions.at(-1)!.options);
          talk(changeTalk(r.why, versions.length + 1));
          draft(r.spec, r.options);
          send();
        }
        if (situation.at === "on_hold") {
          t += days(2, 8);
          move("hold", builder, "builder", HOLD_REASONS.build);
        }
        if (situation.at === "final_setup" || situation.at === "delivered") {
          const balancePaid = situation.at === "delivered" || situation.balancePaid;
          if (balancePaid) {
            t += days(2, 6);
            payments.push({ kind: "balance", amountMinor: priceMinor - depositMinor, reference: `Bank transfer ${input.slug.slice(0, 2).toUpperCase()}-${3000 + i}`, paidAt: t, recordedBy: cast.bookkeeper });
          }
          if (situation.at === "delivered") {
            talk(DELIVERY_TALK);
            t += days(1, 4);
            move("advance", builder, "builder", noteInto("delivered"));
          }
        }
      }
    }

    // Onto the calendar: the last event a little before now; delivered and cancelled ones longer ago.
    const closed = situation.at === "delivered" || situation.at === "cancelled";
    const lastEvent = Math.max(t, ...moves.map((m) => m.signedOffAt ?? m.createdAt));
    const ago = closed ? days(8, 100) : days(0.3, 12);
    const origin = input.now.getTime() - (lastEvent + ago) * DAY;
    const at = (d: number) => new Date(Math.round(origin + d * DAY));
    const opened = at(0);
    const lastMove = moves.at(-1)!;
    const dateOnly = (ms: number) => new Date(ms).toISOString().slice(0, 10);
    let targetDate: string | null = priced ? dateOnly(opened.getTime() + days(200, 300) * DAY) : null;
    if (situation.overdue) targetDate = dateOnly(input.now.getTime() - days(3, 40) * DAY);
    if (situation.at === "delivered") targetDate = dateOnly(at(lastMove.createdAt).getTime() + days(-10, 20) * DAY);

    return {
      title: `${design.title} for ${clientPerson.name.split(" ")[0]}`,
      client,
      builder: unassigned ? null : builder,
      priceMinor,
      depositMinor,
      targetDate,
      stage,
      clientStage,
      heldFrom,
      requestNotes: openedByClient ? REQUEST_NOTES[i % REQUEST_NOTES.length]! : "",
      openedAt: opened,
      stageEnteredAt: at(lastMove.createdAt),
      updatedAt: at(lastEvent),
      versions: versions.map((v) => ({
        ...v,
        createdAt: at(v.createdAt),
        submittedAt: v.submittedAt === null ? null : at(v.submittedAt),
        approvedAt: v.approvedAt === null ? null : at(v.approvedAt),
      })),
      history: moves.map((m) => ({ ...m, createdAt: at(m.createdAt), signedOffAt: m.signedOffAt === null ? null : at(m.signedOffAt), clientNotifiedAt: m.clientNotifiedAt === null ? null : at(m.clientNotifiedAt) })),
      payments: payments.map((p) => ({ ...p, paidAt: at(p.paidAt) })),
      comments: comments.map((c) => ({ ...c, createdAt: at(c.createdAt) })),
    };
  });
}
