// The final setup sheet over HTTP against the built app and the real MariaDB: validation (warnings
// saved, impossible values refused with 422 and field paths, nothing stored), the figures from the
// setup helpers, sign-off and locking, revisions, the owner's sign-off, the workshop's ranges, and
// delivery: refused until the sheet is signed and the balance paid, then the delivered e-mail in
// the outbox carries the setup summary.
import { beforeAll, describe, expect, it } from "vitest";
import { testDb } from "../setup/test-db";
import { base, detail, move } from "./commission-helpers";
import { createWorkshopWithMembers, type TestWorkshop } from "./fixtures";
import { signIn } from "./session";
import { commissionInFinalSetup, getSheet, goodSheet, putSheet, type Sessions, sheetUrl, signSheet } from "./setup-helpers";

let ws: TestWorkshop;
let s: Sessions;

beforeAll(async () => {
  ws = await createWorkshopWithMembers();
  const [owner, builder, bookkeeper, client] = await Promise.all([signIn(ws.owner), signIn(ws.builder), signIn(ws.bookkeeper), signIn(ws.client)]);
  s = { owner, builder, bookkeeper, client };
});

describe("setup sheet", () => {
  it("is filled in during final setup only", async () => {
    const c = await commissionInFinalSetup(s, ws);
    const first = await getSheet(s.builder, ws, c.id);
    expect(first.status).toBe(200);
    expect(first.body.setup.sheet).toBeNull();
    expect(first.body.setup.can).toEqual({ edit: true, sign: false, reopen: false });
    expect(first.body.setup.spec!.strings.map((x) => x.string)).toEqual([1, 2, 3, 4, 5, 6]);
    expect(first.body.setup.unit).toBe("mm");
    // Not before final setup: move it back one stage (the owner's correction) and try.
    expect((await move(s.owner, ws, c.id, "back")).status).toBe(200);
    const early = await putSheet(s.builder, ws, c.id, goodSheet());
    expect(early.status).toBe(409);
    expect((await move(s.owner, ws, c.id, "advance")).status).toBe(200);
  });

  it("saves values outside the common-practice ranges as warnings, and refuses impossible ones with 422 and field paths", async () => {
    const c = await commissionInFinalSetup(s, ws);
    const bad = goodSheet();
    bad.strings[0]!.actionAt12Mm = 25; // inches typed as mm, or a slip
    bad.strings[1]!.string = 7; // the spec has six strings
    bad.neck.reliefMm = 3;
    const refused = await putSheet(s.builder, ws, c.id, bad);
    expect(refused.status).toBe(422);
    expect(refused.body.error!.code).toBe("validation_failed");
    expect(refused.body.error!.issues.map((i) => i.path).sort()).toEqual(["neck.reliefMm", "strings.0.actionAt12Mm", "strings.1.string"]);
    expect((await getSheet(s.builder, ws, c.id)).body.setup.sheet).toBeNull(); // nothing stored

    const malformed = await putSheet(s.builder, ws, c.id, { ...goodSheet(), strings: [{ string: 1, actionAt12Mm: "low" }], neck: { reliefMm: 0.2, reliefAtFret: 5 } });
    expect(malformed.status).toBe(422);
    expect(malformed.body.error!.issues.map((i) => i.path)).toEqual(expect.arrayContaining(["strings.0.actionAt12Mm", "strings.0.nutSlotAt1Mm", "neck.reliefAtFret"]));
    expect((await s.builder.fetch(sheetUrl(ws, c.id), { method: "PUT", body: "{oops", headers: { "content-type": "application/json" } })).status).toBe(400);

    const warned = goodSheet(4); // string 1 sharp by 4 cents: outside ±2
    warned.strings[5]!.actionAt12Mm = 3.1; // bass side above 2.4 mm
    const saved = await putSheet(s.builder, ws, c.id, warned);
    expect(saved.status).toBe(200);
    const issues = saved.body.setup.issues;
    expect(issues.map((i) => [i.level, i.path])).toEqual(
      expect.arrayContaining([
        ["warning", "strings.0.intonationCents"],
        ["warning", "strings.5.actionAt12Mm"],
      ]),
    );
    for (const i of issues) expect(i.message).toMatch(/common practice/);
    expect(saved.body.setup.sheet).toMatchObject({ revision: 1, status: "draft" });
  });

  it("suggests the saddle move of the setup helper: +5 cents on the 648 mm string 1 is 1.8796 mm back", async () => {
    // Worked by hand (model B, SOURCES §2.10): k = 2^(5/1200) = 1.0028923;
    // Δ = 648 × 0.0028923 / (2 − 1.0028923) = 1.8742104 / 0.9971077 = 1.879647 mm.
    const byHand = (648 * 0.0028923) / 0.9971077;
    const c = await commissionInFinalSetup(s, ws);
    const sheet = goodSheet(5);
    // A pull test on string 1: 2 N deflects it 4.5 mm at mid-span; T = F/(2 sin θ), θ = atan(2δ/S)
    // (SOURCES §2.8): θ = atan(9/648) = 0.0138880, T = 2/(2 × 0.0138875) = 72.007 N.
    (sheet.strings[0] as Record<string, unknown>).pullTest = { forceN: 2, deflectionMm: 4.5 };
    const r = await putSheet(s.builder, ws, c.id, sheet);
    expect(r.status).toBe(200);
    const [first] = r.body.setup.figures;
    expect(Math.abs(first!.saddleMoveMm! - byHand)).toBeLessThan(1e-4);
    expect(first!.pullTest!.tensionN).toBeCloseTo(72.007, 2);
    // The spec's own tension for string 1 (E4, plain 0.010 in, 648 mm), as the approved result has it.
    const specTension = r.body.setup.spec!.strings[0]!.tensionN;
    expect(first!.pullTest!.specTensionN).toBe(specTension);
    expect(first!.pullTest!.differenceN).toBeCloseTo(72.007 - specTension, 2);
  });

  it("locks a signed revision; reopening starts the next one, and the client sees only signed revisions", async () => {
    const c = await commissionInFinalSetup(s, ws);
    expect((await signSheet(s.builder, ws, c.id, 1)).status).toBe(409); // nothing saved yet
    await putSheet(s.builder, ws, c.id, goodSheet());
    expect((await getSheet(s.client, ws, c.id)).body.setup.sheet).toBeNull(); // a draft is the workshop's
    expect((await signSheet(s.builder, ws, c.id, 2)).status).toBe(409); // not the revision on file
    expect((await signSheet(s.client, ws, c.id, 1)).status).toBe(403);
    expect((await signSheet(s.bookkeeper, ws, c.id, 1)).status).toBe(403);
    const signed = await signSheet(s.builder, ws, c.id, 1);
    expect(signed.status).toBe(200);
    expect(signed.body.setup.sheet).toMatchObject({ revision: 1, status: "signed", builderSignedBy: { id: ws.builder.userId } });
    expect(signed.body.setup.can).toEqual({ edit: false, sign: false, reopen: true });
    expect((await signSheet(s.builder, ws, c.id, 1)).status).toBe(409);

    const locked = await putSheet(s.builder, ws, c.id, goodSheet(1));
    expect(locked.status).toBe(409);
    const clientView = (await getSheet(s.client, ws, c.id)).body.setup;
    expect(clientView.sheet).toMatchObject({ revision: 1, status: "signed" });
    expect(clientView.can).toEqual({ edit: false, sign: false, reopen: false });
    expect(clientView.summary[0]).toMatch(/^Action at the 12th fret: 1\.60 mm \(string 1\) to 2\.00 mm \(string 6\)$/);

    const short = await s.builder.fetch(`${sheetUrl(ws, c.id)}/reopen`, { method: "POST", json: { note: "x" } });
    expect(short.status).toBe(422);
    const reopened = await s.builder.json<{ setup: { sheet: { revision: number; status: string; reopenNote: string } } }>(`${sheetUrl(ws, c.id)}/reopen`, {
      method: "POST",
      json: { note: "Relief moved after the neck settled" },
    });
    expect(reopened.status).toBe(201);
    expect(reopened.body.setup.sheet).toMatchObject({ revision: 2, status: "draft", reopenNote: "Relief moved after the neck settled" });
    const changed = goodSheet();
    changed.neck.reliefMm = 0.25;
    expect((await putSheet(s.builder, ws, c.id, changed)).status).toBe(200);
    // Revision 1 is as it was signed; the client still reads it until revision 2 is signed.
    const r1 = (await getSheet(s.builder, ws, c.id, "?revision=1")).body.setup;
    expect(r1.sheet!.values.neck.reliefMm).toBe(0.2);
    expect(r1.isCurrent).toBe(false);
    expect((await getSheet(s.client, ws, c.id)).body.setup.sheet!.revision).toBe(1);
    expect((await s.client.fetch(`${sheetUrl(ws, c.id)}?revision=2`)).status).toBe(404);
    const rows = await testDb()("setup_sheets").where({ workshop_id: ws.id, commission_id: c.id }).orderBy("revision");
    expect(rows.map((r: { revision: number; signed_at: Date | null }) => [r.revision, !!r.signed_at])).toEqual([
      [1, true],
      [2, false],
    ]);
    // A reopened, unsigned current revision holds delivery back again.
    const refused = await move(s.owner, ws, c.id, "advance");
    expect(refused.status).toBe(409);
    expect(((await refused.json()) as { error: { issues: Array<{ message: string }> } }).error.issues.map((i) => i.message)).toContain(
      "The final setup sheet is not filled in and signed.",
    );
  });

  it("waits for the owner's sign-off when the workshop requires it", async () => {
    const other = await createWorkshopWithMembers();
    await testDb()("workshops").where({ id: other.id }).update({ require_stage_signoff: true });
    const [owner, builder, bookkeeper, client] = await Promise.all([signIn(other.owner), signIn(other.builder), signIn(other.bookkeeper), signIn(other.client)]);
    const t: Sessions = { owner, builder, bookkeeper, client };
    const c = await commissionInFinalSetup(t, other);
    await putSheet(builder, other, c.id, goodSheet());
    const byBuilder = await signSheet(builder, other, c.id, 1);
    expect(byBuilder.body.setup.sheet).toMatchObject({ status: "awaiting_owner" });
    expect(byBuilder.body.setup.requireOwnerSignoff).toBe(true);
    expect((await putSheet(builder, other, c.id, goodSheet(1))).status).toBe(409); // locked at the builder's signature
    expect((await signSheet(builder, other, c.id, 1)).status).toBe(403);
    expect((await getSheet(client, other, c.id)).body.setup.sheet).toBeNull();
    await bookkeeper.fetch(`${base(other)}/${c.id}/payments`, { method: "POST", json: { kind: "balance", amountMinor: 210_000, reference: "Balance transfer" } });
    expect((await move(owner, other, c.id, "advance")).status).toBe(409);
    const byOwner = await signSheet(owner, other, c.id, 1);
    expect(byOwner.body.setup.sheet).toMatchObject({ status: "signed", ownerSignedBy: { id: other.owner.userId } });
    expect((await move(owner, other, c.id, "advance")).status).toBe(200);
  });

  it("delivers once the sheet is signed and the balance paid; the delivered e-mail carries the setup summary", async () => {
    const c = await commissionInFinalSetup(s, ws);
    await putSheet(s.builder, ws, c.id, goodSheet());
    await signSheet(s.builder, ws, c.id, 1);
    const owed = await move(s.owner, ws, c.id, "advance");
    expect(owed.status).toBe(409);
    expect(((await owed.json()) as { error: { issues: Array<{ message: string }> } }).error.issues.map((i) => i.message)).toEqual(["The balance has not been paid."]);
    // The balance, recorded through the offline payment API by the bookkeeper.
    const paid = await s.bookkeeper.json<{ balancePaid: boolean }>(`${base(ws)}/${c.id}/payments`, {
      method: "POST",
      json: { kind: "balance", amountMinor: 210_000, reference: "Balance bank transfer 0099" },
    });
    expect(paid.status).toBe(201);
    expect(paid.body.balancePaid).toBe(true);
    const delivered = await move(s.builder, ws, c.id, "advance");
    expect(delivered.status).toBe(200);
    expect((await detail(s.client, ws, c.id)).stage).toBe("delivered");

    const row = await testDb()("email_outbox").where({ to_address: ws.client.email, template: "delivered" }).orderBy("id", "desc").first();
    const props = typeof row.props === "string" ? JSON.parse(row.props) : row.props;
    expect(props.setupSummary).toEqual([
      "Action at the 12th fret: 1.60 mm (string 1) to 2.00 mm (string 6)",
      "Nut slot height over the 1st fret: 0.10 mm",
      "Intonation at the 12th fret: within 0.8 cents on every string",
      "Neck relief at the 8th fret: 0.20 mm",
      "Pickup height, bass/treble side: Bridge 2.40/1.60 mm; Neck 2.60/2.00 mm",
      "Electronics checks done: 4 of 8",
      expect.stringMatching(new RegExp(`^Signed off by ${ws.builder.name} on \\d{4}-\\d{2}-\\d{2} \\(revision 1\\)$`)),
    ]);
    // Delivered is final: the sheet stays as signed.
    expect((await putSheet(s.builder, ws, c.id, goodSheet(1))).status).toBe(409);
    expect((await s.builder.fetch(`${sheetUrl(ws, c.id)}/reopen`, { method: "POST", json: { note: "After delivery" } })).status).toBe(409);
  });
});

