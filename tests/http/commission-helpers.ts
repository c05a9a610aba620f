// Commission test helpers over HTTP: open one, draft and approve a spec, read the outbox.
import { presetById } from "@/lib/lutherie/presets";
import type { CommissionDetail, CommissionSummary } from "@/lib/schemas/commission-out";
import type { SpecVersionSummary } from "@/lib/schemas/spec-version";
import { testDb } from "../setup/test-db";
import type { TestWorkshop } from "./fixtures";
import { signIn, type HttpSession } from "./session";

export const base = (ws: TestWorkshop) => `/api/workshops/${ws.slug}/commissions`;

/** Signs in the workshop's first owner, builder, bookkeeper and client. */
export async function signInRoles(ws: TestWorkshop): Promise<{ owner: HttpSession; builder: HttpSession; bookkeeper: HttpSession; client: HttpSession }> {
  const [owner, builder, bookkeeper, client] = await Promise.all([signIn(ws.owner), signIn(ws.builder), signIn(ws.bookkeeper), signIn(ws.client)]);
  return { owner, builder, bookkeeper, client };
}

export function sixStringSpec() {
  return structuredClone(presetById("six").spec);
}

export async function openCommission(owner: HttpSession, ws: TestWorkshop, extra: Record<string, unknown> = {}): Promise<CommissionSummary> {
  const r = await owner.json<{ commission: CommissionSummary }>(base(ws), {
    method: "POST",
    json: { title: "Test commission", clientId: ws.client.userId, builderId: ws.builder.userId, priceMinor: 300_000, ...extra },
  });
  if (r.status !== 201) throw new Error(`open failed: ${r.status} ${JSON.stringify(r.body)}`);
  return r.body.commission;
}

export async function draftSpec(s: HttpSession, ws: TestWorkshop, id: number, spec = sixStringSpec(), options: Record<string, unknown> = {}) {
  const r = await s.json<{ version: SpecVersionSummary }>(`${base(ws)}/${id}/spec-versions`, { method: "POST", json: { spec, options } });
  if (r.status !== 201) throw new Error(`draft failed: ${r.status} ${JSON.stringify(r.body)}`);
  return r.body.version;
}

/** Drafts, sends and approves a spec: the commission ends in the deposit stage. */
export async function approveSpec(builder: HttpSession, client: HttpSession, ws: TestWorkshop, id: number) {
  const v = await draftSpec(builder, ws, id);
  const sub = await builder.fetch(`${base(ws)}/${id}/spec-versions/${v.id}/submit`, { method: "POST", json: {} });
  if (sub.status !== 200) throw new Error(`submit failed ${sub.status} ${await sub.text()}`);
  const ap = await client.fetch(`${base(ws)}/${id}/spec-versions/${v.id}/approve`, { method: "POST" });
  if (ap.status !== 200) throw new Error(`approve failed ${ap.status} ${await ap.text()}`);
  return v;
}

export async function detail(s: HttpSession, ws: TestWorkshop, id: number): Promise<CommissionDetail> {
  const r = await s.json<{ commission: CommissionDetail }>(`${base(ws)}/${id}`);
  if (r.status !== 200) throw new Error(`detail ${r.status}`);
  return r.body.commission;
}

export async function move(s: HttpSession, ws: TestWorkshop, id: number, action: string, note?: string) {
  return s.fetch(`${base(ws)}/${id}/transitions`, { method: "POST", json: { action, note } });
}

/** Outbox rows for one recipient, oldest first (template names). */
export async function outboxTemplatesFor(email: string): Promise<string[]> {
  return (await testDb()("email_outbox").where({ to_address: email }).orderBy("id").pluck("template")) as string[];
}
