// The e-mail provider down for a minute: its process is killed (SIGKILL) while the app keeps writing
// invitations. Nothing waits on it and nothing is lost: the outbox keeps every message, the worker
// keeps trying with backoff, and once the provider is back (same data folder) each message is
// delivered exactly once. Runs on a private stack (stack.ts) with its own e-mail fake and worker, so
// the other test files' fake and worker never see this outage.
import { spawn, type ChildProcess } from "node:child_process";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { TestWorkshop } from "../http/fixtures";
import { messagesTo, requestsTo } from "../http/inbox";
import type { HttpSession } from "../http/session";
import { startFaultStack, workshopOnStack, type FaultStack } from "./stack";

const OFFSET = 70;
const OUTAGE_MS = 60_000;
const root = join(__dirname, "..", "..");

let stack: FaultStack;
let ws: TestWorkshop;
let owner: HttpSession;
let fake: ChildProcess | null = null;
let worker: ChildProcess | null = null;
let db: Awaited<ReturnType<typeof import("../setup/test-db")["testDb"]>>;
const fakePort = String(Number(process.env.FAKE_RESEND_PORT ?? 3410) + OFFSET);
const fakeUrl = `http://127.0.0.1:${fakePort}`;

function tsx(entry: string, env: NodeJS.ProcessEnv): ChildProcess {
  return spawn(process.execPath, ["--import", "tsx", entry], { cwd: root, env, stdio: ["ignore", "ignore", "inherit"] });
}

async function until<T>(what: string, fn: () => Promise<T | undefined | false>, timeoutMs: number): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const v = await fn().catch(() => undefined);
    if (v) return v;
    if (Date.now() > deadline) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 250));
  }
}

async function startFake(): Promise<void> {
  fake = tsx("fakes/resend/server.ts", { ...stack.env, FAKE_RESEND_PORT: fakePort, FAKES_DATA_DIR: join(stack.env.DATA_DIR!, "fakes"), FAKE_RESEND_MODE: "" });
  await until("the e-mail fake", async () => (await fetch(`${fakeUrl}/health`)).ok, 30_000);
}

async function killFake(): Promise<void> {
  const p = fake!;
  fake = null;
  const gone = new Promise((r) => p.once("exit", r));
  p.kill("SIGKILL");
  await gone;
}

beforeAll(async () => {
  stack = await startFaultStack("email", OFFSET);
  ({ db, ws, owner } = await workshopOnStack(stack));
  await startFake();
  // Retries sooner than in production (1 s doubling, capped at 8 s) so a minute holds several attempts.
  worker = tsx("scripts/outbox-worker.ts", {
    ...stack.env,
    RESEND_BASE_URL: fakeUrl,
    OUTBOX_POLL_MS: "200",
    OUTBOX_BACKOFF_BASE_MS: "1000",
    OUTBOX_BACKOFF_MAX_MS: "8000",
    OUTBOX_REQUEST_TIMEOUT_MS: "3000",
  });
}, 180_000);

afterAll(async () => {
  worker?.kill("SIGTERM");
  if (fake) await killFake();
  await (await import("../setup/test-db")).closeTestDb();
  await stack?.stop();
});

describe("e-mail provider outage", () => {
  it("keeps every message while the provider is down for a minute, then delivers each exactly once", { timeout: 240_000 }, async () => {
    await killFake();
    const tag = `down-${Date.now()}`;
    const addresses = Array.from({ length: 8 }, (_, i) => `${tag}-${i}@example.com`);
    const started = Date.now();
    for (const email of addresses) {
      // The app answers at once: the invitation and its e-mail are saved, the provider is not asked.
      const r = await owner.fetch(`/api/workshops/${ws.slug}/invitations`, { json: { email, role: "client" } });
      expect(r.status).toBe(201);
    }
    const rows = () => db("email_outbox").whereIn("to_address", addresses).select("to_address", "status", "attempts", "last_error", "idempotency_key");

    // Halfway through, every message is waiting and has been tried more than once.
    await new Promise((r) => setTimeout(r, OUTAGE_MS / 2));
    const midway = await rows();
    expect(midway).toHaveLength(addresses.length);
    for (const m of midway) {
      expect(["pending", "sending"]).toContain(m.status);
      expect(m.attempts).toBeGreaterThanOrEqual(2);
    }
    expect(midway.find((m) => m.status === "pending")?.last_error).toMatch(/request failed|fetch|ECONNREFUSED/i);

    await new Promise((r) => setTimeout(r, Math.max(0, started + OUTAGE_MS - Date.now())));
    const atEnd = await rows();
    expect(atEnd.every((m) => m.status === "pending" || m.status === "sending"), "nothing given up or lost during the outage").toBe(true);

    await startFake();
    const sent = await until("every message sent", async () => {
      const r = await rows();
      return r.every((m) => m.status === "sent") && r;
    }, 60_000);
    for (const email of addresses) {
      const stored = await messagesTo(email, fakeUrl);
      expect(stored, email).toHaveLength(1);
      expect(stored[0]!.subject).toMatch(/invited you/);
      expect(stored[0]!.idempotencyKey).toBe(sent.find((m) => m.to_address === email)!.idempotency_key);
      const accepted = (await requestsTo(email, fakeUrl)).filter((q) => q.outcome === "accepted");
      expect(accepted, email).toHaveLength(1);
    }
  });
});
