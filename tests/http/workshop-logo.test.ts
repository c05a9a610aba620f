// The workshop logo end to end over HTTP: the real upload client (uploadthing/client) through the
// app's `workshopLogo` file route and the uploads fake, MariaDB behind. Only the owner uploads;
// the bytes decide what is an image; what is kept is a PNG of at most 512 px with no metadata
// chunks (read back by the PNG format, tests/support/png-chunks.ts); every member gets it from the
// authorised route, nobody outside the workshop; a replaced logo's file is deleted; the build
// sheet then carries it as an image (read back with pdf-lib, the PDF package the app writes with).
import { PDFDocument, PDFName, PDFNumber, PDFRawStream } from "pdf-lib";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import type { Role } from "@/lib/auth/permissions";
import { jpegWithGps, NOT_AN_IMAGE, plainPng } from "../support/photos";
import { pngChunkTypes, pngSize } from "../support/png-chunks";
import { closeTestDb, testDb } from "../setup/test-db";
import { base, openCommission } from "./commission-helpers";
import { createWorkshopWithMembers, type TestWorkshop } from "./fixtures";
import { askToUpload, fakeFiles, fileOf, installXhr, uploadLogo } from "./photo-helpers";
import { anonymous, signIn, type HttpSession } from "./session";

let a: TestWorkshop;
let b: TestWorkshop;
let s: Record<Role | "ownerB", HttpSession>;
let commissionId: number;

// An upload is a presign, a PUT and a callback with image processing: slow on a busy machine.
vi.setConfig({ testTimeout: 120_000 });

const logoPath = (ws: TestWorkshop) => `/api/workshops/${ws.slug}/logo`;
const storedKey = async (ws: TestWorkshop) => ((await testDb()("workshops").where({ id: ws.id }).first("logo_file_key")) as { logo_file_key: string | null }).logo_file_key;

/** The image XObjects of a PDF with their pixel size (PDF 32000-1:2008 §8.9.5: /Subtype /Image, /Width, /Height). */
async function pdfImages(bytes: Uint8Array): Promise<Array<{ width: number; height: number }>> {
  const doc = await PDFDocument.load(bytes);
  const images: Array<{ width: number; height: number }> = [];
  for (const [, obj] of doc.context.enumerateIndirectObjects()) {
    if (!(obj instanceof PDFRawStream) || obj.dict.get(PDFName.of("Subtype")) !== PDFName.of("Image")) continue;
    const n = (key: string) => (obj.dict.get(PDFName.of(key)) as PDFNumber).asNumber();
    // An image with transparency comes with its soft mask, itself an image of the same size.
    if (obj.dict.get(PDFName.of("SMask")) !== undefined || obj.dict.get(PDFName.of("ColorSpace")) !== PDFName.of("DeviceGray")) images.push({ width: n("Width"), height: n("Height") });
  }
  return images;
}

async function buildSheet(session: HttpSession): Promise<Uint8Array> {
  const res = await session.fetch(`${base(a)}/${commissionId}/printouts/build-sheet?paper=a4`);
  expect(res.status).toBe(200);
  return new Uint8Array(await res.arrayBuffer());
}

beforeAll(async () => {
  installXhr();
  [a, b] = await Promise.all([createWorkshopWithMembers(), createWorkshopWithMembers()]);
  const [owner, builder, bookkeeper, client, ownerB] = await Promise.all([signIn(a.owner), signIn(a.builder), signIn(a.bookkeeper), signIn(a.client), signIn(b.owner)]);
  s = { owner, builder, bookkeeper, client, ownerB };
  commissionId = (await openCommission(owner, a, { title: "Logo build sheet" })).id;
});
afterAll(closeTestDb);

