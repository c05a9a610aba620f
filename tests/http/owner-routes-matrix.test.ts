// Role × route for the overview, cohort and settings routes: 401 signed out, 403 for a role
// without the permission (exact body), 404 for someone outside the workshop or an unknown slug.
// Real app over HTTP, real MariaDB.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Role } from "@/lib/auth/permissions";
import { closeTestDb } from "../setup/test-db";
import { createWorkshopWithMembers, type TestWorkshop } from "./fixtures";
import { describeRoleMatrix, type MatrixRoute, type MatrixWho } from "./role-matrix";
import { anonymous, signIn, type HttpSession } from "./session";

let a: TestWorkshop;
let b: TestWorkshop;
let cohortId: number;
let spareCohortId: number;
const as: Partial<Record<MatrixWho, HttpSession>> = {};

beforeAll(async () => {
  [a, b] = await Promise.all([createWorkshopWithMembers(), createWorkshopWithMembers()]);
  for (const role of ["owner", "builder", "bookkeeper", "client"] as Role[]) as[role] = await signIn(a[role]);
  as.outsider = await signIn(b.owner);
  as.anonymous = anonymous();
  const make = async (name: string) =>
    (await as.owner!.json<{ cohort: { id: number } }>(`/api/workshops/${a.slug}/cohorts`, { json: { name, startsOn: "2027-01-01", endsOn: "2027-06-30", builderIds: [a.builder.userId] } })).body.cohort.id;
  cohortId = await make("Matrix course");
  spareCohortId = await make("Matrix course to remove");
});
afterAll(closeTestDb);

const w = () => `/api/workshops/${a.slug}`;

const ROUTES: MatrixRoute[] = [
  { name: "overview", method: "GET", path: () => `${w()}/overview`, allowed: ["owner", "bookkeeper"], ok: 200 },
  { name: "list cohorts", method: "GET", path: () => `${w()}/cohorts`, allowed: ["owner", "builder", "bookkeeper"], ok: 200 },
  { name: "create a cohort", method: "POST", path: () => `${w()}/cohorts`, body: () => ({ name: `Course ${Date.now()}`, startsOn: "2027-01-01", endsOn: "2027-02-01" }), allowed: ["owner"], ok: 201 },
  { name: "read a cohort", method: "GET", path: () => `${w()}/cohorts/${cohortId}`, allowed: ["owner", "builder", "bookkeeper"], ok: 200 },
  { name: "change a cohort", method: "PATCH", path: () => `${w()}/cohorts/${cohortId}`, body: () => ({ name: "Matrix course" }), allowed: ["owner"], ok: 200 },
  { name: "remove a cohort", method: "DELETE", path: () => `${w()}/cohorts/${spareCohortId}`, allowed: ["owner"], ok: 200 },
  { name: "read settings", method: "GET", path: () => `${w()}/settings`, allowed: ["owner"], ok: 200 },
  { name: "change settings", method: "PATCH", path: () => `${w()}/settings`, body: () => ({ depositPercent: 30 }), allowed: ["owner"], ok: 200 },
];

describeRoleMatrix("overview, cohort and settings routes, role by role", ROUTES, { slug: () => a.slug, as: (who) => as[who]! });

describe("cohort ids in the path", () => {
  it("treats a malformed cohort id in the path as not found", async () => {
    expect((await as.owner!.fetch(`${w()}/cohorts/abc`)).status).toBe(404);
    expect((await as.owner!.fetch(`${w()}/cohorts/0`, { method: "DELETE" })).status).toBe(404);
  });
});
