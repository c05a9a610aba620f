import type { Knex } from "knex";
import { nextCommissionNumber } from "../../lib/data/commission-numbers";
import { specVersionColumns } from "../../lib/data/spec-version-columns";
import { demoCommissions, DEMO_SIGNOFF_WORKSHOPS, type DemoCast, type DemoCommission } from "../../lib/demo/commissions";
import { DEMO_PEOPLE, DEMO_WORKSHOPS } from "../../lib/demo/people";
import { DEFAULT_BUILD_STAGES, type BuildStage } from "../../lib/workflow/stages";

// About 30 commissions per demo workshop across every stage, with their spec versions (results
// computed and stored beside them), stage history, payments and comments, dated over past months.
// Idempotent: a commission is recognised by its title within its workshop, and a second run adds
// nothing. No e-mail is queued for this invented past.

function castOf(slug: string): DemoCast {
  const by = (role: string) => DEMO_PEOPLE.filter((p) => p.roles[slug] === role);
  return {
    owner: by("owner")[0]!.email,
    bookkeeper: by("bookkeeper")[0]!.email,
    builders: by("builder").map((p) => p.email),
    clients: by("client").map((p) => ({ email: p.email, name: p.name })),
  };
}

async function insertCommission(trx: Knex.Transaction, workshopId: number, currency: string, depositPercent: number, c: DemoCommission, ids: Map<string, number>) {
  const id = (email: string | null) => {
    if (email === null) return null;
    const found = ids.get(email);
    if (found === undefined) throw new Error(`demo commission "${c.title}" refers to unknown person ${email}`);
    return found;
  };
  const number = await nextCommissionNumber(trx, workshopId, c.openedAt.getUTCFullYear());
  const [commissionId] = await trx("commissions").insert({
    workshop_id: workshopId,
    number,
    client_user_id: id(c.client),
    builder_user_id: id(c.builder),
    title: c.title,
    price_minor: c.priceMinor,
    deposit_minor: c.depositMinor,
    deposit_percent: depositPercent,
    currency,
    target_date: c.targetDate,
    stage: c.stage,
    held_from: c.heldFrom,
    stage_entered_at: c.stageEnteredAt,
    client_stage: c.clientStage,
    request_notes: c.requestNotes || null,
    created_at: c.openedAt,
    updated_at: c.updatedAt,
  });
  const scoped = { workshop_id: workshopId, commission_id: Number(commissionId) };
  for (const v of c.versions) {
    await trx("spec_versions").insert({
      ...scoped,
      version: v.version,
      ...specVersionColumns(v.spec, v.options),
      created_by: id(v.createdBy),
      created_at: v.createdAt,
      submitted_at: v.submittedAt,
      approved_at: v.approvedAt,
      approved_by: id(v.approvedBy),
    });
  }
  if (c.history.length) {
    await trx("stage_history").insert(
      c.history.map((h) => ({
        ...scoped,
        from_stage: h.from,
        to_stage: h.to,
        kind: h.kind,
        actor_user_id: id(h.actor),
        note: h.note,
        needs_signoff: h.needsSignoff,
        signed_off_at: h.signedOffAt,
        signed_off_by: id(h.signedOffBy),
        client_notified_at: h.clientNotifiedAt,
        created_at: h.createdAt,
      })),
    );
  }
  for (const p of c.payments) {
    await trx("payments").insert({
      ...scoped,
      kind: p.kind,
      status: "paid",
      method: "offline",
      amount_minor: p.amountMinor,
      currency,
      reference: p.reference,
      paid_at: p.paidAt,
      recorded_by: id(p.recordedBy),
      created_at: p.paidAt,
      updated_at: p.paidAt,
    });
  }
  if (c.comments.length) {
    await trx("commission_comments").insert(c.comments.map((k) => ({ ...scoped, author_user_id: id(k.author), body: k.body, created_at: k.createdAt })));
  }
}

export async function seed(knex: Knex): Promise<void> {
  const now = new Date();
  const ids = new Map<string, number>(
    ((await knex("users").whereIn("email", DEMO_PEOPLE.map((p) => p.email)).select("id", "email")) as Array<{ id: number; email: string }>).map((u) => [u.email, u.id]),
  );
  for (const w of DEMO_WORKSHOPS) {
    const ws = await knex("workshops").where({ slug: w.slug }).first("id", "currency", "deposit_percent", "build_stages", "require_stage_signoff");
    if (!ws) throw new Error(`demo workshop ${w.slug} is missing: run the people seed first`);
    const titles = new Set((await knex("commissions").where({ workshop_id: ws.id }).pluck("title")) as string[]);
    // A school signs off its builders' stages; set once, on the first seed, never over an owner's choice.
    if (titles.size === 0 && DEMO_SIGNOFF_WORKSHOPS.includes(w.slug)) {
      await knex("workshops").where({ id: ws.id }).update({ require_stage_signoff: true });
      ws.require_stage_signoff = 1;
    }
    const template = (typeof ws.build_stages === "string" ? JSON.parse(ws.build_stages) : ws.build_stages) as BuildStage[] | null;
    const plans = demoCommissions({
      slug: w.slug,
      template: template ?? DEFAULT_BUILD_STAGES,
      cast: castOf(w.slug),
      currency: ws.currency,
      depositPercent: Number(ws.deposit_percent),
      requireOwnerSignoff: !!ws.require_stage_signoff,
      now,
    });
    const missing = plans.filter((c) => !titles.has(c.title)).sort((a, b) => a.openedAt.getTime() - b.openedAt.getTime());
    if (missing.length === 0) continue;
    await knex.transaction(async (trx) => {
      for (const c of missing) await insertCommission(trx, ws.id, ws.currency, Number(ws.deposit_percent), c, ids);
    });
  }
}
