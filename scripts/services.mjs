// The long-running processes the launcher starts besides MariaDB and the app: the fakes of the
// hosted services and the background workers. An entry starts once its entry file exists, so each
// feature only has to add its file.
//
// An entry: { name, cmd, args, env?, readyUrl?, printUrl? }. readyUrl is polled until it answers.
import { existsSync } from "node:fs";
import { join } from "node:path";
import { ROOT } from "./env.mjs";

/** Ports and folders for `npm test`, so a test run never touches the demo's state and can run beside it. */
export function testOverrides(env) {
  const shift = (name, fallback) => String(Number(env[name] ?? fallback) + 100);
  const appPort = shift("APP_PORT", 3000);
  return {
    APP_PORT: appPort,
    APP_URL: `http://localhost:${appPort}`,
    NEXT_DIST_DIR: ".next-test",
    FAKES_DATA_DIR: `${env.DATA_DIR ?? ".data"}/test-fakes`,
    FAKE_RESEND_PORT: shift("FAKE_RESEND_PORT", 3410),
    RESEND_BASE_URL: `http://127.0.0.1:${shift("FAKE_RESEND_PORT", 3410)}`,
    FAKE_STRIPE_PORT: shift("FAKE_STRIPE_PORT", 3411),
    STRIPE_API_PORT: shift("FAKE_STRIPE_PORT", 3411),
    FAKE_UPLOADTHING_PORT: shift("FAKE_UPLOADTHING_PORT", 3412),
  };
}

const tsx = (script) => [process.execPath, ["--import", "tsx", script]];

/** A fake service: `fakes/<name>/server.ts`, listening on its port, answering GET /health when ready. */
function fake(name, label, port, path = "/") {
  const entry = `fakes/${name}/server.ts`;
  const [cmd, args] = tsx(entry);
  return {
    entry,
    name: label,
    cmd,
    args,
    readyUrl: `http://127.0.0.1:${port}/health`,
    printUrl: `http://127.0.0.1:${port}${path}`,
  };
}

// eslint-disable-next-line no-unused-vars
export function servicesFor(mode, env) {
  const fakesDir = env.FAKES_DATA_DIR ?? `${env.DATA_DIR ?? ".data"}/fakes`;
  const [workerCmd, workerArgs] = tsx("scripts/outbox-worker.ts");
  const all = [
    fake("resend", "e-mail fake (inbox)", env.FAKE_RESEND_PORT ?? 3410, "/inbox"),
    fake("stripe", "payments fake", env.FAKE_STRIPE_PORT ?? 3411, "/"),
    fake("uploadthing", "uploads fake", env.FAKE_UPLOADTHING_PORT ?? 3412, "/"),
    { entry: "scripts/outbox-worker.ts", name: "e-mail outbox worker", cmd: workerCmd, args: workerArgs },
  ];
  return all
    .filter((s) => existsSync(join(ROOT, s.entry)))
    .map((s) => ({ ...s, env: { FAKES_DATA_DIR: fakesDir, KNEX_ENV: mode === "test" ? "test" : "development" } }));
}
