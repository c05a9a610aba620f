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

  it("mints workshop scopes only in the authorization helper", () => {
    const minters = sources.filter((f) => /mintWorkshopScope/.test(readFileSync(join(root, f), "utf8")));
    expect(minters.sort()).toEqual(["lib/auth/scope.ts", "lib/auth/workshop-access.ts"]);
  });

  it("authorises every workshop route through withWorkshop and never calls auth() in a handler", () => {
    const routes = sources.filter((f) => /^app\/api\/.*route\.ts$/.test(f));
    expect(routes.length).toBeGreaterThan(5);
    for (const f of routes) {
      const text = readFileSync(join(root, f), "utf8");
      if (f.startsWith("app/api/workshops/[workshop]/")) expect(text, f).toMatch(/withWorkshop\(/);
      expect(text, f).not.toMatch(/\bauth\(\)/);
    }
  });

  it("gives every server action file an authorising wrapper", () => {
    const actionFiles = sources.filter((f) => /^app\/.*actions\.ts$/.test(f));
    expect(actionFiles.length).toBeGreaterThan(3);
    for (const f of actionFiles) {
      const text = readFileSync(join(root, f), "utf8");
      const exported = text.match(/^export (const|async function) \w+/gm) ?? [];
      const wrapped = text.match(/^export const \w+(: [^=]+)? =\s*(workshopAction|userAction|publicAction)\(/gm) ?? [];
      const signOutOnly = text.match(/^export async function signOutAction/gm) ?? [];
      expect(wrapped.length + signOutOnly.length, f).toBe(exported.length);
    }
  });

  it("keeps lib/ domain modules free of React and the database", () => {
    const pure = sources.filter((f) => /^lib\/(lutherie|workflow|money|books)\//.test(f));
    for (const f of pure) {
      const text = readFileSync(join(root, f), "utf8");
      expect(text, f).not.toMatch(/from\s+["'](react|knex|mysql2|@\/db\/|next\/)/);
    }
  });
});
