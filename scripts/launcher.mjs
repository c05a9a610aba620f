#!/usr/bin/env node
// The one launcher behind `npm start`, `npm run dev` and `npm test`.
// Plain Node.js with no dependencies: it runs on a fresh clone before `npm ci`.
//
//   start  install deps, start MariaDB, migrate, start the fakes and worker, seed the demo (the
//          books demo pays through the payments fake, so it needs the fakes up), build, serve on
//          APP_HOST:APP_PORT until Ctrl-C
//   dev    the same with `next dev`
//   test   install deps, start MariaDB, migrate the test database fresh, start the fakes on test
//          ports, build and serve a test app, run Vitest, then the browser tests; exit with their status
import { spawn, spawnSync } from "node:child_process";
import { createHash } from "node:crypto";
import { existsSync, mkdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { join, resolve } from "node:path";
import { ROOT, readEnv } from "./env.mjs";
import { servicesFor, testOverrides } from "./services.mjs";

const mode = process.argv[2] ?? "start";
// `npm test -- tests/http/x.test.ts` runs only those Vitest files (and no browser tests unless
// `--e2e` is among the words): the same bootstrap, a faster loop while working on one thing.
const extra = process.argv.slice(3);
// `npm test -- --serve` builds and starts the test stack and keeps it up without running anything:
// then `TEST_APP_URL=http://localhost:3100 npx vitest run tests/http/x.test.ts` as often as needed.
const serveOnly = extra.includes("--serve");
// Playwright spec files among the words go to Playwright (only those run), the rest to Vitest; with
// only spec files named, Vitest is skipped.
const isSpec = (a) => a.endsWith(".spec.ts");
const specArgs = extra.filter(isSpec);
const vitestArgs = extra.filter((a) => a !== "--e2e" && a !== "--serve" && !isSpec(a));
const wantE2e = extra.length === 0 || extra.includes("--e2e") || specArgs.length > 0;
const wantVitest = vitestArgs.length > 0 || specArgs.length === 0;
if (!["start", "dev", "test"].includes(mode)) {
  console.error(`usage: launcher.mjs start|dev|test (got ${mode})`);
  process.exit(2);
}

const started = Date.now();
const children = [];
let dbStartedByUs = false;
let stopping = false;

const say = (msg) => console.log(`[scalewright] ${msg}`);
const seconds = () => `${((Date.now() - started) / 1000).toFixed(1)} s`;

function run(cmd, args, env, label = cmd) {
  const r = spawnSync(cmd, args, { cwd: ROOT, env, stdio: "inherit" });
  if (r.status !== 0) throw new Error(`${label} failed (exit ${r.status ?? r.signal})`);
}

/** `npm ci` when node_modules is missing or older than package-lock.json. */
function ensureDependencies(env) {
  const lock = readFileSync(join(ROOT, "package-lock.json"));
  const digest = createHash("sha256").update(lock).digest("hex");
  const stamp = join(ROOT, "node_modules", ".scalewright-lock");
  if (existsSync(stamp) && readFileSync(stamp, "utf8") === digest) return;
  say("installing dependencies (npm ci)");
  run("npm", ["ci", "--no-audit", "--no-fund", "--loglevel=error"], env, "npm ci");
  writeFileSync(stamp, digest);
}

function startDatabase(env) {
  const status = spawnSync("bash", ["db/mariadb.sh", "status"], { cwd: ROOT, env, encoding: "utf8" });
  dbStartedByUs = status.status !== 0;
  run("bash", ["db/mariadb.sh", "start"], env, "MariaDB start");
}

function tsx(script, args, env, label) {
  run(process.execPath, ["--import", "tsx", script, ...args], env, label);
}

/** Starts a long-running child in its own process group so Ctrl-C reaches it only through us. */
function startChild(name, cmd, args, env) {
  const child = spawn(cmd, args, { cwd: ROOT, env, stdio: ["ignore", "inherit", "inherit"], detached: true });
  child.on("exit", (code, signal) => {
    if (!stopping) {
      say(`${name} exited (${code ?? signal}); stopping everything`);
      shutdown(code || 1);
    }
  });
  children.push({ name, child });
  return child;
}

async function waitForHttp(url, name, timeoutMs = 120_000) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    try {
      const res = await fetch(url, { signal: AbortSignal.timeout(2000) });
      if (res.status < 500) return;
    } catch {
      /* not up yet */
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`${name} did not answer at ${url} within ${timeoutMs / 1000} s`);
}

async function startServices(env) {
  for (const s of servicesFor(mode, env)) {
    startChild(s.name, s.cmd, s.args, { ...env, ...(s.env ?? {}) });
    if (s.readyUrl) await waitForHttp(s.readyUrl, s.name);
    if (s.printUrl) say(`${s.name}: ${s.printUrl}`);
  }
}

function nextBin() {
  return join(ROOT, "node_modules", "next", "dist", "bin", "next");
}

