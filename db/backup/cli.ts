// npm run db:backup [-- --database NAME] [--out FILE]
// npm run db:restore -- FILE [--database NAME]   (NAME defaults to DB_NAME: stop the app first)
import { join } from "node:path";
import { parseArgs } from "node:util";
import { loadEnv } from "../../scripts/env.mjs";
import { backupDatabase, restoreDatabase, targetFromEnv } from "./backup";

loadEnv();
const [command, ...rest] = process.argv.slice(2);
const { values, positionals } = parseArgs({ args: rest, allowPositionals: true, options: { database: { type: "string" }, out: { type: "string" } } });
const target = targetFromEnv(values.database);

async function main() {
  if (command === "backup") {
    const stamp = new Date().toISOString().replace(/[-:]/g, "").replace(/\.\d+Z$/, "Z");
    const file = values.out ?? join(process.env.DATA_DIR ?? ".data", "backups", `${target.database}-${stamp}.sql.gz`);
    const started = Date.now();
    await backupDatabase(target, file);
    console.log(`[backup] ${target.database} → ${file} in ${Date.now() - started} ms`);
  } else if (command === "restore") {
    const file = positionals[0];
    if (!file) throw new Error("give the backup file: npm run db:restore -- FILE [--database NAME]");
    const started = Date.now();
    await restoreDatabase(target, file);
    console.log(`[restore] ${file} → ${target.database} in ${Date.now() - started} ms`);
  } else {
    throw new Error("usage: db/backup/cli.ts backup|restore …");
  }
}

main().catch((err) => {
  console.error(`[${command}] failed: ${err instanceof Error ? err.message : err}`);
  process.exitCode = 1;
});
