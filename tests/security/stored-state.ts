// A fingerprint of everything stored for one workshop, to show a rejected request changed nothing:
// for every table with a workshop_id column (found in the schema, so new tables count without
// anyone listing them) the row count and a checksum of every column of its rows; the workshop's own
// row; and its members' accounts and memberships anywhere. One statement, a few milliseconds.
import { testDb } from "../setup/test-db";

/** Columns the e-mail worker changes on its own while delivering (not changes a request made). */
const MOVING_COLUMNS: Record<string, readonly string[]> = {
  email_outbox: ["status", "attempts", "next_attempt_at", "locked_until", "last_error", "provider_message_id", "sent_at", "updated_at"],
};

let statement: Promise<{ sql: string; perWorkshop: number }> | undefined;

const quote = (name: string) => `\`${name.replace(/`/g, "``")}\``;

function checksum(table: string, columns: string[]): string {
  const kept = columns.filter((c) => !(MOVING_COLUMNS[table] ?? []).includes(c));
  const cells = kept.map((c) => `COALESCE(CAST(${quote(c)} AS CHAR), '<null>')`).join(", ");
  return `COUNT(*) AS n, COALESCE(SUM(CRC32(CONCAT_WS('|', ${cells}))), 0) AS c`;
}

async function buildStatement(): Promise<{ sql: string; perWorkshop: number }> {
  const db = testDb();
  const rows = (await db("information_schema.columns")
    .where({ table_schema: db.raw("DATABASE()") })
    .orderBy(["table_name", "ordinal_position"])
    .select({ table: "table_name", column: "column_name" })) as Array<{ table: string; column: string }>;
  const tables = new Map<string, string[]>();
  for (const r of rows) tables.set(r.table, [...(tables.get(r.table) ?? []), r.column]);
  const scoped = [...tables].filter(([, cols]) => cols.includes("workshop_id"));
  const parts = scoped.map(([t, cols]) => `SELECT '${t}' AS t, ${checksum(t, cols)} FROM ${quote(t)} WHERE workshop_id = ?`);
  parts.push(`SELECT 'workshops' AS t, ${checksum("workshops", tables.get("workshops")!)} FROM workshops WHERE id = ?`);
  const members = "SELECT user_id FROM memberships WHERE workshop_id = ?";
  parts.push(`SELECT 'users' AS t, ${checksum("users", tables.get("users")!)} FROM users WHERE id IN (${members})`);
  parts.push(`SELECT 'memberships of its people' AS t, ${checksum("memberships", tables.get("memberships")!)} FROM memberships WHERE user_id IN (${members})`);
  return { sql: parts.join(" UNION ALL "), perWorkshop: parts.length };
}

/** Table → "rows:checksum" for workshop `workshopId`. */
export async function storedState(workshopId: number): Promise<Record<string, string>> {
  statement ??= buildStatement();
  const { sql, perWorkshop } = await statement;
  const [rows] = (await testDb().raw(sql, Array(perWorkshop).fill(workshopId))) as [Array<{ t: string; n: number; c: number | string }>];
  return Object.fromEntries(rows.map((r) => [r.t, `${r.n}:${r.c}`]));
}
