// The demo seed is idempotent: a second run adds and changes nothing.
import type { Knex } from "knex";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { verifyPassword } from "../../lib/auth/password";
import { DEMO_PEOPLE } from "../../lib/demo/people";
import { computeSpec } from "../../lib/lutherie/compute-spec";
import { buildOptionsSchema } from "../../lib/schemas/build-options";
import { instrumentSpecSchema, type ComputeResult, type InstrumentSpec } from "../../lib/schemas/instrument-spec";
import { planTransition, type Actor, type GuardFacts, type TransitionKind } from "../../lib/workflow/machine";
import { CANCELLED, DEFAULT_BUILD_STAGES, DELIVERED, DEPOSIT, FINAL_SETUP, ON_HOLD, SPEC, stageLine, type BuildStage } from "../../lib/workflow/stages";
import { createScratchDatabase } from "../setup/db";

let knex: Knex;
let drop: () => Promise<void>;

beforeAll(async () => {
  ({ knex, drop } = await createScratchDatabase("seeds"));
  await knex.migrate.latest();
});
afterAll(async () => drop());

async function snapshot(): Promise<Record<string, unknown>> {
  const out: Record<string, unknown> = {};
  const [rows] = await knex.raw(
    "SELECT table_name AS t FROM information_schema.tables WHERE table_schema = DATABASE() AND table_name NOT LIKE 'knex%' ORDER BY 1",
  );
  for (const { t } of rows as Array<{ t: string }>) {
    const [sums] = await knex.raw("CHECKSUM TABLE ??", [t]);
    const [counts] = await knex.raw("SELECT COUNT(*) AS n FROM ??", [t]);
    out[t] = { n: counts[0].n, checksum: sums[0].Checksum };
  }
  return out;
}

describe("demo seed", () => {
  it("is idempotent", async () => {
    await knex.seed.run();
    const first = await snapshot();
    await knex.seed.run();
    expect(await snapshot()).toEqual(first);
  });

  it("gives both workshops people in every role and one person in both", async () => {
    const rows = await knex("memberships as m")
      .join("workshops as w", "w.id", "m.workshop_id")
      .select("w.slug", "m.role")
      .count({ n: "*" })
      .groupBy("w.slug", "m.role");
    for (const slug of ["fernhollow", "quillmere"]) {
      for (const role of ["owner", "builder", "bookkeeper", "client"]) {
        expect(rows.find((r) => (r as { slug?: string }).slug === slug && (r as { role?: string }).role === role), `${slug} ${role}`).toBeTruthy();
      }
    }
    const multi = await knex("memberships").select("user_id").count({ n: "*" }).groupBy("user_id").having(knex.raw("COUNT(*) > 1"));
    expect(multi.length).toBe(1);
    const emails = (await knex("users").pluck("email")) as string[];
    for (const e of emails) expect(e).toMatch(/@example\.com$/);
  });

  it("gives every demo person the DEMO_PASSWORD, hashed with argon2id", async () => {
    const rows = await knex("users").whereIn("email", DEMO_PEOPLE.map((p) => p.email)).select("email", "password_hash");
    expect(rows).toHaveLength(DEMO_PEOPLE.length);
    const password = process.env.DEMO_PASSWORD ?? "luthier-demo-2027";
    for (const r of rows as Array<{ email: string; password_hash: string }>) {
      expect(r.password_hash, r.email).toMatch(/^\$argon2id\$/);
      expect(await verifyPassword(r.password_hash, password), r.email).toBe(true);
    }
  });
});

