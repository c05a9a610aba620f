// Database commands for scripts and people: migrate, rollback (all), seed, reset, fresh.
//   node --import tsx db/cli.ts migrate|rollback|seed|reset|fresh
// KNEX_ENV=test targets the test database.
import knexFactory from "knex";
import config from "../knexfile";

const env = (process.env.KNEX_ENV ?? "development") as keyof typeof config;
const command = process.argv[2] ?? "migrate";
const k = knexFactory(config[env]);

async function dropAllTables() {
  const [rows] = await k.raw("SELECT table_name AS t FROM information_schema.tables WHERE table_schema = DATABASE()");
  await k.transaction(async (trx) => {
    await trx.raw("SET FOREIGN_KEY_CHECKS = 0");
    for (const { t } of rows as Array<{ t: string }>) await trx.raw("DROP TABLE IF EXISTS ??", [t]);
    await trx.raw("SET FOREIGN_KEY_CHECKS = 1");
  });
}

async function main() {
  switch (command) {
    case "migrate": {
      const [batch, done] = await k.migrate.latest();
      console.log(`[db] ${env}: migrations batch ${batch}, ${done.length} applied`);
      break;
    }
    case "rollback": {
      const [, undone] = await k.migrate.rollback(undefined, true);
      console.log(`[db] ${env}: rolled back ${undone.length} migrations`);
      break;
    }
    case "seed": {
      const [files] = await k.seed.run();
      console.log(`[db] ${env}: ran ${files.length} seed files`);
      break;
    }
    case "fresh":
    case "reset": {
      // Drop every table rather than roll back: a renamed or removed migration file must not
      // leave the database stuck.
      await dropAllTables();
      await k.migrate.latest();
      if (command === "reset") await k.seed.run();
      console.log(`[db] ${env}: database ${command === "reset" ? "reset to the demo data" : "migrated fresh"}`);
      break;
    }
    default:
      throw new Error(`unknown command ${command}`);
  }
}

main()
  .catch((err) => {
    console.error(`[db] ${command} failed:`, err instanceof Error ? err.message : err);
    process.exitCode = 1;
  })
  .finally(() => k.destroy());
