// npm run db:backup / db:restore round trip: a restored copy has the same tables, row counts and
// CHECKSUM TABLE values as the original.
import { mkdtempSync, rmSync, statSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import type { Knex } from "knex";
import knexFactory from "knex";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { backupDatabase, restoreDatabase, targetFromEnv } from "@/db/backup/backup";
import config from "@/knexfile";
import { createScratchDatabase } from "../setup/db";

let source: Knex;
let drop: () => Promise<void>;
let sourceName: string;
const dir = mkdtempSync(join(tmpdir(), "sw-backup-"));

beforeAll(async () => {
  ({ knex: source, drop } = await createScratchDatabase("backup"));
  sourceName = (source.client.config.connection as { database: string }).database;
  await source.migrate.latest();
  await source.seed.run();
  // Text that must survive the trip byte for byte: multi-byte names and quotes.
  await source("audit_log").insert({ action: "test.unicode", entity_type: "test", data: JSON.stringify({ note: "Østby's “nut” — 0.05 mm" }) });
});

afterAll(async () => {
  await drop();
  rmSync(dir, { recursive: true, force: true });
});

async function fingerprint(k: Knex): Promise<Record<string, { n: number; checksum: unknown }>> {
  const [rows] = await k.raw("SELECT table_name AS t FROM information_schema.tables WHERE table_schema = DATABASE() ORDER BY 1");
  const out: Record<string, { n: number; checksum: unknown }> = {};
  for (const { t } of rows as Array<{ t: string }>) {
    const [[count]] = [(await k.raw("SELECT COUNT(*) AS n FROM ??", [t]))[0]];
    const [[sum]] = [(await k.raw("CHECKSUM TABLE ??", [t]))[0]];
    out[t] = { n: Number(count.n), checksum: sum.Checksum };
  }
  return out;
}

describe("backup and restore", () => {
  it("restores into a fresh database with identical row counts and checksums", async () => {
    const file = join(dir, "dump.sql.gz");
    await backupDatabase(targetFromEnv(sourceName), file);
    expect(statSync(file).size).toBeGreaterThan(500);

    const restoredName = `${sourceName}_restored`;
    const admin = knexFactory({ ...config.test, connection: { ...(config.test.connection as object), database: undefined } });
    await admin.raw("DROP DATABASE IF EXISTS ??", [restoredName]);
    try {
      await restoreDatabase(targetFromEnv(restoredName), file);
      const restored = knexFactory({ ...config.test, connection: { ...(config.test.connection as object), database: restoredName } });
      try {
        const before = await fingerprint(source);
        expect(Object.keys(before)).toEqual(expect.arrayContaining(["users", "workshops", "memberships", "knex_migrations"]));
        expect(before.users!.n).toBeGreaterThan(10);
        expect(await fingerprint(restored)).toEqual(before);
        const note = await restored("audit_log").where({ action: "test.unicode" }).first("data");
        expect(note.data).toEqual({ note: "Østby's “nut” — 0.05 mm" });
      } finally {
        await restored.destroy();
      }
    } finally {
      await admin.raw("DROP DATABASE IF EXISTS ??", [restoredName]);
      await admin.destroy();
    }
  });
});
