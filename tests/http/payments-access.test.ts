// Who may see and move a commission's money, over HTTP against the built app: the payments page per
// role, an unknown payment id, what each role is shown, and bad input answering 400/422 with field
// paths (who may call each payment route is the authorization matrix, tests/security/). No call here
// reaches the payment processor (payments-stripe.test.ts steers the shared fake).
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestDb } from "../setup/test-db";
import { base, openCommission } from "./commission-helpers";
import { addMember, createTestUser, createWorkshopWithMembers, type TestMember, type TestWorkshop } from "./fixtures";
import { commissionAwaitingDeposit, paymentRows, paymentsOf } from "./payment-helpers";
import { anonymous, signIn, type HttpSession } from "./session";

let ws: TestWorkshop;
let other: TestWorkshop;
let secondClient: TestMember;
let s: Record<"owner" | "builder" | "bookkeeper" | "client" | "secondClient" | "outsider", HttpSession>;
let commissionId: number;
let offlinePaymentId: number;

beforeAll(async () => {
  [ws, other] = await Promise.all([createWorkshopWithMembers(), createWorkshopWithMembers()]);
  secondClient = await addMember(ws.id, await createTestUser(), "client");
  const [owner, builder, bookkeeper, client, second, outsider] = await Promise.all([
    signIn(ws.owner),
    signIn(ws.builder),
    signIn(ws.bookkeeper),
    signIn(ws.client),
    signIn(secondClient),
    signIn(other.owner),
  ]);
  s = { owner, builder, bookkeeper, client, secondClient: second, outsider };
  const c = await commissionAwaitingDeposit({ owner, builder, client }, ws);
  commissionId = c.id;
  const paid = await bookkeeper.json<{ paymentId: number; advanced: boolean }>(`${base(ws)}/${c.id}/payments`, {
    method: "POST",
    json: { kind: "deposit", amountMinor: 90_000, reference: "Bank transfer 2027-03-01" },
  });
  expect(paid.status).toBe(201);
  expect(paid.body.advanced).toBe(true);
  offlinePaymentId = paid.body.paymentId;
});
afterAll(closeTestDb);

type Who = keyof typeof s | "anonymous";
const as = (who: Who) => (who === "anonymous" ? anonymous() : s[who]);

describe("payment routes by role", () => {
  // Who may call each payment route is the authorization matrix (tests/security/); here, what the
  // matrix does not ask: a payment id that is not of this commission, and the page itself per role.
  const table: Array<{ route: string; call: (h: HttpSession) => Promise<Response>; expect: Partial<Record<Who, number>> }> = [
    {
      route: "POST …/refunds of a payment that is not there",
      call: (h) => h.fetch(`${base(ws)}/${commissionId}/refunds`, { method: "POST", json: { paymentId: 2_147_483_000, amountMinor: 1 } }),
      expect: { owner: 404, bookkeeper: 404, client: 403, builder: 403, secondClient: 403, outsider: 404, anonymous: 401 },
    },
    {
      route: "page …/payments",
      call: (h) => h.fetch(`/${ws.slug}/commissions/${commissionId}/payments`),
      expect: { owner: 200, bookkeeper: 200, client: 200, builder: 403, secondClient: 404, outsider: 404, anonymous: 307 },
    },
  ];

  for (const row of table) {
    it(`answers ${row.route} per role`, async () => {
      const got: Partial<Record<Who, number>> = {};
      for (const who of Object.keys(row.expect) as Who[]) got[who] = (await row.call(as(who))).status;
      expect(got).toEqual(row.expect);
    });
  }

  it("says why a checkout is refused, in words", async () => {
    const r = await s.client.json<{ error: { message: string } }>(`${base(ws)}/${commissionId}/checkout`, { method: "POST", json: { kind: "deposit" } });
    expect(r.body.error.message).toBe("The deposit is already paid.");
    const early = await openCommission(s.owner, ws);
    const spec = await s.client.json<{ error: { message: string } }>(`${base(ws)}/${early.id}/checkout`, { method: "POST", json: { kind: "deposit" } });
    expect(spec.status).toBe(409);
    expect(spec.body.error.message).toMatch(/once you have approved the spec/);
    expect(await paymentRows(early.id)).toEqual([]);
  });

  it("refuses malformed bodies with 400 or 422 and the field's path", async () => {
    const bad = await s.client.json<{ error: { code: string; issues: Array<{ path: string }> } }>(`${base(ws)}/${commissionId}/checkout`, { method: "POST", json: { kind: "tip" } });
    expect(bad.status).toBe(422);
    expect(bad.body.error.issues[0]!.path).toBe("kind");
    const notJson = await s.client.fetch(`${base(ws)}/${commissionId}/checkout`, { method: "POST", body: "{kind", headers: { "content-type": "application/json" } });
    expect(notJson.status).toBe(400);
    const refund = await s.owner.json<{ error: { issues: Array<{ path: string }> } }>(`${base(ws)}/${commissionId}/refunds`, { method: "POST", json: { paymentId: "x", amountMinor: -5 } });
    expect(refund.status).toBe(422);
    expect(refund.body.error.issues.map((i) => i.path).sort()).toEqual(["amountMinor", "paymentId"]);
  });
});

