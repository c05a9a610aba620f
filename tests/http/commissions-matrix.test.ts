// Role × route for every commission route: 401 signed out, 404 for a member of another workshop
// (the same answer as for a workshop that does not exist), and each role's answer — the generic
// 403 where the role lacks the route's permission, the stage machine's own 403/409 where the
// permission is held but the move is not theirs. Real app over HTTP, real MariaDB.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Role } from "@/lib/auth/permissions";
import { closeTestDb, testDb } from "../setup/test-db";
import { approveSpec, base, draftSpec, move, openCommission, sixStringSpec } from "./commission-helpers";
import { createWorkshopWithMembers, type TestWorkshop } from "./fixtures";
import { callRoute, itRefusesStrangers } from "./route-matrix";
import { anonymous, signIn, type HttpSession } from "./session";

let a: TestWorkshop;
let b: TestWorkshop;
const as: Partial<Record<Role | "outsider" | "anonymous", HttpSession>> = {};
const ids = { x: 0, xv1: 0, hold: 0, send: 0, sendV1: 0, approve: 0, approveV1: 0, signoff: 0, pendingMove: 0 };

beforeAll(async () => {
  [a, b] = await Promise.all([createWorkshopWithMembers(), createWorkshopWithMembers()]);
  for (const role of ["owner", "builder", "bookkeeper", "client"] as Role[]) as[role] = await signIn(a[role]);
  as.outsider = await signIn(b.owner);
  as.anonymous = anonymous();
  const owner = as.owner!;
  const builder = as.builder!;

  ids.x = (await openCommission(owner, a)).id;
  ids.xv1 = (await draftSpec(builder, a, ids.x)).id;
  await builder.fetch(`${base(a)}/${ids.x}/spec-versions/${ids.xv1}/submit`, { method: "POST", json: {} });
  ids.hold = (await openCommission(owner, a)).id;
  ids.send = (await openCommission(owner, a)).id;
  ids.sendV1 = (await draftSpec(builder, a, ids.send)).id;
  ids.approve = (await openCommission(owner, a)).id;
  ids.approveV1 = (await draftSpec(builder, a, ids.approve)).id;
  await builder.fetch(`${base(a)}/${ids.approve}/spec-versions/${ids.approveV1}/submit`, { method: "POST", json: {} });

  // A builder's move waiting for the owner's sign-off.
  ids.signoff = (await openCommission(owner, a)).id;
  await approveSpec(builder, as.client!, a, ids.signoff);
  await as.bookkeeper!.fetch(`${base(a)}/${ids.signoff}/payments`, { method: "POST", json: { kind: "deposit", amountMinor: 90_000, reference: "Matrix deposit" } });
  await testDb()("workshops").where({ id: a.id }).update({ require_stage_signoff: true });
  const moved = await move(builder, a, ids.signoff, "advance");
  await testDb()("workshops").where({ id: a.id }).update({ require_stage_signoff: false });
  if (moved.status !== 200) throw new Error(`sign-off setup failed: ${moved.status}`);
  ids.pendingMove = Number((await testDb()("stage_history").where({ commission_id: ids.signoff, needs_signoff: true }).first("id")).id);
});
afterAll(closeTestDb);

type Who = keyof typeof as;
type Route = {
  name: string;
  method: string;
  path: () => string;
  body?: () => unknown;
  expect: Record<Role, number>;
  /** The route's permission is held by everyone; refusals come from the stage machine (own message). */
  refusedByMachine?: boolean;
};

const c = (id: () => number, rest = "") => () => `${base(a)}/${id()}${rest}`;

