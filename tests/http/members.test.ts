// What the member routes answer beyond who may call them (that is the authorization matrix,
// tests/security/): which fields each role sees of the member list, the caller's own /api/me,
// malformed ids and bad input. Real app over HTTP, real MariaDB.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestDb, testDb } from "../setup/test-db";
import { createWorkshopWithMembers, type TestWorkshop } from "./fixtures";
import { signIn, type HttpSession } from "./session";

let a: TestWorkshop;
let owner: HttpSession, builder: HttpSession, bookkeeper: HttpSession;

beforeAll(async () => {
  a = await createWorkshopWithMembers({ extra: { client: 1 } });
  [owner, builder, bookkeeper] = await Promise.all([signIn(a.owner), signIn(a.builder), signIn(a.bookkeeper)]);
});
afterAll(closeTestDb);

const members = () => `/api/workshops/${a.slug}/members`;

describe("what each role sees of the member list", () => {
  it("gives the owner and the bookkeeper ids, addresses and roles", async () => {
    for (const s of [owner, bookkeeper]) {
      const { status, body } = await s.json<{ members: Array<Record<string, unknown>> }>(members());
      expect(status).toBe(200);
      expect(body.members.map((m) => m.email).sort()).toEqual(a.members.map((m) => m.email).sort());
      expect(Object.keys(body.members[0]!).sort()).toEqual(["email", "id", "joinedAt", "name", "role", "userId"]);
    }
  });

  it("gives a builder names only", async () => {
    const { status, body } = await builder.json<{ members: Array<Record<string, unknown>> }>(members());
    expect(status).toBe(200);
    expect(body.members.map((m) => m.name).sort()).toEqual(a.members.map((m) => m.name).sort());
    for (const m of body.members) expect(Object.keys(m)).toEqual(["name"]);
  });

  it("treats a malformed id in the path as not found", async () => {
    const res = await owner.fetch(`${members()}/abc`, { method: "PATCH", json: { role: "client" } });
    expect(res.status).toBe(404);
  });

  it("answers bad input with 422 and field paths, and changes nothing", async () => {
    const res = await owner.fetch(`${members()}/${a.client.membershipId}`, { method: "PATCH", json: { role: "admin" } });
    expect(res.status).toBe(422);
    expect(((await res.json()) as { error: { issues: Array<{ path: string }> } }).error.issues.map((i) => i.path)).toEqual(["role"]);
    const row = await testDb()("memberships").where({ id: a.client.membershipId }).first("role");
    expect(row.role).toBe("client");
  });
});

describe("GET /api/me", () => {
  it("answers the user and every workshop they belong to", async () => {
    const { status, body } = await owner.json("/api/me");
    expect(status).toBe(200);
    expect(body).toEqual({ user: { id: a.owner.userId, email: a.owner.email, name: a.owner.name }, memberships: [{ workshop: { slug: a.slug, name: a.name }, role: "owner" }] });
  });
});
