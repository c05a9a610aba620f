// Role × route for every books route: 401 signed out, 404 (as for an unknown workshop) for a member
// of another workshop, 403 with the exact body for builders and clients, and each route's own answer
// for the owner and the bookkeeper (the owner alone reviews changes to a locked month). Real app over
// HTTP, real MariaDB; the comparison reads the shared payments fake and changes nothing there.
// The books pages answer the same way as pages do: owner and bookkeeper see them, builders and
// clients get the 403 page, another workshop's owner the 404 page, and the workshop's navigation
// shows Books to those who may open it. Product rules (issue 7).
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Role } from "@/lib/auth/permissions";
import { closeTestDb } from "../setup/test-db";
import { signInRoles } from "./commission-helpers";
import { approvedCommission, books, comparedMonth, flaggedChange, openException, recordPayment } from "./books-helpers";
import { createWorkshopWithMembers, type TestWorkshop } from "./fixtures";
import { describeRoleMatrix, type MatrixRoute, type MatrixWho } from "./role-matrix";
import { anonymous, signIn, type HttpSession } from "./session";

let a: TestWorkshop;
let b: TestWorkshop;
const as: Partial<Record<MatrixWho, HttpSession>> = {};
// Routes that change state get a fresh target on every call (each permitted role succeeds once).
const exceptions: number[] = [];
const changes: number[] = [];
const lockable: string[] = [];

beforeAll(async () => {
  [a, b] = await Promise.all([createWorkshopWithMembers(), createWorkshopWithMembers()]);
  const s = await signInRoles(a);
  for (const role of ["owner", "builder", "bookkeeper", "client"] as Role[]) as[role] = s[role];
  as.outsider = await signIn(b.owner);
  as.anonymous = anonymous();
  const c = await approvedCommission(s, a);
  await recordPayment(s.bookkeeper, a, c.id, { kind: "deposit", amountMinor: 50_000, paidOn: "2026-05-14" });
  const may = await comparedMonth(a, "2026-05");
  for (let i = 0; i < 8; i++) exceptions.push(await openException(a, may, i));
  const locked = await comparedMonth(a, "2026-04");
  for (let i = 0; i < 8; i++) changes.push(await flaggedChange(a, locked, i));
  for (let i = 1; i <= 8; i++) {
    const month = `2025-${String(i).padStart(2, "0")}`;
    await comparedMonth(a, month);
    lockable.push(month);
  }
});
afterAll(closeTestDb);

const w = () => books(a);
const next = (pool: Array<number | string>) => String(pool.shift() ?? "0");

const ROUTES: MatrixRoute[] = [
  { name: "ledger", method: "GET", path: () => `${w()}/ledger?period=2026-05`, allowed: ["owner", "bookkeeper"], ok: 200 },
  { name: "ledger CSV", method: "GET", path: () => `${w()}/ledger/export?status=all`, allowed: ["owner", "bookkeeper"], ok: 200 },
  { name: "ledger filter options", method: "GET", path: () => `${w()}/ledger/options`, allowed: ["owner", "bookkeeper"], ok: 200 },
  { name: "held and earned", method: "GET", path: () => `${w()}/holdings`, allowed: ["owner", "bookkeeper"], ok: 200 },
  { name: "monthly summary", method: "GET", path: () => `${w()}/summary`, allowed: ["owner", "bookkeeper"], ok: 200 },
  { name: "reconciliation months", method: "GET", path: () => `${w()}/reconciliation`, allowed: ["owner", "bookkeeper"], ok: 200 },
  { name: "a month's reconciliation", method: "GET", path: () => `${w()}/reconciliation/2026-05`, allowed: ["owner", "bookkeeper"], ok: 200 },
  { name: "a month's reconciliation CSV", method: "GET", path: () => `${w()}/reconciliation/2026-05/export`, allowed: ["owner", "bookkeeper"], ok: 200 },
  { name: "compare a month", method: "POST", path: () => `${w()}/reconciliation/2024-02/run`, body: () => ({}), allowed: ["owner", "bookkeeper"], ok: 200 },
  { name: "resolve an exception", method: "POST", path: () => `${w()}/reconciliation/2026-05/exceptions/${next(exceptions)}/resolve`, body: () => ({ note: "Matched by hand" }), allowed: ["owner", "bookkeeper"], ok: 200 },
  { name: "lock a month", method: "POST", path: () => `${w()}/reconciliation/${next(lockable)}/lock`, body: () => ({}), allowed: ["owner", "bookkeeper"], ok: 200 },
  { name: "review a change to a locked month", method: "POST", path: () => `${w()}/reconciliation/2026-04/changes/${next(changes)}/review`, body: () => ({ note: "Seen" }), allowed: ["owner"], ok: 200 },
];

describeRoleMatrix("books routes, role by role", ROUTES, { slug: () => a.slug, as: (who) => as[who]! });

describe("books pages, role by role", () => {
  const pages = ["", "/reconciliation", "/reconciliation/2026-05", "/held", "/summary"];
  const page = (p: string) => `/${a.slug}/books${p}`;
  const status = async (who: MatrixWho, path: string) => (await as[who]!.fetch(path)).status;

  it("open for the owner and the bookkeeper, with their headings", async () => {
    const headings: Record<string, string> = {
      "": "Payments ledger",
      "/reconciliation": "Reconciliation with the processor",
      "/reconciliation/2026-05": "Reconciliation: May 2026",
      "/held": "Held and earned",
      "/summary": "Monthly summary",
    };
    for (const p of pages) {
      for (const who of ["owner", "bookkeeper"] as const) {
        const res = await as[who]!.fetch(page(p));
        expect(res.status, `${who} ${p}`).toBe(200);
        expect(await res.text(), p).toContain(headings[p]!);
      }
    }
  });

  it("answer 403 to builders and clients and 404 to another workshop's owner", async () => {
    for (const p of pages) {
      for (const who of ["builder", "client"] as const) expect(await status(who, page(p)), `${who} ${p}`).toBe(403);
      const theirs = await as.outsider!.fetch(page(p));
      expect(theirs.status, p).toBe(404);
      expect(await theirs.text()).not.toContain(a.name);
    }
    expect(await status("owner", page("/reconciliation/2026-13"))).toBe(404);
    expect(await status("owner", page("/reconciliation/may"))).toBe(404);
  });

  it("show Books in the workshop's navigation to the owner and the bookkeeper only", async () => {
    const nav = async (who: MatrixWho) => (await (await as[who]!.fetch(`/${a.slug}`)).text()).includes(`href="/${a.slug}/books"`);
    expect([await nav("owner"), await nav("bookkeeper"), await nav("builder"), await nav("client")]).toEqual([true, true, false, false]);
  });
});
