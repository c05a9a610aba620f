// No route or page of this issue ever answers a password hash (argon2id hashes start "$argon2id$").
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestDb, testDb } from "../setup/test-db";
import { createWorkshopWithMembers, uniqueEmail, type TestWorkshop } from "./fixtures";
import { signIn, type HttpSession } from "./session";

let ws: TestWorkshop;
let owner: HttpSession;

beforeAll(async () => {
  ws = await createWorkshopWithMembers();
  owner = await signIn(ws.owner);
});
afterAll(closeTestDb);

function expectNoHash(where: string, text: string) {
  expect(text, where).not.toMatch(/\$argon2/);
  expect(text, where).not.toMatch(/password_?hash/i);
}

describe("password hashes never leave the server", () => {
  it("are stored as argon2id (so the check below means something)", async () => {
    const row = await testDb()("users").where({ id: ws.owner.userId }).first("password_hash");
    expect(row.password_hash).toMatch(/^\$argon2id\$/);
  });

  it("appear in no API answer", async () => {
    const inv = await owner.json<{ invitation: { id: number } }>(`/api/workshops/${ws.slug}/invitations`, { json: { email: uniqueEmail("hash"), role: "client" } });
    const calls: Array<[string, string, unknown?]> = [
      ["GET", "/api/me"],
      ["GET", "/api/auth/session"],
      ["GET", `/api/workshops/${ws.slug}/members`],
      ["PATCH", `/api/workshops/${ws.slug}/members/${ws.client.membershipId}`, { role: "client" }],
      ["GET", `/api/workshops/${ws.slug}/invitations`],
      ["DELETE", `/api/workshops/${ws.slug}/invitations/${inv.body.invitation.id}`],
      ["GET", `/api/workshops/${ws.slug}/outbox?status=sent`],
      ["POST", "/api/workshops", { name: "Hash Check", slug: `hash-${ws.id}`, unitPreference: "mm", currency: "EUR" }],
    ];
    for (const [method, path, json] of calls) {
      const res = await owner.fetch(path, { method, ...(json ? { json } : {}) });
      expect(res.status, `${method} ${path}`).toBeLessThan(300);
      expectNoHash(`${method} ${path}`, await res.text());
    }
    const builder = await signIn(ws.builder);
    expectNoHash("builder's member list", await (await builder.fetch(`/api/workshops/${ws.slug}/members`)).text());
  });

  it("appear in no page", async () => {
    for (const path of ["/account", `/${ws.slug}`, `/${ws.slug}/members`, "/workshops?all=1"]) {
      const res = await owner.fetch(path);
      expect(res.status, path).toBe(200);
      expectNoHash(path, await res.text());
    }
  });
});
