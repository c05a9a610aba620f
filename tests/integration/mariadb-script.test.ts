// db/mariadb.sh on an instance of its own (own data folder and port), so killing it cannot
// disturb the server the other tests use.
import { execFileSync, spawnSync } from "node:child_process";
import { existsSync, readFileSync, rmSync } from "node:fs";
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";

const root = join(__dirname, "..", "..");
const dataDir = join(root, ".data", "test-mariadb-script");
// A port of its own, derived from DB_PORT so parallel checkouts with other ports never collide.
const port = String(Number(process.env.DB_PORT ?? 3407) + 50);
const env: NodeJS.ProcessEnv = { ...process.env, DATA_DIR: dataDir, DB_PORT: port };
const pidFile = join(dataDir, "mariadb", "mariadb.pid");

function script(cmd: string): { status: number | null; out: string } {
  const r = spawnSync("bash", [join(root, "db", "mariadb.sh"), cmd], { env, encoding: "utf8", timeout: 120_000 });
  return { status: r.status, out: `${r.stdout}${r.stderr}` };
}

function query(sql: string): string {
  return execFileSync(
    "mariadb",
    ["--no-defaults", "-h127.0.0.1", `-P${port}`, `-u${env.DB_USER}`, `-p${env.DB_PASSWORD}`, "-N", "-e", sql],
    { encoding: "utf8" },
  ).trim();
}

afterAll(() => {
  script("stop");
  rmSync(dataDir, { recursive: true, force: true });
});

describe("db/mariadb.sh", { timeout: 120_000 }, () => {
  it("initialises, starts on 127.0.0.1 and creates both databases and the app user", () => {
    rmSync(dataDir, { recursive: true, force: true });
    const r = script("start");
    expect(r.status, r.out).toBe(0);
    expect(query("SELECT 1")).toBe("1");
    const dbs = query("SHOW DATABASES");
    expect(dbs).toContain(env.DB_NAME!);
    expect(dbs).toContain(env.DB_TEST_NAME!);
  });

  it("reuses a server that is already running", () => {
    const pid = readFileSync(pidFile, "utf8").trim();
    query("CREATE TABLE IF NOT EXISTS `" + env.DB_NAME + "`.keepme (id INT)");
    const r = script("start");
    expect(r.status, r.out).toBe(0);
    expect(r.out).toMatch(/already running/);
    expect(readFileSync(pidFile, "utf8").trim()).toBe(pid);
  });

  it("recovers after the server was killed, keeping its data", () => {
    const pid = Number(readFileSync(pidFile, "utf8").trim());
    process.kill(pid, "SIGKILL");
    // Wait for the process to die.
    for (let i = 0; i < 50 && existsSync(`/proc/${pid}`) && !readFileSync(`/proc/${pid}/stat`, "utf8").includes(") Z"); i++) {
      spawnSync("sleep", ["0.1"]);
    }
    const r = script("start");
    expect(r.status, r.out).toBe(0);
    expect(query(`SELECT COUNT(*) FROM information_schema.tables WHERE table_schema='${env.DB_NAME}' AND table_name='keepme'`)).toBe("1");
  });

  it("stops cleanly", () => {
    const r = script("stop");
    expect(r.status, r.out).toBe(0);
    expect(script("status").status).toBe(1);
  });
});