// Roles run in the order owner, builder, bookkeeper, client; where a call changes something the
// expected answers say what the later roles then meet.
const ROUTES: Route[] = [
  { name: "list", method: "GET", path: () => base(a), expect: { owner: 200, builder: 200, bookkeeper: 200, client: 200 } },
  {
    name: "open",
    method: "POST",
    path: () => base(a),
    body: () => ({ title: "Matrix commission", clientId: a.client.userId, priceMinor: 100_000 }),
    expect: { owner: 201, builder: 201, bookkeeper: 403, client: 201 },
  },
  { name: "read one", method: "GET", path: c(() => ids.x), expect: { owner: 200, builder: 200, bookkeeper: 200, client: 200 } },
  { name: "change", method: "PATCH", path: c(() => ids.x), body: () => ({ title: "Renamed in the matrix" }), expect: { owner: 200, builder: 200, bookkeeper: 403, client: 403 } },
  { name: "stage history", method: "GET", path: c(() => ids.x, "/transitions"), expect: { owner: 200, builder: 200, bookkeeper: 200, client: 200 } },
  // The owner holds it; the builder then finds it on hold already (409); the others may not move it.
  { name: "move", method: "POST", path: c(() => ids.hold, "/transitions"), body: () => ({ action: "hold" }), expect: { owner: 200, builder: 409, bookkeeper: 403, client: 403 }, refusedByMachine: true },
  { name: "sign off", method: "POST", path: () => `${base(a)}/${ids.signoff}/transitions/${ids.pendingMove}/signoff`, expect: { owner: 200, builder: 403, bookkeeper: 403, client: 403 } },
  { name: "spec versions", method: "GET", path: c(() => ids.x, "/spec-versions"), expect: { owner: 200, builder: 200, bookkeeper: 200, client: 200 } },
  { name: "draft a version", method: "POST", path: c(() => ids.x, "/spec-versions"), body: () => ({ spec: sixStringSpec(), options: {} }), expect: { owner: 201, builder: 201, bookkeeper: 403, client: 403 } },
  { name: "read a version", method: "GET", path: () => `${base(a)}/${ids.x}/spec-versions/${ids.xv1}`, expect: { owner: 200, builder: 200, bookkeeper: 200, client: 200 } },
  { name: "send a version", method: "POST", path: () => `${base(a)}/${ids.send}/spec-versions/${ids.sendV1}/submit`, body: () => ({}), expect: { owner: 200, builder: 200, bookkeeper: 403, client: 403 } },
  { name: "approve a version", method: "POST", path: () => `${base(a)}/${ids.approve}/spec-versions/${ids.approveV1}/approve`, expect: { owner: 403, builder: 403, bookkeeper: 403, client: 200 } },
  { name: "comments", method: "GET", path: c(() => ids.x, "/comments"), expect: { owner: 200, builder: 200, bookkeeper: 200, client: 200 } },
  { name: "comment", method: "POST", path: c(() => ids.x, "/comments"), body: () => ({ body: "A word from the matrix." }), expect: { owner: 201, builder: 201, bookkeeper: 201, client: 201 } },
  {
    name: "record a payment",
    method: "POST",
    path: c(() => ids.x, "/payments"),
    body: () => ({ kind: "deposit", amountMinor: 1_000, reference: "Matrix transfer" }),
    expect: { owner: 201, builder: 403, bookkeeper: 201, client: 403 },
  },
  { name: "people to choose from", method: "GET", path: () => `/api/workshops/${a.slug}/commission-people`, expect: { owner: 200, builder: 200, bookkeeper: 403, client: 403 } },
];

const call = (who: Who, r: Route) => callRoute(as[who]!, r);
const strangers = { anonymous: () => as.anonymous!, outsider: () => as.outsider!, member: () => as.owner!, slug: () => a.slug };

describe("commission routes, role by role", () => {
  for (const r of ROUTES) {
    describe(`${r.method} ${r.name}`, () => {
      itRefusesStrangers(r, strangers);

      for (const role of ["owner", "builder", "bookkeeper", "client"] as Role[]) {
        const want = r.expect[role];
        it(`answers the ${role} ${want}`, async () => {
          const res = await call(role, r);
          const body = (await res.json()) as { error?: { code: string; message: string } };
          expect(res.status, JSON.stringify(body)).toBe(want);
          expect(res.headers.get("cache-control")).toBe("private, no-store");
          if (want === 403) {
            expect(body.error?.code).toBe("forbidden");
            if (r.refusedByMachine) expect(body.error?.message).not.toBe("You do not have permission to do this.");
            else expect(body).toEqual({ error: { code: "forbidden", message: "You do not have permission to do this." } });
          }
          if (want === 409) expect(body.error?.code).toBe("conflict");
        });
      }
    });
  }
});

describe("the benchmark's floor route", () => {
  it("answers 404 in normal operation, with or without a guessed token", async () => {
    const variants: Array<Record<string, string>> = [{}, { "x-bench-token": "0".repeat(48) }, { "x-bench-token": "" }];
    for (const headers of variants) {
      const res = await as.owner!.fetch(`/api/bench/commission-list?workshopId=${a.id}`, { headers });
      expect(res.status).toBe(404);
      expect(((await res.json()) as { error: { code: string } }).error.code).toBe("not_found");
    }
  });
});
