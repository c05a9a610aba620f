// Role × route for the member, invitation and outbox routes: 401 signed out, 403 for a role
// without the permission, 404 for someone outside the workshop or an unknown slug — with the
// exact error bodies. Real app over HTTP, real MariaDB.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Role } from "@/lib/auth/permissions";
import { closeTestDb, testDb } from "../setup/test-db";
import { createWorkshopWithMembers, uniqueEmail, type TestWorkshop } from "./fixtures";
import { callRoute, itRefusesStrangers } from "./route-matrix";
import { anonymous, signIn, type HttpSession } from "./session";

let a: TestWorkshop;
let b: TestWorkshop;
const as: Partial<Record<Role | "outsider" | "anonymous", HttpSession>> = {};
let invitationId: number;
let failedMessageId: number;

beforeAll(async () => {
  [a, b] = await Promise.all([createWorkshopWithMembers({ extra: { client: 1 } }), createWorkshopWithMembers()]);
  for (const role of ["owner", "builder", "bookkeeper", "client"] as Role[]) as[role] = await signIn(a[role]);
  as.outsider = await signIn(b.owner);
  as.anonymous = anonymous();
  const inv = await as.owner!.json<{ invitation: { id: number } }>(`/api/workshops/${a.slug}/invitations`, { json: { email: uniqueEmail("matrix"), role: "client" } });
  invitationId = inv.body.invitation.id;
  // An e-mail of workshop A that failed for good, for the retry route.
  const [id] = await testDb()("email_outbox").insert({
    workshop_id: a.id,
    template: "invitation",
    to_address: uniqueEmail("matrix-failed"),
    subject: "A failed invitation",
    props: JSON.stringify({ workshopName: a.name, inviterName: a.owner.name, role: "client", acceptUrl: "http://localhost:3000/invitations/x", expiresAt: new Date().toISOString() }),
    idempotency_key: `matrix-${invitationId}-${Date.now()}`,
    status: "failed",
    attempts: 1,
    last_error: "validation_error",
  });
  failedMessageId = Number(id);
});
afterAll(closeTestDb);

type Who = keyof typeof as;
type Route = { name: string; method: string; path: () => string; body?: () => unknown; allowed: Role[]; ok: number };

// The role tests run in the order owner, builder, bookkeeper, client, so a permitted change
// (the owner's) happens once and the refusals after it show the permission is checked first.
const ROUTES: Route[] = [
  { name: "list members", method: "GET", path: () => `/api/workshops/${a.slug}/members`, allowed: ["owner", "bookkeeper", "builder"], ok: 200 },
  { name: "change a role", method: "PATCH", path: () => `/api/workshops/${a.slug}/members/${a.builder.membershipId}`, body: () => ({ role: "builder" }), allowed: ["owner"], ok: 200 },
  { name: "remove a member", method: "DELETE", path: () => `/api/workshops/${a.slug}/members/${a.members.filter((m) => m.role === "client")[1]!.membershipId}`, allowed: ["owner"], ok: 204 },
  { name: "list invitations", method: "GET", path: () => `/api/workshops/${a.slug}/invitations`, allowed: ["owner"], ok: 200 },
  { name: "invite", method: "POST", path: () => `/api/workshops/${a.slug}/invitations`, body: () => ({ email: uniqueEmail("matrix"), role: "builder" }), allowed: ["owner"], ok: 201 },
  { name: "revoke an invitation", method: "DELETE", path: () => `/api/workshops/${a.slug}/invitations/${invitationId}`, allowed: ["owner"], ok: 200 },
  { name: "list undelivered e-mail", method: "GET", path: () => `/api/workshops/${a.slug}/outbox?status=failed`, allowed: ["owner"], ok: 200 },
  { name: "retry an e-mail", method: "POST", path: () => `/api/workshops/${a.slug}/outbox/${failedMessageId}/retry`, allowed: ["owner"], ok: 200 },
];

const call = (who: Who, r: Route) => callRoute(as[who]!, r);
const strangers = { anonymous: () => as.anonymous!, outsider: () => as.outsider!, member: () => as.owner!, slug: () => a.slug };

describe("member and invitation routes, role by role", () => {
  for (const r of ROUTES) {
    describe(`${r.method} ${r.name}`, () => {
      itRefusesStrangers(r, strangers);

      for (const role of ["owner", "builder", "bookkeeper", "client"] as Role[]) {
        const permitted = r.allowed.includes(role);
        it(`${permitted ? "lets" : "refuses"} the ${role}`, async () => {
          const res = await call(role, r);
          if (permitted) {
            expect(res.status).toBe(r.ok);
          } else {
            expect(res.status).toBe(403);
            expect(await res.json()).toEqual({ error: { code: "forbidden", message: "You do not have permission to do this." } });
          }
        });
      }
    });
  }
});

// Everyone but the second client, whom the owner removed above.
const remaining = () => a.members.filter((m) => m !== a.members.filter((x) => x.role === "client")[1]);

describe("what each role sees of the member list", () => {
  it("gives the owner and the bookkeeper ids, addresses and roles", async () => {
    for (const who of ["owner", "bookkeeper"] as const) {
      const { status, body } = await as[who]!.json<{ members: Array<Record<string, unknown>> }>(`/api/workshops/${a.slug}/members`);
      expect(status).toBe(200);
      expect(body.members.map((m) => m.email).sort()).toEqual(remaining().map((m) => m.email).sort());
      expect(Object.keys(body.members[0]!).sort()).toEqual(["email", "id", "joinedAt", "name", "role", "userId"]);
    }
  });

  it("gives a builder names only", async () => {
    const { status, body } = await as.builder!.json<{ members: Array<Record<string, unknown>> }>(`/api/workshops/${a.slug}/members`);
    expect(status).toBe(200);
    expect(body.members.map((m) => m.name).sort()).toEqual(remaining().map((m) => m.name).sort());
    for (const m of body.members) expect(Object.keys(m)).toEqual(["name"]);
  });

  it("answers private, uncacheable responses", async () => {
    const res = await as.owner!.fetch(`/api/workshops/${a.slug}/members`);
    expect(res.headers.get("cache-control")).toBe("private, no-store");
  });

  it("treats a malformed id in the path as not found", async () => {
    const res = await as.owner!.fetch(`/api/workshops/${a.slug}/members/abc`, { method: "PATCH", json: { role: "client" } });
    expect(res.status).toBe(404);
  });

  it("answers bad input with 422 and field paths, and changes nothing", async () => {
    const res = await as.owner!.fetch(`/api/workshops/${a.slug}/members/${a.client.membershipId}`, { method: "PATCH", json: { role: "admin" } });
    expect(res.status).toBe(422);
    expect(((await res.json()) as { error: { issues: Array<{ path: string }> } }).error.issues.map((i) => i.path)).toEqual(["role"]);
    const row = await testDb()("memberships").where({ id: a.client.membershipId }).first("role");
    expect(row.role).toBe("client");
  });
});

describe("GET /api/me", () => {
  it("answers the user and every workshop they belong to", async () => {
    const { status, body } = await as.owner!.json("/api/me");
    expect(status).toBe(200);
    expect(body).toEqual({ user: { id: a.owner.userId, email: a.owner.email, name: a.owner.name }, memberships: [{ workshop: { slug: a.slug, name: a.name }, role: "owner" }] });
  });

  it("answers 401 when signed out", async () => {
    expect((await as.anonymous!.fetch("/api/me")).status).toBe(401);
  });
});