describe("the workshop's setup ranges", () => {
  it("lets the owner narrow them (checked with 422 paths) and the checks follow; others may not", async () => {
    const url = `/api/workshops/${ws.slug}/setup-ranges`;
    const current = await s.owner.json<{ ranges: { guitar: Record<string, unknown>; bass: Record<string, unknown> }; customised: boolean }>(url);
    expect(current.status).toBe(200);
    const ranges = structuredClone(current.body.ranges) as { guitar: Record<string, { min: number; max: number }>; bass: unknown };
    ranges.guitar.reliefMm = { min: 0.3, max: 0.2 };
    const bad = await s.owner.json<{ error: { issues: Array<{ path: string }> } }>(url, { method: "PUT", json: ranges });
    expect(bad.status).toBe(422);
    expect(bad.body.error.issues.map((i) => i.path)).toContain("guitar.reliefMm.min");
    ranges.guitar.reliefMm = { min: 0.1, max: 0.15 };
    expect((await s.builder.fetch(url, { method: "PUT", json: ranges })).status).toBe(403);
    const saved = await s.owner.json<{ customised: boolean }>(url, { method: "PUT", json: ranges });
    expect(saved.body.customised).toBe(true);

    const c = await commissionInFinalSetup(s, ws);
    const r = await putSheet(s.builder, ws, c.id, goodSheet()); // relief 0.20 mm: now above 0.15
    expect(r.body.setup.issues.map((i) => i.path)).toEqual(["neck.reliefMm"]);
    expect(r.body.setup.rangesCustomised).toBe(true);
    expect((await s.owner.fetch(url, { method: "DELETE" })).status).toBe(200);
    expect((await getSheet(s.builder, ws, c.id)).body.setup.issues).toEqual([]);
  });
});
