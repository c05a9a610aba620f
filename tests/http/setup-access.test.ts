// The setup-sheet and printout routes beyond who may call them (that is the authorization matrix,
// tests/security/): another workshop's commission under our address is 404 and stays as it was,
// and the printouts themselves are read back: PDFs of the chosen paper, a client's build sheet
// without the workshop's drafts. Paper sizes: A4 210 × 297 mm [standard: ISO 216]; Letter 215.9 × 279.4 mm
// [standard: ANSI/ASME Y14.1].
import { beforeAll, describe, expect, it } from "vitest";
import type { Role } from "@/lib/auth/permissions";
import { readPdfLines } from "../support/pdf-lines";
import { testDb } from "../setup/test-db";
import { base, openCommission } from "./commission-helpers";
import { createWorkshopWithMembers, type TestWorkshop } from "./fixtures";
import { signIn, type HttpSession } from "./session";
import { commissionInFinalSetup, goodSheet, putSheet, signSheet, type Sessions } from "./setup-helpers";

let a: TestWorkshop;
let b: TestWorkshop;
let commissionId: number;
let bCommissionId: number;
const as: Partial<Record<Role | "outsider", HttpSession>> = {};

beforeAll(async () => {
  [a, b] = await Promise.all([createWorkshopWithMembers(), createWorkshopWithMembers()]);
  for (const role of ["owner", "builder", "bookkeeper", "client"] as Role[]) as[role] = await signIn(a[role]);
  as.outsider = await signIn(b.owner);
  const c = await commissionInFinalSetup(as as Sessions, a);
  commissionId = c.id;
  await putSheet(as.builder!, a, commissionId, goodSheet());
  const bs: Sessions = { owner: as.outsider, builder: await signIn(b.builder), bookkeeper: await signIn(b.bookkeeper), client: await signIn(b.client) };
  bCommissionId = (await commissionInFinalSetup(bs, b)).id;
  await putSheet(bs.builder, b, bCommissionId, goodSheet());
});

type Route = { name: string; method: string; path: (slug?: string, id?: number) => string; body?: unknown };
const c = (suffix: string) => (slug = a.slug, id = commissionId) => `/api/workshops/${slug}/commissions/${id}/${suffix}`;

// The routes about one commission (who may call each is the authorization matrix, tests/security/).
const ROUTES: Route[] = [
  { name: "read the setup sheet", method: "GET", path: c("setup-sheet") },
  { name: "save the setup sheet", method: "PUT", path: c("setup-sheet"), body: goodSheet() },
  { name: "sign the setup sheet", method: "POST", path: c("setup-sheet/sign"), body: { revision: 1 } },
  { name: "reopen the setup sheet", method: "POST", path: c("setup-sheet/reopen"), body: { note: "Matrix reopen" } },
  { name: "download the fret template", method: "GET", path: c("printouts/fret-template") },
  { name: "download the build sheet", method: "GET", path: c("printouts/build-sheet") },
];

async function call(who: keyof typeof as, r: Route, path = r.path()) {
  return as[who]!.fetch(path, { method: r.method, ...(r.body !== undefined ? { json: r.body } : {}) });
}

describe("cross-workshop isolation", () => {
  it("cannot read, change, sign or print B's commission under A's address (404, unchanged)", async () => {
    for (const r of ROUTES) {
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
