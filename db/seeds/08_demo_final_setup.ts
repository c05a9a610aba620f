import type { Knex } from "knex";
import { computeSpec } from "../../lib/lutherie/compute-spec";
import { presetById } from "../../lib/lutherie/presets";
import { convertSpecUnits } from "../../lib/lutherie/spec-units";
import { buildOptionsSchema } from "../../lib/schemas/build-options";
import { nextCommissionNumber } from "../../lib/data/commission-numbers";
import { DEFAULT_BUILD_STAGES, DEPOSIT, FINAL_SETUP, SPEC } from "../../lib/workflow/stages";

// One invented commission per demo workshop waiting in final setup, so the demo builder can fill
// in and sign its setup sheet and print its template and build sheet. The spec is approved and the
// deposit paid; the balance is not (the bookkeeper records it before delivery). Idempotent: a
// commission with the same title in the workshop is left as it is.

const DEMO = [
  { workshop: "fernhollow", title: "Fanned eight-string, roasted maple neck", client: "nadia.fensome@example.com", builder: "tobias.reyne@example.com", preset: "fanned-eight", priceMinor: 420_000 },
  { workshop: "quillmere", title: "Six-string, 25.5 in, set neck", client: "ben.ashdown@example.com", builder: "sam.okonjo@example.com", preset: "six", priceMinor: 380_000 },
] as const;

const DAY = 24 * 3600 * 1000;

export async function seed(knex: Knex): Promise<void> {
  for (const d of DEMO) {
    const ws = await knex("workshops").where({ slug: d.workshop }).first("id", "currency", "unit_preference", "build_stages");
    if (!ws) continue;
    if (await knex("commissions").where({ workshop_id: ws.id, title: d.title }).first("id")) continue;
    const [client, builder, owner] = await Promise.all([
      knex("users").where({ email: d.client }).first("id"),
      knex("users").where({ email: d.builder }).first("id"),
      knex("memberships").where({ workshop_id: ws.id, role: "owner" }).orderBy("id").first("user_id as id"),
    ]);
    if (!client || !builder || !owner) continue;
    const signoff = !!(await knex("workshops").where({ id: ws.id }).first("require_stage_signoff"))?.require_stage_signoff;
    await knex.transaction(async (trx) => {
      const year = new Date().getUTCFullYear();
      const number = await nextCommissionNumber(trx, ws.id, year);

      const start = Date.now() - 70 * DAY;
      const at = (days: number) => new Date(start + days * DAY);
      const deposit = Math.round(d.priceMinor * 0.3);
      const [commissionId] = await trx("commissions").insert({
        workshop_id: ws.id,
        number,
        client_user_id: client.id,
        builder_user_id: builder.id,
        title: d.title,
        price_minor: d.priceMinor,
        deposit_minor: deposit,
        deposit_percent: 30,
        currency: ws.currency,
        stage: FINAL_SETUP,
        client_stage: FINAL_SETUP,
        stage_entered_at: at(68),
        created_at: at(0),
      });

      const spec = convertSpecUnits(presetById(d.preset).spec, ws.unit_preference);
      const result = computeSpec(spec);
      await trx("spec_versions").insert({
        workshop_id: ws.id,
        commission_id: commissionId,
        version: 1,
        spec: JSON.stringify(spec),
        options: JSON.stringify(buildOptionsSchema.parse({})),
        result: JSON.stringify(result),
        has_errors: result.issues.some((i) => i.level === "error"),
        total_tension_n: result.totals.tensionN,
        created_by: builder.id,
        created_at: at(1),
        submitted_at: at(1),
        approved_at: at(2),
        approved_by: client.id,
      });
      await trx("payments").insert({
        workshop_id: ws.id,
        commission_id: commissionId,
        kind: "deposit",
        status: "paid",
        method: "offline",
        amount_minor: deposit,
        currency: ws.currency,
        reference: "Demo deposit transfer",
        paid_at: at(3),
      });

      const stages = (typeof ws.build_stages === "string" ? JSON.parse(ws.build_stages) : (ws.build_stages ?? DEFAULT_BUILD_STAGES)) as Array<{ key: string }>;
      const line = [SPEC, DEPOSIT, ...stages.map((s) => s.key), FINAL_SETUP];
      // As the stage machine has it: the client's approval moves it to the deposit, the deposit to the
      // first build stage, the builder the rest (signed off by the owner where the workshop asks for it);
      // the last move is the moment it entered final setup.
      const history: Array<Record<string, unknown>> = [{ from_stage: null, to_stage: SPEC, kind: "open", actor_user_id: client.id, created_at: at(0), client_notified_at: at(0) }];
      line.slice(1).forEach((to, i) => {
        const created = at(2 + (i * 66) / (line.length - 2));
        const from = line[i]!;
        const byBuilder = from !== SPEC && from !== DEPOSIT;
        const needsSignoff = byBuilder && signoff;
        const signedOff = needsSignoff ? new Date(created.getTime() + DAY / 4) : null;
        history.push({
          from_stage: from,
          to_stage: to,
          kind: "advance",
          actor_user_id: from === SPEC ? client.id : byBuilder ? builder.id : owner.id,
          created_at: created,
          needs_signoff: needsSignoff,
          signed_off_at: signedOff,
          signed_off_by: needsSignoff ? owner.id : null,
          client_notified_at: signedOff ?? created,
        });
      });
      await trx("stage_history").insert(history.map((h) => ({ ...h, workshop_id: ws.id, commission_id: commissionId })));
    });
  }
}
