// Failed password sign-ins are limited per account (5 in 15 minutes) and per IP address (20 in 15
// minutes), counted in MariaDB. Each test connects from its own 127.0.0.x source address, so the
// app sees distinct client addresses without trusting any header.
import { afterAll, describe, expect, it } from "vitest";
import { closeTestDb, testDb } from "../setup/test-db";
import { createTestUser, uniqueEmail } from "./fixtures";
import { attemptSignIn } from "./session";

afterAll(closeTestDb);

// A fresh loopback address per test run and test, e.g. 127.0.23.187.
const address = () => `127.0.${1 + Math.floor(Math.random() * 250)}.${2 + Math.floor(Math.random() * 250)}`;

function retrySeconds(code: string | null): number {
  const m = code?.match(/^rate_limited:(\d+)$/);
  if (!m) throw new Error(`expected a rate_limited code, got ${code}`);
  return Number(m[1]);
}

describe("sign-in rate limit", () => {
  it("refuses an account after 5 failures, even with the right password, and says when to retry", async () => {
    const person = await createTestUser({ email: uniqueEmail("limited") });
    const ip = address();
    for (let i = 0; i < 5; i++) {
      const a = await attemptSignIn(person.email, "wrong-password", { localAddress: ip });
      expect(a.ok).toBe(false);
      expect(a.code).toBe("invalid_credentials");
    }
    const blocked = await attemptSignIn(person.email, person.password, { localAddress: address() });
    expect(blocked.ok).toBe(false);
    const wait = retrySeconds(blocked.code);
    expect(wait).toBeGreaterThan(14 * 60);
    expect(wait).toBeLessThanOrEqual(15 * 60);
    // The failures are rows in MariaDB (so the limit holds across restarts).
    const rows = await testDb()("sign_in_failures").where({ account_key: person.email }).count({ n: "*" }).first();
    expect(Number(rows!.n)).toBe(5);
  });

  it("counts the account however its address is typed", async () => {
    const person = await createTestUser({ email: uniqueEmail("casing") });
    const ip = address();
    for (let i = 0; i < 5; i++) await attemptSignIn(i % 2 ? person.email.toUpperCase() : ` ${person.email}`, "wrong-password", { localAddress: ip });
    expect((await attemptSignIn(person.email, person.password, { localAddress: ip })).code).toMatch(/^rate_limited:/);
  });

  it("lets the account in again once the failures are older than 15 minutes", async () => {
    const person = await createTestUser({ email: uniqueEmail("aged") });
    const ip = address();
    for (let i = 0; i < 5; i++) await attemptSignIn(person.email, "wrong-password", { localAddress: ip });
    expect((await attemptSignIn(person.email, person.password, { localAddress: ip })).ok).toBe(false);
    await testDb()("sign_in_failures").where({ account_key: person.email }).update({ created_at: new Date(Date.now() - 16 * 60_000) });
    expect((await attemptSignIn(person.email, person.password, { localAddress: ip })).ok).toBe(true);
  });

  it("forgets an account's failures after a successful sign-in", async () => {
    const person = await createTestUser({ email: uniqueEmail("forgiven") });
    const ip = address();
    for (let i = 0; i < 4; i++) await attemptSignIn(person.email, "wrong-password", { localAddress: ip });
    expect((await attemptSignIn(person.email, person.password, { localAddress: ip })).ok).toBe(true);
    for (let i = 0; i < 4; i++) await attemptSignIn(person.email, "wrong-password", { localAddress: ip });
    expect((await attemptSignIn(person.email, person.password, { localAddress: ip })).ok).toBe(true);
  });

  it("refuses an address after 20 failures across accounts, while other addresses still sign in", async () => {
    const ip = address();
    for (let i = 0; i < 20; i++) {
      const a = await attemptSignIn(uniqueEmail("nobody"), "wrong-password", { localAddress: ip });
      expect(a.code).toBe("invalid_credentials");
    }
    const person = await createTestUser({ email: uniqueEmail("innocent") });
    const fromThere = await attemptSignIn(person.email, person.password, { localAddress: ip });
    expect(fromThere.ok).toBe(false);
    expect(retrySeconds(fromThere.code)).toBeGreaterThan(0);
    expect((await attemptSignIn(person.email, person.password, { localAddress: address() })).ok).toBe(true);
  });

  it("treats an account without a password (links only) as a failed password sign-in", async () => {
    const person = await createTestUser({ email: uniqueEmail("linkonly"), withPassword: false });
    const a = await attemptSignIn(person.email, "anything-at-all", { localAddress: address() });
    expect(a.ok).toBe(false);
    expect(a.code).toBe("invalid_credentials");
  });
});
