// Reading the e-mail fake (fakes/resend) from tests: what arrived for an address, and switching
// its failure modes for recipients matching a pattern (so other tests are not affected).

export interface FakeMessage {
  id: string;
  from: string;
  to: string[];
  subject: string;
  html: string | null;
  text: string | null;
  idempotencyKey: string | null;
  createdAt: string;
  links: string[];
}

export interface FakeRequest {
  at: string;
  idempotencyKey: string | null;
  to: string[];
  outcome: "accepted" | "replayed" | "failed" | "rejected" | "conflict" | "unauthorized" | "invalid";
  status: number;
}

export function fakeResendUrl(path = ""): string {
  const port = process.env.FAKE_RESEND_PORT;
  if (!port) throw new Error("FAKE_RESEND_PORT is not set: run these tests through `npm test`");
  return `http://127.0.0.1:${port}${path}`;
}

/** `base` points at another e-mail fake than the test stack's (the fault tests run their own). */
export async function messagesTo(email: string, base = fakeResendUrl()): Promise<FakeMessage[]> {
  const res = await fetch(`${base}/admin/messages?to=${encodeURIComponent(email)}`);
  return ((await res.json()) as { data: FakeMessage[] }).data;
}

export async function requestsTo(email: string, base = fakeResendUrl()): Promise<FakeRequest[]> {
  const res = await fetch(`${base}/admin/requests?to=${encodeURIComponent(email)}`);
  return ((await res.json()) as { data: FakeRequest[] }).data;
}

/** Waits until `count` messages (optionally matching `subject`) have arrived for the address. */
export async function waitForEmail(email: string, opts: { subject?: RegExp; count?: number; timeoutMs?: number } = {}): Promise<FakeMessage> {
  const deadline = Date.now() + (opts.timeoutMs ?? 20_000);
  for (;;) {
    const found = (await messagesTo(email)).filter((m) => !opts.subject || opts.subject.test(m.subject));
    if (found.length >= (opts.count ?? 1)) return found[0]!;
    if (Date.now() > deadline) throw new Error(`no e-mail${opts.subject ? ` matching ${opts.subject}` : ""} for ${email} within ${opts.timeoutMs ?? 20_000} ms`);
    await new Promise((r) => setTimeout(r, 250));
  }
}

/** The first link in the message whose URL contains `part`. */
export function linkIn(message: FakeMessage, part: string): string {
  const link = message.links.find((l) => l.includes(part));
  if (!link) throw new Error(`no link containing ${part} in "${message.subject}": ${message.links.join(", ")}`);
  return link;
}

export type FakeMode = { mode: "ok" | "fail" | "reject" | "slow"; match?: string; status?: number; delayMs?: number; remaining?: number };

export async function setFakeMode(rule: FakeMode): Promise<void> {
  const res = await fetch(fakeResendUrl("/admin/mode"), { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(rule) });
  if (!res.ok) throw new Error(`setting the fake's mode failed: ${res.status}`);
}
