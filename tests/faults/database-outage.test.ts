// MariaDB killed under load (SIGKILL, as a crash would): requests answer 503 with a clear message
// instead of hanging or failing with 500; the app recovers by itself when the server returns; every
// write the app acknowledged (201) is still there afterwards. Runs on a private stack (stack.ts).
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { TestWorkshop } from "../http/fixtures";
import type { HttpSession } from "../http/session";
import { startFaultStack, workshopOnStack, type FaultStack } from "./stack";

let stack: FaultStack;
let ws: TestWorkshop;
let owner: HttpSession;
let db: Awaited<ReturnType<typeof import("../setup/test-db")["testDb"]>>;

interface Outcome {
  phase: "before" | "down" | "after";
  status: number | "network" | "hung";
  code?: string;
  message?: string;
  id?: number;
}

beforeAll(async () => {
  stack = await startFaultStack("db", 60);
  ({ db, ws, owner } = await workshopOnStack(stack));
}, 180_000);

afterAll(async () => {
  await (await import("../setup/test-db")).closeTestDb();
  await stack?.stop();
});

describe("database outage under load", () => {
  it("answers 503 fast while MariaDB is away, recovers by itself and loses no committed write", { timeout: 180_000 }, async () => {
    const outcomes: Outcome[] = [];
    let phase: Outcome["phase"] = "before";
    let running = true;
    let n = 0;

    async function one(): Promise<void> {
      const at = phase;
      try {
        // A hang is a failure: the client gives up after 30 s (tests/http/client.ts) and we count it.
        const res = await owner.fetch(`/api/workshops/${ws.slug}/commissions`, {
          method: "POST",
          json: { title: `Outage test ${++n}`, clientId: ws.client.userId, priceMinor: 100_000 },
        });
        const body = (await res.json().catch(() => ({}))) as { commission?: { id: number }; error?: { code: string; message: string } };
        outcomes.push({ phase: at, status: res.status, code: body.error?.code, message: body.error?.message, id: body.commission?.id });
      } catch (err) {
        outcomes.push({ phase: at, status: /^timeout/.test((err as Error).message) ? "hung" : "network", message: (err as Error).message });
      }
    }
    const worker = async () => {
      while (running) await one();
    };
    const workers = Array.from({ length: 6 }, worker);

    // Counts, not clocks: the machine may be slow, so each phase lasts until enough has happened.
    const until = async (done: () => boolean, limitMs: number) => {
      const end = Date.now() + limitMs;
      while (Date.now() < end && !done()) await new Promise((r) => setTimeout(r, 100));
    };
    const count = (p: Outcome["phase"], pred: (o: Outcome) => boolean) => outcomes.filter((o) => o.phase === p && pred(o)).length;
    await until(() => count("before", (o) => o.status === 201) >= 10, 60_000);
    phase = "down";
    stack.killDatabase();
    await until(() => count("down", (o) => o.status !== 201) >= 12, 60_000);
    const health = await fetch(`${stack.appUrl}/api/health`);
    expect(health.status).toBe(503);

    phase = "after";
    await stack.startDatabase();
    // Recovery by itself: the same app process, no restart, writes succeed again.
    await until(() => count("after", (o) => o.status === 201) >= 1, 60_000);
    await new Promise((r) => setTimeout(r, 1000));
    running = false;
    await Promise.all(workers);

    const byPhase = (p: Outcome["phase"]) => outcomes.filter((o) => o.phase === p);
    expect(byPhase("before").filter((o) => o.status === 201).length).toBeGreaterThanOrEqual(10);
    // While it was down: only 503 "unavailable" with words a person understands (the requests in
    // flight at the moment of the kill may also have completed).
    const down = byPhase("down").filter((o) => o.status !== 201);
    expect(down.length).toBeGreaterThan(5);
    for (const o of down) {
      expect(o.status).toBe(503);
      expect(o.code).toBe("unavailable");
      expect(o.message).toMatch(/database is not reachable/i);
    }
    expect(outcomes.filter((o) => o.status === 500 || o.status === "hung" || o.status === "network")).toEqual([]);
    expect(byPhase("after").some((o) => o.status === 201)).toBe(true);
    expect((await fetch(`${stack.appUrl}/api/health`)).status).toBe(200);

    // No committed write lost: every commission the app acknowledged is in the database.
    const acknowledged = outcomes.filter((o) => o.status === 201).map((o) => o.id!);
    const stored = (await db("commissions").where({ workshop_id: ws.id }).pluck("id")) as number[];
    expect(stored).toEqual(expect.arrayContaining(acknowledged));
  });
});
