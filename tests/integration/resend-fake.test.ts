// The e-mail fake answers the real `resend` SDK the way the hosted API does for what we use:
// API-key checks, one send, batch send, reading a message back, and idempotency keys.
import { randomUUID } from "node:crypto";
import { Resend } from "resend";
import { describe, expect, it } from "vitest";
import { fakeResendUrl, messagesTo } from "../http/inbox";

const sdk = (key = process.env.RESEND_API_KEY) => new Resend(key, { baseUrl: fakeResendUrl() });
const from = "Scalewright <no-reply@scalewright.example.com>";
const address = () => `sdk-${randomUUID().slice(0, 8)}@example.com`;

describe("fakes/resend with the resend SDK", () => {
  it("sends one e-mail, stores it, and reads it back", async () => {
    const to = address();
    const sent = await sdk().emails.send({ from, to, subject: "Hello", html: "<p>Hi <a href='http://localhost:3000/x'>there</a></p>", text: "Hi there" });
    expect(sent.error).toBeNull();
    const got = await sdk().emails.get(sent.data!.id);
    expect(got.data).toMatchObject({ object: "email", id: sent.data!.id, to: [to], subject: "Hello", from });
    expect(await messagesTo(to)).toHaveLength(1);
  });

  it("refuses a missing or wrong API key like the hosted API (401 / 403)", async () => {
    const wrong = await sdk("re_wrong_key").emails.send({ from, to: address(), subject: "x", text: "x" });
    expect(wrong.error).toMatchObject({ statusCode: 403, name: "invalid_api_key" });
    const res = await fetch(fakeResendUrl("/emails"), { method: "POST", headers: { "content-type": "application/json" }, body: "{}" });
    expect(res.status).toBe(401);
  });

  it("sends a message once per idempotency key, and refuses the key for another message", async () => {
    const to = address();
    const key = `test-${randomUUID()}`;
    const first = await sdk().emails.send({ from, to, subject: "Once", text: "once" }, { idempotencyKey: key });
    const again = await sdk().emails.send({ from, to, subject: "Once", text: "once" }, { idempotencyKey: key });
    expect(again.data!.id).toBe(first.data!.id);
    expect(await messagesTo(to)).toHaveLength(1);
    const other = await sdk().emails.send({ from, to, subject: "Different", text: "different" }, { idempotencyKey: key });
    expect(other.error).toMatchObject({ statusCode: 409, name: "invalid_idempotent_request" });
  });

  it("validates what it is sent (422)", async () => {
    const r = await sdk().emails.send({ from: "not an address", to: address(), subject: "x", text: "x" });
    expect(r.error).toMatchObject({ statusCode: 422, name: "validation_error" });
  });

  it("sends a batch", async () => {
    const [x, y] = [address(), address()];
    const r = await sdk().batch.send([
      { from, to: x, subject: "One", text: "1" },
      { from, to: y, subject: "Two", html: "<p>2</p>" },
    ]);
    expect(r.data?.data).toHaveLength(2);
    expect(await messagesTo(x)).toHaveLength(1);
    expect(await messagesTo(y)).toHaveLength(1);
  });

  it("serves an inbox page listing the e-mail and showing each one with its links", async () => {
    const to = address();
    const sent = await sdk().emails.send({ from, to, subject: "Inbox check", html: "<html><head></head><body><a href='http://localhost:3000/invitations/abc'>Accept</a></body></html>" });
    const list = await (await fetch(fakeResendUrl(`/inbox?to=${encodeURIComponent(to)}`))).text();
    expect(list).toContain("Inbox check");
    const one = await (await fetch(fakeResendUrl(`/inbox/${sent.data!.id}`))).text();
    expect(one).toContain('href="http://localhost:3000/invitations/abc"');
    expect(one).toContain("<iframe");
  });

  it("can be told to fail and to recover, for chosen recipients only", async () => {
    const tag = `mode-${randomUUID().slice(0, 8)}`;
    await fetch(fakeResendUrl("/admin/mode"), { method: "POST", body: JSON.stringify({ mode: "fail", match: tag, remaining: 1 }) });
    const failed = await sdk().emails.send({ from, to: `${tag}@example.com`, subject: "x", text: "x" });
    expect(failed.error).toMatchObject({ statusCode: 503 });
    const unaffected = await sdk().emails.send({ from, to: address(), subject: "x", text: "x" });
    expect(unaffected.error).toBeNull();
    // `remaining: 1` used up: the next one goes through.
    const recovered = await sdk().emails.send({ from, to: `${tag}@example.com`, subject: "x", text: "x" });
    expect(recovered.error).toBeNull();
  });
});
