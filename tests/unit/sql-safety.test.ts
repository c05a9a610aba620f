// No SQL is built by pasting values into strings: every raw fragment passed to Knex is a constant
// with ? / ?? placeholders. This reads the source of every module that can reach the database.
import { readdirSync, readFileSync, statSync } from "node:fs";
import { join, relative } from "node:path";
import { describe, expect, it } from "vitest";

const root = join(__dirname, "..", "..");
const RAW_CALL = String.raw`\b(?:raw|whereRaw|orWhereRaw|andWhereRaw|havingRaw|orHavingRaw|orderByRaw|groupByRaw|joinRaw|fromRaw|selectRaw|query)\(\s*`;
const PATTERNS: Array<[string, RegExp]> = [
  ["template literal with ${…}", new RegExp(RAW_CALL + "`[^`]*\\$\\{", "g")],
  ["string concatenation", new RegExp(RAW_CALL + `(?:"[^"]*"|'[^']*'|\\w+)\\s*\\+`, "g")],
  ["a variable as the SQL text", new RegExp(RAW_CALL + `(?!["'\`])(?!knex\\b|trx\\b|db\\b)[a-z]\\w*\\s*[,)]`, "g")],
];

function walk(dir: string, out: string[] = []): string[] {
  for (const name of readdirSync(dir)) {
    const p = join(dir, name);
    if (statSync(p).isDirectory()) walk(p, out);
    else if (/\.(ts|tsx)$/.test(name)) out.push(p);
  }
  return out;
}

describe("SQL safety", () => {
  const files = ["lib", "app", "db", "scripts"].flatMap((d) => walk(join(root, d)));

  it("scans the data layer", () => {
    expect(files.some((f) => f.includes(`${join("lib", "data")}`))).toBe(true);
  });

  it("never builds SQL text from values", () => {
    const found: string[] = [];
    for (const f of files) {
      const text = readFileSync(f, "utf8");
      for (const [what, re] of PATTERNS) {
        for (const m of text.matchAll(re)) {
          const line = text.slice(0, m.index).split("\n").length;
          found.push(`${relative(root, f)}:${line} ${what}: ${m[0].trim()}`);
        }
      }
    }
    expect(found).toEqual([]);
  });

  it("catches the patterns it looks for (self-check on bad examples)", () => {
    const bad = ["db.raw(`SELECT * FROM t WHERE id = ${id}`)", 'q.whereRaw("name = \'" + name + "\'")', "db.raw(sql, [])"];
    for (const b of bad) expect(PATTERNS.some(([, re]) => new RegExp(re.source).test(b)), b).toBe(true);
    const good = ['db.raw("SELECT 1")', 'q.whereRaw("LOWER(email) = ?", [email])', 'knex.raw("CHECKSUM TABLE ??", [t])'];
    for (const g of good) expect(PATTERNS.some(([, re]) => new RegExp(re.source).test(g)), g).toBe(false);
  });
});
