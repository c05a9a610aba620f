import type { Knex } from "knex";
import { hashPassword } from "../../lib/auth/password";
import { DEMO_PEOPLE, DEMO_WORKSHOPS } from "../../lib/demo/people";

// Idempotent: workshops and people are matched by slug and e-mail; a second run changes nothing
// and never resets a password someone has changed.
export async function seed(knex: Knex): Promise<void> {
  const password = process.env.DEMO_PASSWORD ?? "luthier-demo-2027";
  for (const w of DEMO_WORKSHOPS) {
    await knex("workshops")
      .insert({ slug: w.slug, name: w.name, unit_preference: w.unitPreference, currency: w.currency })
      .onConflict("slug")
      .ignore();
  }
  const workshopIds = new Map<string, number>(
    (await knex("workshops").select("id", "slug")).map((r: { id: number; slug: string }) => [r.slug, r.id]),
  );

  const existing = new Set<string>((await knex("users").pluck("email")) as string[]);
  const demoHash = await hashPassword(password);
  for (const p of DEMO_PEOPLE) {
    if (!existing.has(p.email)) {
      await knex("users").insert({ email: p.email, name: p.name, password_hash: demoHash, email_verified_at: knex.fn.now(3) });
    }
    const user = await knex("users").where({ email: p.email }).first("id");
    for (const [slug, role] of Object.entries(p.roles)) {
      const workshopId = workshopIds.get(slug);
      if (!workshopId) throw new Error(`demo person ${p.email} refers to unknown workshop ${slug}`);
      await knex("memberships").insert({ workshop_id: workshopId, user_id: user.id, role }).onConflict(["workshop_id", "user_id"]).ignore();
    }
  }
}
