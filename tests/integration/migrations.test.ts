// Migrations against the real MariaDB: up, down to nothing, up again, with the schema intact.
import type { Knex } from "knex";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createScratchDatabase } from "../setup/db";

let knex: Knex;
let drop: () => Promise<void>;

beforeAll(async () => {
  ({ knex, drop } = await createScratchDatabase("migrations"));
});
afterAll(async () => drop());

async function tables(): Promise<string[]> {
  const [rows] = await knex.raw("SELECT table_name AS t FROM information_schema.tables WHERE table_schema = DATABASE() ORDER BY 1");
  return (rows as Array<{ t: string }>).map((r) => r.t).filter((t) => !t.startsWith("knex_"));
}

describe("migrations", () => {
  it("go up, all the way down and up again", async () => {
    await knex.migrate.latest();
    const first = await tables();
    expect(first).toEqual(expect.arrayContaining(["workshops", "users", "memberships", "audit_log"]));

    await knex.migrate.rollback(undefined, true);
    expect(await tables()).toEqual([]);

    await knex.migrate.latest();
    expect(await tables()).toEqual(first);
  }, 120_000); // every migration's DDL twice: slow on a busy machine

  it("create InnoDB utf8mb4 tables", async () => {
    const [rows] = await knex.raw(
      "SELECT table_name AS t, engine AS e, table_collation AS c FROM information_schema.tables WHERE table_schema = DATABASE() AND table_name NOT LIKE 'knex%'",
    );
    for (const r of rows as Array<{ t: string; e: string; c: string }>) {
      expect(r.e, r.t).toBe("InnoDB");
      expect(r.c, r.t).toMatch(/^utf8mb4_/);
    }
  });

  it("index every workshop_id column", async () => {
    const [cols] = await knex.raw(
      "SELECT table_name AS t FROM information_schema.columns WHERE table_schema = DATABASE() AND column_name = 'workshop_id'",
    );
    const [idx] = await knex.raw(
      "SELECT DISTINCT table_name AS t FROM information_schema.statistics WHERE table_schema = DATABASE() AND column_name = 'workshop_id' AND seq_in_index = 1",
    );
    const indexed = new Set((idx as Array<{ t: string }>).map((r) => r.t));
    const scoped = (cols as Array<{ t: string }>).map((r) => r.t);
    expect(scoped.length).toBeGreaterThan(0);
    for (const t of scoped) expect(indexed.has(t), `${t}.workshop_id has no leading index`).toBe(true);
  });
});
