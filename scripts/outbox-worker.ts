// The e-mail outbox worker: a separate process the launcher starts beside the app (and safe to
// start more than once). Stops cleanly on SIGTERM/SIGINT after the message in hand.
import { loadEnv } from "./env.mjs";

loadEnv();

const { runWorker } = await import("../lib/outbox/worker");
const { closeDatabase } = await import("../lib/data/connection");

const stop = new AbortController();
for (const sig of ["SIGTERM", "SIGINT"] as const) process.on(sig, () => stop.abort());

const pollMs = Number(process.env.OUTBOX_POLL_MS) > 0 ? Number(process.env.OUTBOX_POLL_MS) : 500;
console.log(`[outbox] worker started (${process.env.KNEX_ENV ?? "development"} database, polling every ${pollMs} ms, sending to ${process.env.RESEND_BASE_URL})`);
await runWorker(stop.signal, pollMs);
await closeDatabase();
console.log("[outbox] worker stopped");
