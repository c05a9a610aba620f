// House rules the code must keep, checked by reading the source tree.
import { readdirSync, readFileSync, statSync } from "node:fs";
import { join, relative } from "node:path";
import { describe, expect, it } from "vitest";

const root = join(__dirname, "..", "..");

function walk(dir: string, out: string[] = []): string[] {
  for (const name of readdirSync(dir)) {
    if (["node_modules", ".next", ".next-test", ".data", ".git", "tests"].includes(name)) continue;
    const p = join(dir, name);
    if (statSync(p).isDirectory()) walk(p, out);
    else if (/\.(ts|tsx|mts|mjs)$/.test(name)) out.push(relative(root, p));
  }
  return out;
}

const sources = walk(root);

describe("architecture", () => {
  it("imports the Knex instance only from lib/data and db/", () => {
    const offenders = sources.filter(
      (f) => !f.startsWith("lib/data/") && !f.startsWith("db/") && /from\s+["'](@\/db\/knex|.*\/db\/knex)["']/.test(readFileSync(join(root, f), "utf8")),
    );
    expect(offenders).toEqual([]);
  });

  it("keeps lib/ domain modules free of React and the database", () => {
    const pure = sources.filter((f) => /^lib\/(lutherie|workflow|money)\//.test(f));
    for (const f of pure) {
      const text = readFileSync(join(root, f), "utf8");
      expect(text, f).not.toMatch(/from\s+["'](react|knex|mysql2|@\/db\/|next\/)/);
    }
  });
});
