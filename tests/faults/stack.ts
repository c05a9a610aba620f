// A private stack for fault tests: its own MariaDB (db/mariadb.sh on its own data folder and port)
// and its own `next start` of the app `npm test` already built, so killing the database here can
// never disturb the server and app the other test files use.
import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import { readFileSync, rmSync } from "node:fs";
import { join } from "node:path";

const root = join(__dirname, "..", "..");

export interface FaultStack {
  appUrl: string;
  dbPort: string;
  env: NodeJS.ProcessEnv;
  /** SIGKILLs mariadbd, as a crash or an OOM kill would. */
  killDatabase(): void;
  /** Starts it again without blocking this process (the load keeps running meanwhile). */
  startDatabase(): Promise<void>;
  stop(): Promise<void>;
}

function mariadb(env: NodeJS.ProcessEnv, cmd: string): void {
  const r = spawnSync("bash", [join(root, "db", "mariadb.sh"), cmd], { env, encoding: "utf8", timeout: 120_000 });
  if (r.status !== 0) throw new Error(`db/mariadb.sh ${cmd} failed: ${r.stdout}${r.stderr}`);
}

async function waitFor(url: string, ok: (status: number) => boolean, timeoutMs: number): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    try {
      const res = await fetch(url, { signal: AbortSignal.timeout(2000) });
      if (ok(res.status)) return;
    } catch {
      /* not up yet */
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`${url} did not answer as expected within ${timeoutMs / 1000} s`);
}

/**
 * Starts the private stack. `offset` keeps ports apart from the main test stack and from other
 * fault files (each file takes its own offset).
 */
export async function startFaultStack(name: string, offset: number): Promise<FaultStack> {
  const dataDir = join(root, ".data", `test-faults-${name}`);
  rmSync(dataDir, { recursive: true, force: true });
  const dbPort = String(Number(process.env.DB_PORT ?? 3407) + offset);
  const appPort = String(Number(process.env.APP_PORT ?? 3100) + offset);
  const appUrl = `http://localhost:${appPort}`;
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    DATA_DIR: dataDir,
    DB_PORT: dbPort,
    KNEX_ENV: "test",
    APP_PORT: appPort,
    APP_URL: appUrl,
    NEXT_DIST_DIR: ".next-test",
    NEXT_TELEMETRY_DISABLED: "1",
  };
  mariadb(env, "start");
  const migrate = spawnSync(process.execPath, ["--import", "tsx", "db/cli.ts", "fresh"], { cwd: root, env, encoding: "utf8" });
  if (migrate.status !== 0) throw new Error(`migrations failed: ${migrate.stdout}${migrate.stderr}`);

  const app: ChildProcess = spawn(
    process.execPath,
    [join(root, "node_modules", "next", "dist", "bin", "next"), "start", "-H", "127.0.0.1", "-p", appPort],
    { cwd: root, env: { ...env, NODE_ENV: "production" }, stdio: ["ignore", "ignore", "inherit"] },
  );
  await waitFor(`${appUrl}/api/health`, (s) => s === 200, 60_000);

  const pidFile = join(dataDir, "mariadb", "mariadb.pid");
  return {
    appUrl,
    dbPort,
    env,
    killDatabase() {
      const pid = Number(readFileSync(pidFile, "utf8").trim());
      process.kill(pid, "SIGKILL");
      // Wait until the process is gone, so the next start sees a stale pid file, as after a crash.
      for (let i = 0; i < 100; i++) {
        try {
          process.kill(pid, 0);
        } catch {
          return;
        }
        spawnSync("sleep", ["0.05"]);
      }
    },
    startDatabase() {
      return new Promise((resolve, reject) => {
        const child = spawn("bash", [join(root, "db", "mariadb.sh"), "start"], { env, stdio: "ignore" });
        child.on("exit", (code) => (code === 0 ? resolve() : reject(new Error(`db/mariadb.sh start exited ${code}`))));
      });
    },
    async stop() {
      app.kill("SIGTERM");
      await new Promise((r) => setTimeout(r, 500));
      if (app.exitCode === null) app.kill("SIGKILL");
      spawnSync("bash", [join(root, "db", "mariadb.sh"), "stop"], { env });
      rmSync(dataDir, { recursive: true, force: true });
    },
  };
}

/**
 * Points the test helpers (fixtures, sessions, test-db) at the private stack and makes a workshop
 * with its members there, signed in as the owner. The helpers read DB_PORT and TEST_APP_URL when
 * first used, so they are imported only after these are set.
 */
export async function workshopOnStack(stack: FaultStack) {
  process.env.DB_PORT = stack.dbPort;
  process.env.TEST_APP_URL = stack.appUrl;
  const fixtures = await import("../http/fixtures");
  const session = await import("../http/session");
  const db = (await import("../setup/test-db")).testDb();
  const ws = await fixtures.createWorkshopWithMembers();
  const owner = await session.signIn(ws.owner);
  return { db, ws, owner };
}
