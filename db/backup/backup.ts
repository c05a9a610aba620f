// Logical backups with mariadb-dump and restores with the mariadb client, over TCP with the app's
// own user, so they work the same against this machine's private server or a remote primary.
import { spawn } from "node:child_process";
import { createReadStream, createWriteStream, mkdirSync } from "node:fs";
import { dirname } from "node:path";
import { pipeline } from "node:stream/promises";
import { createGunzip, createGzip } from "node:zlib";

export interface DbTarget {
  host: string;
  port: number;
  user: string;
  password: string;
  database: string;
}

export function targetFromEnv(database?: string): DbTarget {
  return {
    host: process.env.DB_HOST ?? "127.0.0.1",
    port: Number(process.env.DB_PORT ?? 3407),
    user: process.env.DB_USER ?? "scalewright",
    password: process.env.DB_PASSWORD ?? "",
    database: database ?? process.env.DB_NAME ?? "scalewright",
  };
}

function clientArgs(t: DbTarget): string[] {
  return ["--no-defaults", `--host=${t.host}`, `--port=${t.port}`, `--user=${t.user}`, "--protocol=TCP", "--default-character-set=utf8mb4"];
}

function run(cmd: string, args: string[], password: string, stdio: { input?: NodeJS.ReadableStream; output?: NodeJS.WritableStream }) {
  // The password goes through the environment, not the command line (ps would show it).
  const child = spawn(cmd, args, { env: { ...process.env, MYSQL_PWD: password }, stdio: ["pipe", "pipe", "pipe"] });
  let stderr = "";
  child.stderr.on("data", (d) => (stderr += d));
  const done = new Promise<void>((resolve, reject) => {
    child.on("error", reject);
    child.on("close", (code) => (code === 0 ? resolve() : reject(new Error(`${cmd} exited ${code}: ${stderr.trim()}`))));
  });
  const jobs: Promise<unknown>[] = [done];
  if (stdio.input) jobs.push(pipeline(stdio.input, child.stdin));
  else child.stdin.end();
  if (stdio.output) jobs.push(pipeline(child.stdout, stdio.output));
  else child.stdout.resume();
  return Promise.all(jobs);
}

/**
 * Writes a gzip-compressed, consistent (single-transaction) dump of one database: schema, data,
 * triggers and routines, with the migrations table, so a restore is ready to run.
 */
export async function backupDatabase(t: DbTarget, file: string): Promise<void> {
  mkdirSync(dirname(file), { recursive: true });
  const args = [...clientArgs(t), "--single-transaction", "--quick", "--routines", "--triggers", "--hex-blob", "--skip-lock-tables", "--no-tablespaces", t.database];
  const gzip = createGzip();
  const out = createWriteStream(file);
  await Promise.all([run("mariadb-dump", args, t.password, { output: gzip }), pipeline(gzip, out)]);
}

/** Creates the database if needed and loads a dump made by backupDatabase into it. */
export async function restoreDatabase(t: DbTarget, file: string): Promise<void> {
  const create = `CREATE DATABASE IF NOT EXISTS \`${t.database.replace(/`/g, "``")}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`;
  await run("mariadb", [...clientArgs(t), "-e", create], t.password, {});
  await run("mariadb", [...clientArgs(t), t.database], t.password, { input: createReadStream(file).pipe(createGunzip()) });
}
