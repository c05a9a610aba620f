// Sign-in by e-mailed link, password reset and session rules, over HTTP against the app, with
// the e-mail read back from the fake provider.
import { afterAll, describe, expect, it } from "vitest";
import { requestPasswordReset, resetPassword } from "@/lib/accounts/accounts";
import { closeTestDb, testDb } from "../setup/test-db";
import { appUrl } from "./app-url";
import { createTestUser, uniqueEmail } from "./fixtures";
import { linkIn, waitForEmail } from "./inbox";
import { anonymous, attemptSignIn, signIn } from "./session";

afterAll(closeTestDb);

async function askForLink(email: string, headers: Record<string, string> = {}) {
  const s = anonymous();
  const { body } = await s.json<{ csrfToken: string }>("/api/auth/csrf");
  const res = await s.fetch("/api/auth/signin/email-link", { headers, form: { csrfToken: body.csrfToken, email, callbackUrl: appUrl("/account") } });
  return res;
}

describe("sign-in by e-mailed link", () => {
  it("e-mails a one-time link that signs the person in and lands where they were going", async () => {
    const person = await createTestUser({ email: uniqueEmail("link"), withPassword: false });
    const res = await askForLink(person.email);
    expect(res.status).toBe(302);
    const location = res.headers.get("location");
    expect(location).toBe(appUrl("/api/auth/verify-request?provider=email-link&type=email"));
    const mail = await waitForEmail(person.email, { subject: /sign-in link/ });
    const link = linkIn(mail, "/api/auth/callback/email-link");
    expect(link.startsWith(appUrl("/api/auth/callback/email-link?"))).toBe(true);

    const browser = anonymous();
    const landed = await browser.fetch(link);
    expect(landed.status).toBe(302);
    expect(landed.headers.get("location")).toBe(appUrl("/account"));
    const me = await browser.json<{ user: { email: string } }>("/api/me");
    expect(me.body.user.email).toBe(person.email);

    const again = await anonymous().fetch(link);
    expect(again.headers.get("location")).toMatch(/\/sign-in\?error=Verification/);
  });

  it("answers an unknown address exactly like a known one, and sends nothing", async () => {
    const email = uniqueEmail("nobody");
    const res = await askForLink(email);
    expect(res.status).toBe(302);
    expect(res.headers.get("location")).toBe(appUrl("/api/auth/verify-request?provider=email-link&type=email"));
    expect(await testDb()("email_outbox").where({ to_address: email }).first("id")).toBeUndefined();
    expect(await testDb()("users").where({ email }).first("id")).toBeUndefined();
  });

  it("builds the link on APP_URL even when the request names another host", async () => {
    const person = await createTestUser({ email: uniqueEmail("host") });
    await askForLink(person.email, { "x-forwarded-host": "evil.example.com" });
    const mail = await waitForEmail(person.email, { subject: /sign-in link/ });
    for (const l of mail.links) expect(l.startsWith(appUrl("/"))).toBe(true);
  });
});

describe("password reset", () => {
  it("e-mails a link; the new password works, the old one and every old session do not, and the link works once", async () => {
    const person = await createTestUser({ email: uniqueEmail("reset") });
    const before = await signIn(person);
    await requestPasswordReset(person.email);
    const mail = await waitForEmail(person.email, { subject: /Reset your/ });
    const link = linkIn(mail, "/reset/");
    const page = await anonymous().fetch(link);
    expect(page.status).toBe(200);
    expect(await page.text()).toContain("Save the new password");

    const token = link.split("/reset/")[1]!;
    await resetPassword(token, "a-brand-new-password");
    expect((await before.fetch("/api/me")).status).toBe(401);
    expect((await attemptSignIn(person.email, person.password)).ok).toBe(false);
    expect((await attemptSignIn(person.email, "a-brand-new-password")).ok).toBe(true);
    await expect(resetPassword(token, "yet-another-password")).rejects.toThrow(/expired or was already used/);
    expect(await (await anonymous().fetch(link)).text()).toContain("expired or was already used");
  });

  it("sends nothing for an address without an account", async () => {
    const email = uniqueEmail("noreset");
    await requestPasswordReset(email);
    expect(await testDb()("email_outbox").where({ to_address: email }).first("id")).toBeUndefined();
  });
});

describe("session cookie", () => {
  it("is httpOnly and SameSite=Lax, and not Secure over plain http", async () => {
    const person = await createTestUser();
    const s = anonymous();
    const { body } = await s.json<{ csrfToken: string }>("/api/auth/csrf");
    const res = await s.fetch("/api/auth/callback/credentials", { form: { csrfToken: body.csrfToken, email: person.email, password: person.password } });
    const cookie = res.headers.getSetCookie().find((c) => c.startsWith("authjs.session-token="));
    expect(cookie).toBeDefined();
    expect(cookie).toMatch(/; HttpOnly/i);
    expect(cookie).toMatch(/; SameSite=Lax/i);
    expect(cookie).not.toMatch(/; Secure/i);
  });

  it("ends when the account is gone", async () => {
    const person = await createTestUser();
    const s = await signIn(person);
    expect((await s.fetch("/api/me")).status).toBe(200);
    await testDb()("users").where({ id: person.userId }).delete();
    expect((await s.fetch("/api/me")).status).toBe(401);
  });

  it("is refused by a CSRF-less sign-in post", async () => {
    const person = await createTestUser();
    const res = await anonymous().fetch("/api/auth/callback/credentials", { form: { email: person.email, password: person.password } });
    expect(res.headers.getSetCookie().some((c) => c.startsWith("authjs.session-token="))).toBe(false);
  });
});
