import { readdirSync } from "node:fs";
import { join } from "node:path";
import type { Knex } from "knex";

// Migrations and seeds are imported by our own code rather than by Knex, so whatever loads this
// module (tsx for the CLI, Vite under Vitest, Next for the app) also compiles the TypeScript files.

const here = import.meta.dirname;

function listTs(folder: string): string[] {
  return readdirSync(join(here, folder))
    .filter((f) => /\.ts$/.test(f) && !f.endsWith(".d.ts"))
    .sort();
}

export const migrationSource: Knex.MigrationSource<string> = {
  getMigrations: async () => listTs("migrations"),
  getMigrationName: (name) => name,
  getMigration: async (name) => import(/* @vite-ignore */ join(here, "migrations", name)),
};

export const seedSource: Knex.SeedSource<string> = {
  getSeeds: async () => listTs("seeds"),
  getSeed: async (name) => import(/* @vite-ignore */ join(here, "seeds", name)),
};