function stopChildren() {
  for (const { child } of children.reverse()) {
    if (child.exitCode === null && child.signalCode === null) {
      try {
        process.kill(-child.pid, "SIGTERM");
      } catch {
        /* already gone */
      }
    }
  }
}

function shutdown(code) {
  if (stopping) return;
  stopping = true;
  stopChildren();
  const finish = () => {
    if (dbStartedByUs && process.env.KEEP_DB !== "1") {
      spawnSync("bash", ["db/mariadb.sh", "stop"], { cwd: ROOT, stdio: "inherit" });
    }
    process.exit(code);
  };
  // Give children a moment to exit on SIGTERM, then force.
  const deadline = Date.now() + 5000;
  const poll = () => {
    const alive = children.filter(({ child }) => child.exitCode === null && child.signalCode === null);
    if (alive.length === 0 || Date.now() > deadline) {
      for (const { child } of alive) {
        try {
          process.kill(-child.pid, "SIGKILL");
        } catch {
          /* gone */
        }
      }
      finish();
    } else setTimeout(poll, 100);
  };
  poll();
}

process.on("SIGINT", () => shutdown(130));
process.on("SIGTERM", () => shutdown(143));

async function main() {
  const base = { ...readEnv(), NEXT_TELEMETRY_DISABLED: "1" };
  const env = mode === "test" ? { ...base, ...testOverrides(base) } : base;
  mkdirSync(join(ROOT, env.DATA_DIR ?? ".data"), { recursive: true });

  ensureDependencies(env);
  startDatabase(env);

  if (mode === "test") {
    // The test database is rebuilt from nothing on every run: down to zero, then up; the fakes'
    // test state goes with it, so no webhook or e-mail from an earlier run is still in flight.
    tsx("db/cli.ts", ["fresh"], { ...env, KNEX_ENV: "test" }, "test migrations");
    rmSync(resolve(ROOT, env.FAKES_DATA_DIR), { recursive: true, force: true });
  } else {
    tsx("db/cli.ts", ["migrate"], { ...env, KNEX_ENV: "development" }, "migrations");
  }

  await startServices(env);
  if (mode !== "test") tsx("db/cli.ts", ["seed"], { ...env, KNEX_ENV: "development" }, "demo seed");

  const host = env.APP_HOST ?? "127.0.0.1";
  const port = env.APP_PORT ?? "3000";
  const appEnv = { ...env, KNEX_ENV: mode === "test" ? "test" : "development" };

  if (mode === "dev") {
    startChild("app (next dev)", process.execPath, [nextBin(), "dev", "-H", host, "-p", port], appEnv);
  } else {
    run(process.execPath, [nextBin(), "build"], { ...appEnv, NODE_ENV: "production" }, "next build");
    startChild("app", process.execPath, [nextBin(), "start", "-H", host, "-p", port], { ...appEnv, NODE_ENV: "production" });
  }
  await waitForHttp(`${env.APP_URL}/api/health`, "app", 180_000);

  if (mode === "test" && serveOnly) {
    say(`test stack ready in ${seconds()}: ${env.APP_URL} on the test database; Ctrl-C stops it`);
    say(`run files against it: TEST_APP_URL=${env.APP_URL} npx vitest run <files>`);
    return;
  }
  if (mode !== "test") {
    say(`ready in ${seconds()}: open ${env.APP_URL}`);
    say(`sign in as any demo person (README lists them) with the password ${env.DEMO_PASSWORD}`);
    say("Ctrl-C stops everything this launcher started");
    return;
  }

  const testEnv = { ...appEnv, NODE_ENV: "test", TEST_APP_URL: env.APP_URL };
  let status = 0;
  if (wantVitest) {
    const vitest = spawnSync(process.execPath, [join(ROOT, "node_modules", "vitest", "vitest.mjs"), "run", ...vitestArgs], {
      cwd: ROOT,
      env: testEnv,
      stdio: "inherit",
    });
    status = vitest.status ?? 1;
  }

  if (existsSync(join(ROOT, "tests", "e2e")) && process.env.SKIP_E2E !== "1" && wantE2e) {
    run("bash", ["scripts/ensure-chromium.sh"], env, "Chromium install");
    const pw = spawnSync(
      process.execPath,
      [join(ROOT, "node_modules", "@playwright", "test", "cli.js"), "test", "--config", "tests/e2e/playwright.config.ts", ...specArgs],
      { cwd: ROOT, env: testEnv, stdio: "inherit" },
    );
    if ((pw.status ?? 1) !== 0) status = pw.status ?? 1;
  }
  say(`tests ${status === 0 ? "passed" : "FAILED"} in ${seconds()}`);
  shutdown(status);
}

main().catch((err) => {
  console.error(`[scalewright] ${err instanceof Error ? err.message : err}`);
  shutdown(1);
});
