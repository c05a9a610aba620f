// Who may reach the setup-sheet, printout and setup-range routes: role × route (401 signed out,
// 403 for a role without the permission, 404 for another workshop), commission visibility (an
// unassigned builder or another client gets 404, as for a commission that does not exist), and
// the printouts themselves read back: PDFs of the chosen paper, a client's build sheet without
// the workshop's drafts. Paper sizes: A4 210 × 297 mm [standard: ISO 216]; Letter 215.9 × 279.4 mm
// [standard: ANSI/ASME Y14.1].
import { beforeAll, describe, expect, it } from "vitest";
import type { Role } from "@/lib/auth/permissions";
import { readPdfLines } from "../support/pdf-lines";
import { testDb } from "../setup/test-db";
import { base, openCommission } from "./commission-helpers";
import { createWorkshopWithMembers, type TestWorkshop } from "./fixtures";
import { anonymous, signIn, type HttpSession } from "./session";
import { commissionInFinalSetup, goodSheet, putSheet, signSheet, type Sessions } from "./setup-helpers";

let a: TestWorkshop;
let b: TestWorkshop;
let commissionId: number;
let bCommissionId: number;
const as: Partial<Record<Role | "outsider" | "anonymous" | "otherBuilder" | "otherClient", HttpSession>> = {};

beforeAll(async () => {
  [a, b] = await Promise.all([createWorkshopWithMembers({ extra: { builder: 1, client: 1 } }), createWorkshopWithMembers()]);
  for (const role of ["owner", "builder", "bookkeeper", "client"] as Role[]) as[role] = await signIn(a[role]);
  as.otherBuilder = await signIn(a.members.filter((m) => m.role === "builder")[1]!);
  as.otherClient = await signIn(a.members.filter((m) => m.role === "client")[1]!);
  as.outsider = await signIn(b.owner);
  as.anonymous = anonymous();
  const c = await commissionInFinalSetup(as as Sessions, a);
  commissionId = c.id;
  await putSheet(as.builder!, a, commissionId, goodSheet());
  const bs: Sessions = { owner: as.outsider, builder: await signIn(b.builder), bookkeeper: await signIn(b.bookkeeper), client: await signIn(b.client) };
  bCommissionId = (await commissionInFinalSetup(bs, b)).id;
  await putSheet(bs.builder, b, bCommissionId, goodSheet());
});

type Route = { name: string; method: string; path: (slug?: string, id?: number) => string; body?: unknown; allowed: Role[] };
const c = (suffix: string) => (slug = a.slug, id = commissionId) => `/api/workshops/${slug}/commissions/${id}/${suffix}`;

// Permitted roles pass the permission check (the state may still answer 409, e.g. signing twice;
// the success paths are in setup-sheet.test.ts); the others get the exact 403 body.
const ROUTES: Route[] = [
  { name: "read the setup sheet", method: "GET", path: c("setup-sheet"), allowed: ["owner", "builder", "bookkeeper", "client"] },
  { name: "save the setup sheet", method: "PUT", path: c("setup-sheet"), body: goodSheet(), allowed: ["owner", "builder"] },
  { name: "sign the setup sheet", method: "POST", path: c("setup-sheet/sign"), body: { revision: 1 }, allowed: ["owner", "builder"] },
  { name: "reopen the setup sheet", method: "POST", path: c("setup-sheet/reopen"), body: { note: "Matrix reopen" }, allowed: ["owner", "builder"] },
  { name: "download the fret template", method: "GET", path: c("printouts/fret-template"), allowed: ["owner", "builder", "bookkeeper", "client"] },
  { name: "download the build sheet", method: "GET", path: c("printouts/build-sheet"), allowed: ["owner", "builder", "bookkeeper", "client"] },
  { name: "read the setup ranges", method: "GET", path: (slug = a.slug) => `/api/workshops/${slug}/setup-ranges`, allowed: ["owner", "builder", "bookkeeper", "client"] },
  { name: "reset the setup ranges", method: "DELETE", path: (slug = a.slug) => `/api/workshops/${slug}/setup-ranges`, allowed: ["owner"] },
];

async function call(who: keyof typeof as, r: Route, path = r.path()) {
  return as[who]!.fetch(path, { method: r.method, ...(r.body !== undefined ? { json: r.body } : {}) });
}

