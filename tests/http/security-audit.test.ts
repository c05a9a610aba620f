// Security answers over HTTP: the headers on pages and API answers alike (signed in and out), and
// audit log entries — who did what, when — for stage changes, payments, refunds and role changes.
import { beforeAll, describe, expect, it } from "vitest";
import { testDb } from "../setup/test-db";
import { approveSpec, base, move, openCommission, signInRoles } from "./commission-helpers";
import { createWorkshopWithMembers, type TestWorkshop } from "./fixtures";
import type { HttpSession } from "./session";

let ws: TestWorkshop;
let s: Awaited<ReturnType<typeof signInRoles>>;

beforeAll(async () => {
  ws = await createWorkshopWithMembers({ extra: { client: 1 } });
  s = await signInRoles(ws);
});

/** Headers every answer carries (lib/http/security-headers.ts, set in proxy.ts). */
function expectSecurityHeaders(res: Response, what: string) {
  const csp = res.headers.get("content-security-policy") ?? "";
  expect(csp, what).toMatch(/default-src 'self'/);
  expect(csp, what).toMatch(/frame-ancestors 'none'/);
  expect(csp, what).toMatch(/object-src 'none'/);
  expect(res.headers.get("x-content-type-options"), what).toBe("nosniff");
  expect(res.headers.get("referrer-policy"), what).toBe("strict-origin-when-cross-origin");
  expect(res.headers.get("x-frame-options"), what).toBe("DENY");
}

async function auditRows(action: string): Promise<Array<{ actor_user_id: number; entity_type: string; entity_id: string; created_at: Date }>> {
  return testDb()("audit_log").where({ workshop_id: ws.id, action }).orderBy("id");
}

describe("security headers", () => {
  it("are on pages and API answers, signed out and signed in, including errors", async () => {
    const anon: Array<[string, HttpSession | null]> = [
      ["/", null],
      ["/sign-in", null],
      ["/calculator", null],
      ["/api/health", null],
      ["/api/me", null], // 401
      [`/${ws.slug}/commissions`, null], // redirect to sign-in
    ];
    for (const [path] of anon) expectSecurityHeaders(await fetch(`${process.env.TEST_APP_URL}${path}`, { redirect: "manual" }), `signed out ${path}`);
    for (const path of [`/${ws.slug}`, `/${ws.slug}/commissions`, `/api/workshops/${ws.slug}/commissions`, `/api/workshops/${ws.slug}/commissions/999999999`, "/no-such-page"]) {
      expectSecurityHeaders(await s.owner.fetch(path), `owner ${path}`);
    }
  });

  it("JSON answers are not cached by shared caches", async () => {
    const res = await s.owner.fetch(`/api/workshops/${ws.slug}/commissions`);
    expect(res.headers.get("cache-control")).toBe("private, no-store");
  });
});

describe("audit log", () => {
  it("records stage changes, payments, refunds and role changes with the actor", async () => {
    const c = await openCommission(s.owner, ws);
    await approveSpec(s.builder, s.client, ws, c.id);
    // Payment recorded by the bookkeeper (offline), which also moves the commission on.
    const paid = await s.bookkeeper.json<{ paymentId: number }>(`${base(ws)}/${c.id}/payments`, {
      method: "POST",
      json: { kind: "deposit", amountMinor: 90_000, reference: "Transfer 7781" },
    });
    expect(paid.status).toBe(201);
    expect((await move(s.builder, ws, c.id, "advance", "Blanks glued up")).status).toBe(200);
    const refund = await s.owner.fetch(`${base(ws)}/${c.id}/refunds`, { method: "POST", json: { paymentId: paid.body.paymentId, amountMinor: 10_000, reason: "Cheaper tuners" } });
    expect(refund.status).toBeLessThan(300);
    const member = ws.members.find((m) => m.role === "client" && m.userId !== ws.client.userId)!;
    expect((await s.owner.fetch(`/api/workshops/${ws.slug}/members/${member.membershipId}`, { method: "PATCH", json: { role: "builder" } })).status).toBe(200);

    const stage = (await auditRows("commission.stage_changed")).filter((r) => r.entity_id === String(c.id));
    expect(stage.map((r) => r.actor_user_id)).toEqual(expect.arrayContaining([ws.builder.userId]));
    expect(stage.length).toBeGreaterThanOrEqual(2); // spec → deposit (approval) and deposit → build, then the builder's move
    const payment = await auditRows("payment.recorded");
    expect(payment.some((r) => r.entity_id === String(paid.body.paymentId) && r.actor_user_id === ws.bookkeeper.userId)).toBe(true);
    const refunds = await auditRows("refund.recorded");
    expect(refunds.some((r) => r.actor_user_id === ws.owner.userId)).toBe(true);
    const roles = await auditRows("member.role_changed");
    expect(roles.some((r) => r.actor_user_id === ws.owner.userId && r.entity_id === String(member.membershipId))).toBe(true);
    for (const r of [...stage, ...payment, ...refunds, ...roles]) expect(r.created_at).toBeInstanceOf(Date);
  });
});