describe("what each role sees", () => {
  it("shows the workshop's money people the processor's details and the client only their own figures", async () => {
    const forOwner = await paymentsOf(s.owner, ws, commissionId);
    expect(forOwner.can).toEqual({ pay: false, record: true, refund: true });
    expect(forOwner.payments[0]).toMatchObject({ id: offlinePaymentId, method: "offline", status: "paid", reference: "Bank transfer 2027-03-01" });
    expect(forOwner.payments[0]!.processor).not.toBeNull();
    const forClient = await paymentsOf(s.client, ws, commissionId);
    expect(forClient.can).toEqual({ pay: true, record: false, refund: false });
    expect(forClient.payments[0]!.processor).toBeNull();
    expect(forClient.invoices.map((i) => [i.kind, i.status])).toEqual([
      ["deposit", "paid"],
      ["balance", "due"],
    ]);
  });

  it("renders the page for each role: pay buttons for the client, forms for the owner, no money for a builder", async () => {
    const path = `/${ws.slug}/commissions/${commissionId}/payments`;
    const client = await (await s.client.fetch(path)).text();
    expect(client).toContain("Pay balance €2,100.00");
    expect(client).not.toContain("Record a payment");
    const owner = await (await s.owner.fetch(path)).text();
    expect(owner).toContain("Record a payment");
    expect(owner).toContain("Refund");
    expect(owner).not.toContain("Pay balance");
    const builder = await s.builder.fetch(path);
    expect(builder.status).toBe(403);
    const html = await builder.text();
    expect(html).not.toContain("€900.00");
    expect(html).not.toContain("€2,100.00");
    expect((await s.owner.fetch(`/${ws.slug}/commissions/not-a-number/payments`)).status).toBe(404);
  });

  it("records the return of money taken offline at once, up to what was paid", async () => {
    const over = await s.bookkeeper.json<{ error: { issues: Array<{ path: string }> } }>(`${base(ws)}/${commissionId}/refunds`, {
      method: "POST",
      json: { paymentId: offlinePaymentId, amountMinor: 90_001 },
    });
    expect(over.status).toBe(422);
    expect(over.body.error.issues[0]!.path).toBe("amountMinor");
    const r = await s.bookkeeper.json<{ refund: { status: string; amountMinor: number; refundOf: number } }>(`${base(ws)}/${commissionId}/refunds`, {
      method: "POST",
      json: { paymentId: offlinePaymentId, amountMinor: 15_000, reason: "Discount agreed" },
    });
    expect(r.status).toBe(201);
    expect(r.body.refund).toMatchObject({ status: "paid", amountMinor: 15_000, refundOf: offlinePaymentId });
    const view = await paymentsOf(s.client, ws, commissionId);
    expect(view.totals).toMatchObject({ paidMinor: 75_000, refundedMinor: 15_000 });
    expect(view.invoices[0]).toMatchObject({ status: "part_paid", outstandingMinor: 15_000 });
    // Another workshop's owner cannot refund it, even with its id.
    expect((await s.outsider.fetch(`/api/workshops/${other.slug}/commissions/${commissionId}/refunds`, { method: "POST", json: { paymentId: offlinePaymentId } })).status).toBe(404);
  });
});