describe("setup and printout routes, role by role", () => {
  for (const r of ROUTES) {
    describe(`${r.method} ${r.name}`, () => {
      it("answers 401 signed out and 404 to a member of another workshop", async () => {
        expect((await call("anonymous", r)).status).toBe(401);
        const outsider = await call("outsider", r);
        expect(outsider.status).toBe(404);
        expect(await outsider.json()).toEqual({ error: { code: "not_found", message: "No such workshop." } });
      });
      for (const role of ["owner", "builder", "bookkeeper", "client"] as Role[]) {
        const permitted = r.allowed.includes(role);
        it(`${permitted ? "lets" : "refuses"} the ${role}`, async () => {
          const res = await call(role, r);
          if (permitted) expect([200, 201, 409]).toContain(res.status);
          else {
            expect(res.status).toBe(403);
            expect(await res.json()).toEqual({ error: { code: "forbidden", message: "You do not have permission to do this." } });
          }
        });
      }
    });
  }

  it("answers 404 to a builder not assigned to the commission and to another client, on every commission route", async () => {
    for (const r of ROUTES.filter((x) => x.path().includes("/commissions/"))) {
      const res = await call("otherBuilder", r);
      expect(res.status, `unassigned builder: ${r.method} ${r.name}`).toBe(404);
      if (r.allowed.includes("client")) expect((await call("otherClient", r)).status, `another client: ${r.method} ${r.name}`).toBe(404);
    }
  });
});

describe("cross-workshop isolation", () => {
  it("cannot read, change, sign or print B's commission under A's address (404, unchanged)", async () => {
    for (const r of ROUTES.filter((x) => x.path().includes("/commissions/"))) {
      const res = await call("owner", r, r.path(a.slug, bCommissionId));
      expect(res.status, `${r.method} ${r.name}`).toBe(404);
      expect(await res.json()).toEqual({ error: { code: "not_found", message: "No such commission." } });
    }
    const rows = await testDb()("setup_sheets").where({ workshop_id: b.id, commission_id: bCommissionId });
    expect(rows.map((r: { revision: number; builder_signed_at: Date | null }) => [r.revision, r.builder_signed_at])).toEqual([[1, null]]);
  });
});

describe("printouts", () => {
  it("sends the fret template as a PDF on the chosen paper, defaulting by the workshop's unit", async () => {
    const res = await as.builder!.fetch(`${c("printouts/fret-template")()}?paper=letter`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/pdf");
    expect(res.headers.get("content-disposition")).toMatch(/^attachment; filename="fret-template-\d{4}-\d{3}-letter\.pdf"$/);
    expect(res.headers.get("cache-control")).toBe("private, no-store");
    const pages = await readPdfLines(new Uint8Array(await res.arrayBuffer()));
    expect(pages.length).toBeGreaterThan(2);
    for (const p of pages) {
      expect(p.widthMm).toBeCloseTo(215.9, 6);
      expect(p.heightMm).toBeCloseTo(279.4, 6);
      expect(p.text).toMatch(/Print at 100% \(actual size\)/);
    }
    // The workshop works in mm: A4 unless asked otherwise.
    const a4 = await readPdfLines(new Uint8Array(await (await as.client!.fetch(c("printouts/fret-template")())).arrayBuffer()));
    expect(a4[0]!.widthMm).toBeCloseTo(210, 6);
    expect(a4[0]!.text).toMatch(/Approved spec v1 \(\d{4}-\d{2}-\d{2}\): scale 648\.00 mm, 22 frets/);
  });

  it("refuses a paper it does not know with 422 and the field path, and a commission without an approved spec with 409", async () => {
    const bad = await as.builder!.json<{ error: { issues: Array<{ path: string }> } }>(`${c("printouts/fret-template")()}?paper=a3`);
    expect(bad.status).toBe(422);
    expect(bad.body.error.issues.map((i) => i.path)).toEqual(["paper"]);
    const fresh = await openCommission(as.owner!, a);
    const none = await as.owner!.fetch(`${base(a)}/${fresh.id}/printouts/fret-template`);
    expect(none.status).toBe(409);
    // The build sheet is still there, saying so.
    const sheet = await as.owner!.fetch(`${base(a)}/${fresh.id}/printouts/build-sheet`);
    expect(sheet.status).toBe(200);
    expect((await readPdfLines(new Uint8Array(await sheet.arrayBuffer()))).map((p) => p.text).join(" ")).toContain("No approved spec yet");
  });

  it("puts the signed setup sheet on the client's build sheet, but never the workshop's draft", async () => {
    const fresh = await commissionInFinalSetup(as as Sessions, a);
    await putSheet(as.builder!, a, fresh.id, goodSheet());
    const text = async (who: HttpSession) => (await readPdfLines(new Uint8Array(await (await who.fetch(`${base(a)}/${fresh.id}/printouts/build-sheet`)).arrayBuffer()))).map((p) => p.text).join(" ");
    expect(await text(as.builder!)).toContain("Final setup (revision 1, draft, not signed)");
    expect(await text(as.client!)).not.toContain("Final setup (revision");
    await signSheet(as.builder!, a, fresh.id, 1);
    const clientText = await text(as.client!);
    expect(clientText).toMatch(/Final setup \(revision 1, signed \d{4}-\d{2}-\d{2}\)/);
    expect(clientText).toContain(a.name);
    expect(clientText).toContain("An eighth of a turn, settled overnight");
  });
});
