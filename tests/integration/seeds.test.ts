// The demo seed is idempotent: a second run adds and changes nothing.
import type { Knex } from "knex";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { verifyPassword } from "../../lib/auth/password";
import { DEMO_PEOPLE } from "../../lib/demo/people";
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