describe("uploading the workshop logo", () => {
  it("has no logo to begin with: 404 from the route, none on the build sheet", async () => {
    const res = await s.client.fetch(logoPath(a));
    expect(res.status).toBe(404);
    expect(await res.json()).toEqual({ error: { code: "not_found", message: "This workshop has no logo." } });
    expect(await pdfImages(await buildSheet(s.owner))).toEqual([]);
    expect((await s.owner.json<{ settings: { logoUrl: string | null } }>(`/api/workshops/${a.slug}/settings`)).body.settings.logoUrl).toBeNull();
  });

  it("refuses everyone but the owner before a byte is sent", async () => {
    const one = [{ name: "logo.png", size: 1000, type: "image/png" }];
    for (const role of ["builder", "bookkeeper", "client"] as const) {
      const r = await askToUpload(s[role], { workshop: a.slug }, one, "workshopLogo");
      expect([role, r.status, r.body.error]).toEqual([role, 403, { code: "forbidden", message: "Only the workshop's owner changes its logo." }]);
    }
    const nobody = await askToUpload(null, { workshop: a.slug }, one, "workshopLogo");
    expect([nobody.status, nobody.body.error.code]).toEqual([403, "unauthenticated"]);
    // The owner of another workshop: the same answer as for a workshop that does not exist.
    const fromB = await askToUpload(s.ownerB, { workshop: a.slug }, one, "workshopLogo");
    expect([fromB.status, fromB.body.error]).toEqual([404, { code: "not_found", message: "No such workshop." }]);
    const unknown = await askToUpload(s.owner, { workshop: "no-such-workshop-here" }, one, "workshopLogo");
    expect([unknown.status, unknown.body.error]).toEqual([404, fromB.body.error]);
    await expect(uploadLogo(s.client, a.slug, fileOf(await plainPng(64, 64), "logo.png", "image/png"))).rejects.toMatchObject({ message: "Only the workshop's owner changes its logo." });
    expect(await storedKey(a)).toBeNull();
  });

  it("refuses a file over 2 MB, two files, and a missing workshop with its field path", async () => {
    const big = await askToUpload(s.owner, { workshop: a.slug }, [{ name: "huge.png", size: 3 * 1024 * 1024, type: "image/png" }], "workshopLogo");
    expect([big.status, big.body.error]).toEqual([400, { code: "validation_failed", message: "huge.png is 3 MB; the image may be at most 2 MB.", issues: [{ path: "files.0", message: "huge.png is 3 MB; the image may be at most 2 MB." }] }]);
    const two = await askToUpload(s.owner, { workshop: a.slug }, [{ name: "a.png", size: 10, type: "image/png" }, { name: "b.png", size: 10, type: "image/png" }], "workshopLogo");
    expect([two.status, two.body.message]).toEqual([400, "Choose one image (you chose 2)."]);
    const noWorkshop = await askToUpload(s.owner, {}, [{ name: "a.png", size: 10, type: "image/png" }], "workshopLogo");
    expect(noWorkshop.status).toBe(400);
    expect(noWorkshop.body.error.issues[0].path).toBe("input.workshop");
  });

  it("refuses a text file named like an image by its content, keeping nothing", async () => {
    const up = await uploadLogo(s.owner, a.slug, fileOf(NOT_AN_IMAGE, "logo.png", "image/png"));
    expect(up.serverData).toMatchObject({ ok: false, code: "validation_failed", message: "logo.png is not an image we can read: upload a JPEG, PNG, WebP or AVIF image." });
    expect(await storedKey(a)).toBeNull();
    expect((await fakeFiles()).find((f) => f.key === up.key)).toBeUndefined();
  });

  it("keeps the owner's logo as a PNG within 512 px without its metadata, served to every member", async () => {
    const up = await uploadLogo(s.owner, a.slug, fileOf(await jpegWithGps(1200, 800, { seed: 31 }), "workshop-mark.jpg"));
    expect(up.serverData).toEqual({ ok: true, width: 512, height: 341 }); // 1200 × 800 scaled by 512/1200, rounded
    const key = await storedKey(a);
    expect(key).not.toBeNull();
    const files = await fakeFiles();
    expect(files.find((f) => f.key === up.key)).toBeUndefined(); // the original (with its GPS) is gone
    expect(files.find((f) => f.key === key)).toMatchObject({ acl: "private" });

    const logoUrl = (await s.owner.json<{ settings: { logoUrl: string | null } }>(`/api/workshops/${a.slug}/settings`)).body.settings.logoUrl;
    expect(logoUrl).toMatch(new RegExp(`^/api/workshops/${a.slug}/logo\\?v=[0-9a-f]{12}$`));
    expect(logoUrl).not.toContain(key!);
    for (const role of ["owner", "builder", "bookkeeper", "client"] as const) {
      const res = await s[role].fetch(logoUrl!);
      expect([role, res.status, res.headers.get("content-type")]).toEqual([role, 200, "image/png"]);
      expect(res.headers.get("cache-control")).toBe("private, max-age=3600");
      const bytes = Buffer.from(await res.arrayBuffer());
      expect(pngSize(bytes)).toEqual({ width: 512, height: 341 });
      expect(pngChunkTypes(bytes).filter((c) => ["eXIf", "iCCP", "tEXt", "zTXt", "iTXt"].includes(c))).toEqual([]);
      expect(bytes.includes(Buffer.from("Invented Camera Works"))).toBe(false);
    }
    const audit = await testDb()("audit_log").where({ workshop_id: a.id, action: "workshop.logo_changed" });
    expect(audit).toHaveLength(1);
  });

  it("serves it to nobody outside the workshop", async () => {
    const outsider = await s.ownerB.fetch(logoPath(a));
    const unknown = await s.owner.fetch("/api/workshops/no-such-workshop-here/logo");
    expect(outsider.status).toBe(404);
    expect(await outsider.json()).toEqual(await unknown.json());
    expect((await anonymous().fetch(logoPath(a))).status).toBe(401);
    // Workshop B has no logo of its own, and A's does not leak into it.
    expect((await s.ownerB.fetch(logoPath(b))).status).toBe(404);
  });

  it("prints the logo on the build sheet", async () => {
    expect(await pdfImages(await buildSheet(s.owner))).toEqual([{ width: 512, height: 341 }]);
    // The client's copy of the same printout carries it too.
    expect(await pdfImages(await buildSheet(s.client))).toEqual([{ width: 512, height: 341 }]);
  });

  it("replaces the logo and deletes the old file", async () => {
    const before = await storedKey(a);
    const up = await uploadLogo(s.owner, a.slug, fileOf(await plainPng(300, 100, 7), "wide.png", "image/png"));
    expect(up.serverData).toEqual({ ok: true, width: 300, height: 100 });
    const after = await storedKey(a);
    expect(after).not.toBe(before);
    const files = await fakeFiles();
    expect(files.find((f) => f.key === before)).toBeUndefined();
    expect(files.find((f) => f.key === after)).toBeDefined();
    expect(pngSize(Buffer.from(await (await s.builder.fetch(logoPath(a))).arrayBuffer()))).toEqual({ width: 300, height: 100 });
    expect(await pdfImages(await buildSheet(s.owner))).toEqual([{ width: 300, height: 100 }]);
  });
});
