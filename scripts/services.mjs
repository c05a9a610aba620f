// The long-running processes the launcher starts besides MariaDB and the app: the fakes of the
// hosted services and the background workers. Each later feature adds its entry here.
//
// An entry: { name, cmd, args, env?, readyUrl?, printUrl? }. readyUrl is polled until it answers.

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

// eslint-disable-next-line no-unused-vars
export function servicesFor(mode, env) {
  const tsx = (script) => [process.execPath, ["--import", "tsx", script]];
  void tsx;
  return [];
}
