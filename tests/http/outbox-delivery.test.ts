// The e-mail outbox against the real worker (started by `npm test`, plus two more in this process:
// the worker must be safe to run more than once) and the real Resend SDK against the fake.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { inTransaction } from "@/lib/data/transaction";
import { enqueueEmail } from "@/lib/outbox/enqueue";
import { runWorker, workerOptionsFromEnv } from "@/lib/outbox/worker";
import { closeTestDb, testDb } from "../setup/test-db";
import { createWorkshopWithMembers, uid, type TestWorkshop } from "./fixtures";
import { messagesTo, requestsTo, setFakeMode, waitForEmail } from "./inbox";
import { signIn, type HttpSession } from "./session";

let ws: TestWorkshop;
let owner: HttpSession;
const extraWorkers = new AbortController();
const running: Promise<void>[] = [];

beforeAll(async () => {
  ws = await createWorkshopWithMembers();
  owner = await signIn(ws.owner);
  // Two more workers beside the launcher's, retrying sooner (capped at 2 s) so the test is quick.
  const opts = { ...workerOptionsFromEnv(), policy: { baseMs: 500, maxMs: 2000, maxAttempts: 12 }, log: () => {} };
  for (let i = 0; i < 2; i++) running.push(runWorker(extraWorkers.signal, 200, opts));
});

afterAll(async () => {
  extraWorkers.abort();
  await Promise.all(running);
  await closeTestDb();
});

async function rowsTo(addresses: string[]) {
  return testDb()("email_outbox").whereIn("to_address", addresses).select("id", "to_address", "status", "attempts", "last_error", "idempotency_key");
}

async function until<T>(what: string, fn: () => Promise<T | undefined | false>, timeoutMs = 40_000): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const v = await fn();
    if (v) return v;
    if (Date.now() > deadline) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 250));
  }
}

async function invite(email: string) {
  const r = await owner.fetch(`/api/workshops/${ws.slug}/invitations`, { json: { email, role: "client" } });
  expect(r.status).toBe(201);
}

describe("e-mail outbox", () => {
  it("delivers everything once the provider recovers from an outage, each message exactly once", { timeout: 90_000 }, async () => {
    const tag = `outage-${uid()}`;
    const addresses = Array.from({ length: 12 }, (_, i) => `${tag}-${i}@example.com`);
    await setFakeMode({ mode: "fail", match: tag, status: 503 });
    try {
      // The invitations are saved while the provider is down: nothing is lost, nothing waits on it.
      for (const a of addresses) await invite(a);
      await until("two failed attempts per message", async () => {
        const counts = await Promise.all(addresses.map(async (a) => (await requestsTo(a)).filter((r) => r.outcome === "failed").length));
        return counts.every((n) => n >= 2);
      });
      const during = await rowsTo(addresses);
      expect(during).toHaveLength(12);
      for (const r of during) {
        expect(r.status === "pending" || r.status === "sending").toBe(true);
        expect(r.attempts).toBeGreaterThanOrEqual(2);
      }
      expect(during.find((r) => r.status === "pending")?.last_error).toMatch(/HTTP 503/);
      for (const a of addresses) expect(await messagesTo(a)).toEqual([]);
    } finally {
      await setFakeMode({ mode: "ok", match: tag });
    }

    const sent = await until("every message sent", async () => {
      const rows = await rowsTo(addresses);
      return rows.every((r) => r.status === "sent") && rows;
    });
    for (const a of addresses) {
      const stored = await messagesTo(a);
      expect(stored, a).toHaveLength(1);
      const requests = await requestsTo(a);
      // Three workers, several attempts each, yet one accepted request per message and no replays
      // or concurrent uses of a key: the claim (FOR UPDATE SKIP LOCKED) gave each attempt to one worker.
      expect(requests.filter((r) => r.outcome === "accepted"), a).toHaveLength(1);
      expect(requests.filter((r) => r.outcome === "replayed" || r.outcome === "conflict"), a).toEqual([]);
      const row = sent.find((r) => r.to_address === a)!;
      expect(stored[0]!.idempotencyKey).toBe(row.idempotency_key);
      expect(row.attempts).toBe(requests.length);
    }
  });

  it("gives up on a message the provider refuses, shows it to the owner, and sends it when asked again", { timeout: 60_000 }, async () => {
    const email = `refused-${uid()}@example.com`;
    await setFakeMode({ mode: "reject", match: email });
    try {
      await invite(email);
      const [row] = await until("the message to fail for good", async () => {
        const rows = await rowsTo([email]);
        return rows[0]?.status === "failed" && rows;
      });
      expect(row!.attempts).toBe(1);
      const failed = await owner.json<{ messages: Array<{ id: number; to: string; status: string; lastError: string }> }>(`/api/workshops/${ws.slug}/outbox?status=failed`);
      const shown = failed.body.messages.find((m) => m.to === email);
      expect(shown).toMatchObject({ status: "failed", lastError: expect.stringMatching(/validation_error.*HTTP 422/) });
      const page = await (await owner.fetch(`/${ws.slug}/members`)).text();
      expect(page).toContain("E-mail that could not be delivered");
      expect(page).toContain(email);
      await setFakeMode({ mode: "ok", match: email });
      const retried = await owner.json<{ message: { status: string } }>(`/api/workshops/${ws.slug}/outbox/${shown!.id}/retry`, { method: "POST" });
      expect(retried).toMatchObject({ status: 200, body: { message: { status: "pending" } } });
      await waitForEmail(email);
      expect(await messagesTo(email)).toHaveLength(1);
    } finally {
      await setFakeMode({ mode: "ok", match: email });
    }
  });

  it("writes an e-mail only if the change that causes it commits", async () => {
    const kept = `kept-${uid()}@example.com`;
    const dropped = `dropped-${uid()}@example.com`;
    const props = { signInUrl: "http://localhost:3000/x", expiresAt: new Date().toISOString() };
    await expect(
      inTransaction(async (trx) => {
        await enqueueEmail(trx, { workshopId: ws.id, to: dropped, template: "magic-link", props });
        throw new Error("the change failed");
      }),
    ).rejects.toThrow("the change failed");
    await inTransaction((trx) => enqueueEmail(trx, { workshopId: ws.id, to: kept, template: "magic-link", props }));
    await waitForEmail(kept);
    expect(await rowsTo([dropped])).toEqual([]);
    expect(await messagesTo(dropped)).toEqual([]);
  });

  it("takes over a message whose worker died while sending it", async () => {
    const email = `orphan-${uid()}@example.com`;
    await testDb()("email_outbox").insert({
      workshop_id: ws.id,
      template: "magic-link",
      to_address: email,
      subject: "Your Scalewright sign-in link",
      props: JSON.stringify({ signInUrl: "http://localhost:3000/x", expiresAt: new Date().toISOString() }),
      idempotency_key: `orphan-${uid()}`,
      status: "sending",
      attempts: 1,
      locked_until: new Date(Date.now() - 1000),
    });
    await waitForEmail(email);
    const [row] = await rowsTo([email]);
    expect(row).toMatchObject({ status: "sent", attempts: 2 });
  });
});