// The demo commissions: every stage, believable histories the stage machine itself allows,
// results stored beside each spec version, payments where the stage implies them.
describe("demo commissions", () => {
  type C = { id: number; workshop_id: number; number: string; title: string; stage: string; client_stage: string; held_from: string | null; builder_user_id: number | null; client_user_id: number; price_minor: number; deposit_minor: number; target_date: string | null; created_at: Date };
  type V = { commission_id: number; version: number; spec: unknown; options: unknown; result: unknown; has_errors: number; total_tension_n: number; submitted_at: Date | null; approved_at: Date | null; created_at: Date };
  type H = { commission_id: number; from_stage: string | null; to_stage: string; kind: string; actor_user_id: number; needs_signoff: number; signed_off_at: Date | null; client_notified_at: Date | null; created_at: Date; id: number };
  type P = { commission_id: number; kind: string; amount_minor: number; paid_at: Date; method: string; reference: string | null; status: string };
  let commissions: C[];
  let versions: V[];
  let history: H[];
  let payments: P[];
  let roles: Map<string, string>; // `${workshop}:${user}` → role
  let workshops: Array<{ id: number; slug: string; build_stages: BuildStage[] | string | null; require_stage_signoff: number }>;
  const json = <T>(v: unknown): T => (typeof v === "string" ? JSON.parse(v) : v) as T;
  const templateOf = (workshopId: number) => json<BuildStage[] | null>(workshops.find((w) => w.id === workshopId)!.build_stages) ?? DEFAULT_BUILD_STAGES;

  beforeAll(async () => {
    if (Number((await knex("commissions").count({ n: "*" }).first())?.n) === 0) await knex.seed.run();
    commissions = await knex("commissions").orderBy("id");
    versions = await knex("spec_versions").orderBy(["commission_id", "version"]);
    history = await knex("stage_history").orderBy(["commission_id", "created_at", "id"]);
    payments = await knex("payments").orderBy("paid_at");
    workshops = await knex("workshops").select("id", "slug", "build_stages", "require_stage_signoff");
    roles = new Map((await knex("memberships").select("workshop_id", "user_id", "role")).map((m: { workshop_id: number; user_id: number; role: string }) => [`${m.workshop_id}:${m.user_id}`, m.role]));
  });

  it("gives each demo workshop about 30 commissions in every stage of its line, on hold and cancelled", () => {
    for (const w of workshops) {
      const mine = commissions.filter((c) => c.workshop_id === w.id);
      expect(mine.length, w.slug).toBeGreaterThanOrEqual(28);
      expect(mine.length, w.slug).toBeLessThanOrEqual(34);
      const stages = new Set(mine.map((c) => c.stage));
      for (const s of [...stageLine(templateOf(w.id)), ON_HOLD, CANCELLED]) expect(stages.has(s), `${w.slug} ${s}`).toBe(true);
      expect(new Set(mine.map((c) => c.title)).size).toBe(mine.length);
      expect(new Set(mine.map((c) => c.number)).size).toBe(mine.length);
    }
  });

  it("has spec-stage commissions without a version, with a draft only, and with one sent for approval", () => {
    const inSpec = commissions.filter((c) => c.stage === SPEC);
    const of = (c: C) => versions.filter((v) => v.commission_id === c.id);
    expect(inSpec.some((c) => of(c).length === 0)).toBe(true);
    expect(inSpec.some((c) => of(c).length > 0 && of(c).every((v) => v.submitted_at === null))).toBe(true);
    expect(inSpec.some((c) => of(c).some((v) => v.submitted_at !== null))).toBe(true);
    // Nothing in the spec stage is approved: approval moves a commission on to the deposit.
    expect(inSpec.flatMap(of).filter((v) => v.approved_at !== null)).toEqual([]);
  });

  it("stores each version's computed results beside it, and approved versions have no errors", () => {
    for (const v of versions) {
      const spec = instrumentSpecSchema.parse(json(v.spec));
      buildOptionsSchema.parse(json(v.options));
      const result = computeSpec(spec);
      expect(json<ComputeResult>(v.result).totals.tensionN).toBeCloseTo(result.totals.tensionN, 9);
      expect(Number(v.total_tension_n)).toBeCloseTo(result.totals.tensionN, 6);
      expect(!!v.has_errors).toBe(result.issues.some((i) => i.level === "error"));
      if (v.approved_at || v.submitted_at) expect(!!v.has_errors).toBe(false);
    }
  });

  it("varies the instruments: 4-, 5-, 6-, 7- and 8-string, basses, a baritone and multi-scale necks", () => {
    const specs = versions.map((v) => json<InstrumentSpec>(v.spec));
    expect(new Set(specs.map((s) => s.strings.length))).toEqual(new Set([4, 5, 6, 7, 8]));
    expect(specs.some((s) => s.family === "bass")).toBe(true);
    expect(specs.some((s) => s.scale.bass !== s.scale.treble)).toBe(true);
    // A baritone: a guitar whose scale is 27 in (686 mm) or longer (common practice, no source).
    expect(specs.some((s) => s.family === "guitar" && s.scale.bass === s.scale.treble && s.scale.bass >= 686)).toBe(true);
    expect(new Set(versions.map((v) => json<{ bridge: string }>(v.options).bridge))).toEqual(new Set(["fixed", "floating_tremolo"]));
  });

  it("tells a history the stage machine allows, move by move, with the guards' facts of its day", () => {
    for (const c of commissions) {
      const template = templateOf(c.workshop_id);
      const signoff = !!workshops.find((w) => w.id === c.workshop_id)!.require_stage_signoff;
      const moves = history.filter((h) => h.commission_id === c.id);
      expect(moves[0]).toMatchObject({ kind: "open", from_stage: null, to_stage: SPEC });
      let state = { stage: SPEC, heldFrom: null as string | null };
      let clientStage = SPEC;
      for (const h of moves.slice(1)) {
        const at = h.created_at.getTime();
        const mine = versions.filter((v) => v.commission_id === c.id && v.created_at.getTime() <= at);
        const approved = mine.filter((v) => v.approved_at && v.approved_at.getTime() <= at).at(-1);
        const paid = (kind: string) => payments.filter((p) => p.commission_id === c.id && p.kind === kind && p.paid_at.getTime() <= at).reduce((s, p) => s + Number(p.amount_minor), 0);
        const facts: GuardFacts = {
          template,
          approvedSpec: approved ? { id: approved.version, hasErrors: !!approved.has_errors } : null,
          newerUnapprovedSpec: !!approved && mine.at(-1) !== approved,
          depositPaid: paid("deposit") >= Number(c.deposit_minor),
          balancePaid: paid("deposit") + paid("balance") >= Number(c.price_minor),
          setupSheetSigned: true, // no setup sheets are stored yet (a later feature)
          requireOwnerSignoff: signoff,
        };
        const role = roles.get(`${c.workshop_id}:${h.actor_user_id}`) as Actor["role"];
        // The client's approval and a recorded deposit move the commission as the workshop's line.
        const byApprovalOrPayment = h.kind === "advance" && (h.from_stage === SPEC || h.from_stage === DEPOSIT);
        const actor: Actor = { role: byApprovalOrPayment ? "owner" : role, isAssignedBuilder: h.actor_user_id === c.builder_user_id, isCommissionClient: h.actor_user_id === c.client_user_id };
        if (h.from_stage === SPEC && h.kind === "advance") expect(h.actor_user_id, c.title).toBe(c.client_user_id);
        const planned = planTransition(state, { kind: h.kind as TransitionKind }, facts, actor);
        expect(planned, `${c.title}: ${h.kind} ${h.from_stage} → ${h.to_stage}`).toMatchObject({ ok: true, from: h.from_stage, to: h.to_stage, needsOwnerSignoff: !!h.needs_signoff });
        if (!planned.ok) continue;
        state = { stage: planned.to, heldFrom: planned.heldFrom };
        if (!h.needs_signoff || h.signed_off_at) clientStage = planned.to;
        expect(!!h.client_notified_at).toBe(!h.needs_signoff || !!h.signed_off_at);
      }
      expect([c.stage, c.held_from, c.client_stage], c.title).toEqual([state.stage, state.heldFrom, clientStage]);
    }
    // The school's owner has builders' moves waiting for sign-off.
    expect(commissions.filter((c) => c.stage !== c.client_stage).length).toBeGreaterThan(0);
  });

  it("includes a re-approval after a change and a change waiting for re-approval", () => {
    const lists = commissions.map((c) => versions.filter((v) => v.commission_id === c.id));
    expect(lists.some((l) => l.filter((v) => v.approved_at).length >= 2)).toBe(true);
    expect(lists.some((l) => l.some((v) => v.approved_at) && l.at(-1)!.approved_at === null && l.at(-1)!.submitted_at !== null)).toBe(true);
  });

  it("records offline payments where the stage implies them", () => {
    const paid = (c: C, kinds: string[]) => payments.filter((p) => p.commission_id === c.id && kinds.includes(p.kind)).reduce((s, p) => s + Number(p.amount_minor), 0);
    for (const c of commissions) {
      const line = stageLine(templateOf(c.workshop_id));
      const i = line.indexOf(c.stage);
      if (i > line.indexOf(DEPOSIT)) expect(paid(c, ["deposit"]), c.title).toBeGreaterThanOrEqual(Number(c.deposit_minor));
      if (c.stage === DEPOSIT || c.stage === SPEC) expect(paid(c, ["deposit"]), c.title).toBeLessThan(Math.max(1, Number(c.deposit_minor)));
      if (c.stage === DELIVERED) expect(paid(c, ["deposit", "balance"]), c.title).toBe(Number(c.price_minor));
    }
    for (const p of payments) expect(p).toMatchObject({ method: "offline", status: "paid", reference: expect.stringMatching(/\S/) });
    expect(commissions.some((c) => c.stage === FINAL_SETUP && paid(c, ["balance"]) === 0)).toBe(true);
  });

  it("dates everything over past months, with some commissions overdue", async () => {
    const now = Date.now();
    const today = new Date().toISOString().slice(0, 10);
    for (const h of history) expect(h.created_at.getTime()).toBeLessThanOrEqual(now);
    const opened = commissions.map((c) => c.created_at.getTime());
    expect(Math.max(...opened) - Math.min(...opened)).toBeGreaterThan(90 * 86_400_000);
    const dateText = (d: unknown) => (d instanceof Date ? d.toISOString().slice(0, 10) : String(d));
    const overdue = commissions.filter((c) => c.target_date !== null && dateText(c.target_date) < today && c.stage !== DELIVERED && c.stage !== CANCELLED);
    expect(overdue.length).toBeGreaterThanOrEqual(2);
    expect(commissions.some((c) => c.target_date !== null && dateText(c.target_date) > today)).toBe(true);
  });

  it("keeps the conversation between clients and the workshop, by demo people only", async () => {
    const comments = await knex("commission_comments as k").join("commissions as c", "c.id", "k.commission_id").select("k.author_user_id", "c.client_user_id", "k.workshop_id");
    expect(comments.some((k: { author_user_id: number; client_user_id: number }) => k.author_user_id === k.client_user_id)).toBe(true);
    expect(comments.some((k: { author_user_id: number; client_user_id: number }) => k.author_user_id !== k.client_user_id)).toBe(true);
    const people = new Set(((await knex("users").whereIn("email", DEMO_PEOPLE.map((p) => p.email)).pluck("id")) as number[]));
    for (const c of commissions) expect(people.has(c.client_user_id) && (c.builder_user_id === null || people.has(c.builder_user_id))).toBe(true);
  });

  it("leaves each workshop's counter at its last number, so the next commission continues the line", async () => {
    const counters = await knex("commission_counters").select("workshop_id", "year", "last_sequence");
    for (const w of workshops) {
      for (const year of new Set(commissions.filter((c) => c.workshop_id === w.id).map((c) => c.number.slice(0, 4)))) {
        const numbers = commissions.filter((c) => c.workshop_id === w.id && c.number.startsWith(year)).map((c) => Number(c.number.slice(5)));
        const counter = counters.find((k: { workshop_id: number; year: number }) => k.workshop_id === w.id && k.year === Number(year));
        expect(counter?.last_sequence).toBe(Math.max(...numbers));
      }
    }
  });
});
