// Stage photos end to end over HTTP: the real upload client (uploadthing/client) against the app's
// file route and the uploads fake, MariaDB behind. Who may upload what, where, and what is served:
// images only by their content, limits, a client only in the spec stage, no EXIF/GPS in what is
// served (read back per CIPA DC-008 with tests/support/exif.ts), thumbnails, private files, 404s
// for everyone outside the commission, audited removal, and an outage that leaves nothing behind.
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { MAX_PHOTO_BYTES } from "@/lib/photos/rules";
import { DEFAULT_BUILD_STAGES } from "@/lib/workflow/stages";
import { jpegAppSegments, jpegExifTiff } from "../support/exif";
import { jpegWithGps, NOT_AN_IMAGE, plainPng } from "../support/photos";
import { closeTestDb, testDb } from "../setup/test-db";
import { base, move, openCommission } from "./commission-helpers";
import { createWorkshopWithMembers, type TestWorkshop } from "./fixtures";
import {
  addPhoto,
  askToUpload,
  commissionInBuild,
  fakeFiles,
  fakeUrl,
  fileOf,
  installXhr,
  photoRow,
  photosPath,
  setFakeOutage,
  uploadPhotos,
} from "./photo-helpers";
import { signIn, type HttpSession } from "./session";

let a: TestWorkshop;
let b: TestWorkshop;
let s: Record<"owner" | "builder" | "bookkeeper" | "client" | "otherClient" | "otherBuilder" | "ownerB", HttpSession>;
let inBuild: { id: number }; // a's client, a's builder, at the first build stage
let inSpec: { id: number }; // a's client, still in the spec stage
let photoId: number; // the builder's stage photo on inBuild, with GPS in its upload

const FIRST_STAGE = DEFAULT_BUILD_STAGES[0]!;

// Each upload is a presign, a PUT and a callback with image processing: slow on a busy machine.
vi.setConfig({ testTimeout: 120_000 });

beforeAll(async () => {
  installXhr();
  [a, b] = await Promise.all([createWorkshopWithMembers({ extra: { client: 1, builder: 1 } }), createWorkshopWithMembers()]);
  const [owner, builder, bookkeeper, client, otherClient, otherBuilder, ownerB] = await Promise.all([
    signIn(a.owner),
    signIn(a.builder),
    signIn(a.bookkeeper),
    signIn(a.client),
    signIn(a.members.filter((m) => m.role === "client")[1]!),
    signIn(a.members.filter((m) => m.role === "builder")[1]!),
    signIn(b.owner),
  ]);
  s = { owner, builder, bookkeeper, client, otherClient, otherBuilder, ownerB };
  inBuild = await commissionInBuild(a, s);
  inSpec = await openCommission(owner, a, { title: "Reference pictures welcome" });
}, 120_000);

afterAll(async () => {
  await setFakeOutage("none").catch(() => undefined);
  await closeTestDb();
});

describe("uploading stage photos", () => {
  it("stores the builder's photo under the current stage, strips its metadata, makes a thumbnail and deletes the original", async () => {
    const upload = await jpegWithGps(1600, 1200);
    expect(jpegExifTiff(upload)).not.toBeNull(); // the upload carries EXIF with a GPS position
    const [up] = await uploadPhotos(s.builder, a, inBuild.id, [fileOf(upload, "fret-slots.jpg")], "Fret slots cut, before the wire");
    expect(up!.serverData).toEqual({ ok: true, photoId: expect.any(Number), stage: FIRST_STAGE.key });
    photoId = (up!.serverData as { photoId: number }).photoId;

    const row = await photoRow(photoId);
    expect(row).toMatchObject({ commission_id: inBuild.id, stage: FIRST_STAGE.key, caption: "Fret slots cut, before the wire", uploaded_by: a.builder.userId, width: 1600, height: 1200, removed_at: null });
    expect(Math.max(row.thumb_width, row.thumb_height)).toBe(480);
    expect(row.source_key).toBe(up!.key);

    // At the service: the original (with its GPS) is gone; what we serve is stored private.
    const files = await fakeFiles();
    expect(files.find((f) => f.key === up!.key)).toBeUndefined();
    expect(files.filter((f) => f.key === row.file_key || f.key === row.thumb_key).map((f) => [f.acl, f.status])).toEqual([
      ["private", "Uploaded"],
      ["private", "Uploaded"],
    ]);
    const audit = await testDb()("audit_log").where({ workshop_id: a.id, action: "photo.added", entity_id: String(photoId) }).first();
    expect(audit?.actor_user_id).toBe(a.builder.userId);
  });

  it("serves the client a full-size version and a thumbnail with no EXIF, GPS or other metadata", async () => {
    for (const [variant, edge] of [["full", 1600], ["thumb", 480]] as const) {
      const res = await s.client.fetch(`${photosPath(a, inBuild.id)}/${photoId}/${variant}`);
      expect(res.status, variant).toBe(200);
      expect(res.headers.get("content-type")).toBe("image/jpeg");
      expect(res.headers.get("cache-control")).toMatch(/^private/);
      const bytes = Buffer.from(await res.arrayBuffer());
      expect(jpegExifTiff(bytes), variant).toBeNull(); // no APP1 "Exif" segment (CIPA DC-008 §4.5.4)
      expect(jpegAppSegments(bytes).map((x) => x.id)).not.toContain("http://ns.adobe.com/xap/1.0/");
      const meta = await sharp(bytes).metadata();
      expect([meta.exif, meta.xmp, meta.iptc]).toEqual([undefined, undefined, undefined]);
      expect(Math.max(meta.width!, meta.height!)).toBe(edge);
      expect(bytes.includes(Buffer.from("Invented Camera Works"))).toBe(false);
    }
  });

  it("lists the photos grouped by stage for the client", async () => {
    const r = await s.client.json<{ stages: Array<{ stage: string; label: string; photos: Array<{ id: number; caption: string; thumbUrl: string; fullUrl: string }> }> }>(photosPath(a, inBuild.id));
    expect(r.status).toBe(200);
    const group = r.body.stages.find((g) => g.stage === FIRST_STAGE.key)!;
    expect(group.label).toBe(FIRST_STAGE.label);
    expect(group.photos.find((p) => p.id === photoId)).toMatchObject({
      caption: "Fret slots cut, before the wire",
      thumbUrl: `${photosPath(a, inBuild.id)}/${photoId}/thumb`,
      fullUrl: `${photosPath(a, inBuild.id)}/${photoId}/full`,
    });
    expect(JSON.stringify(r.body)).not.toMatch(/_key|ufs|127\.0\.0\.1/); // no store keys or URLs leave the app
  });

  it("judges the content, not the name: a text file called .jpg is refused and nothing is kept", async () => {
    const [up] = await uploadPhotos(s.builder, a, inBuild.id, [fileOf(NOT_AN_IMAGE, "fretboard.jpg")]);
    expect(up!.serverData).toEqual({ ok: false, code: "validation_failed", message: "fretboard.jpg is not a photo we can read: upload a JPEG, PNG, WebP or AVIF image." });
    expect(await testDb()("photos").where({ source_key: up!.key }).first()).toBeUndefined();
    expect((await fakeFiles()).find((f) => f.key === up!.key)).toBeUndefined();
  });

  it("refuses a photo over 8 MB before a byte is sent, saying which and why", async () => {
    const huge = fileOf(Buffer.alloc(9 * 1024 * 1024, 0xff), "whole-body.jpg");
    await expect(uploadPhotos(s.builder, a, inBuild.id, [huge])).rejects.toMatchObject({ message: "whole-body.jpg is 9 MB; each photo may be at most 8 MB." });
    const r = await askToUpload(s.builder, { workshop: a.slug, commissionId: inBuild.id, caption: "x" }, [{ name: "big.jpg", size: MAX_PHOTO_BYTES + 1, type: "image/jpeg" }]);
    expect(r.status).toBe(400);
    expect(r.body.error).toEqual({ code: "validation_failed", message: "big.jpg is 8 MB; each photo may be at most 8 MB.", issues: [{ path: "files.0", message: "big.jpg is 8 MB; each photo may be at most 8 MB." }] });
    // Exactly the limit is what the SDK's own "8MB" route config accepts too.
    const atLimit = await askToUpload(s.builder, { workshop: a.slug, commissionId: inBuild.id, caption: "x" }, [{ name: "ok.jpg", size: MAX_PHOTO_BYTES, type: "image/jpeg" }]);
    expect(atLimit.status).toBe(200);
  });

  it("refuses more than 6 photos in one upload, and a missing caption with its field path", async () => {
    const seven = Array.from({ length: 7 }, (_, i) => ({ name: `p${i}.jpg`, size: 1000, type: "image/jpeg" }));
    const many = await askToUpload(s.builder, { workshop: a.slug, commissionId: inBuild.id, caption: "x" }, seven);
    expect(many.status).toBe(400);
    expect(many.body.message).toBe("At most 6 photos per upload (you chose 7).");
    const noCaption = await askToUpload(s.builder, { workshop: a.slug, commissionId: inBuild.id, caption: "  " }, [{ name: "a.jpg", size: 10, type: "image/jpeg" }]);
    expect(noCaption.status).toBe(400);
    expect(noCaption.body.error.issues).toEqual([{ path: "input.caption", message: "Add a caption: what does the photo show?" }]);
  });

  it("lets a client add reference pictures in the spec stage, and refuses them in a build stage with the reason", async () => {
    const id = await addPhoto(s.client, a, inSpec.id, fileOf(await plainPng(300, 200), "sunburst-reference.png", "image/png"), "The sunburst I would like");
    expect((await photoRow(id)).stage).toBe("spec");
    const message = `Clients can add reference pictures only while the spec is being agreed; this commission is now at “${FIRST_STAGE.label}”.`;
    await expect(uploadPhotos(s.client, a, inBuild.id, [fileOf(await jpegWithGps(40, 30), "idea.jpg")])).rejects.toMatchObject({ message });
    const r = await askToUpload(s.client, { workshop: a.slug, commissionId: inBuild.id, caption: "x" }, [{ name: "idea.jpg", size: 100, type: "image/jpeg" }]);
    expect([r.status, r.body.error]).toEqual([403, { code: "forbidden", message }]);
  });

  it("lets only the commission's builder and the owner add stage photos", async () => {
    const input = { workshop: a.slug, commissionId: inBuild.id, caption: "x" };
    const one = [{ name: "a.jpg", size: 100, type: "image/jpeg" }];
    const bookkeeper = await askToUpload(s.bookkeeper, input, one);
    expect([bookkeeper.status, bookkeeper.body.message]).toEqual([403, "Only the commission's builder and the workshop's owner can add photos."]);
    const otherBuilder = await askToUpload(s.otherBuilder, input, one);
    expect([otherBuilder.status, otherBuilder.body.error.code]).toEqual([404, "not_found"]);
    const nobody = await askToUpload(null, input, one);
    expect([nobody.status, nobody.body.error.code]).toEqual([403, "unauthenticated"]);
    const fromB = await askToUpload(s.ownerB, input, one);
    expect([fromB.status, fromB.body.error]).toEqual([404, { code: "not_found", message: "No such workshop." }]);
    const underB = await askToUpload(s.ownerB, { ...input, workshop: b.slug }, one);
    expect([underB.status, underB.body.error]).toEqual([404, { code: "not_found", message: "No such commission." }]);
    expect(await addPhoto(s.owner, a, inBuild.id, fileOf(await jpegWithGps(200, 150, { seed: 4 }), "owner.jpg"))).toBeGreaterThan(0);
  });
});

describe("who can see a photo", () => {
  const paths = () => ({
    list: photosPath(a, inBuild.id),
    full: `${photosPath(a, inBuild.id)}/${photoId}/full`,
    thumb: `${photosPath(a, inBuild.id)}/${photoId}/thumb`,
  });

  it("gives a member of another workshop 404 for the photo under either workshop, and the store refuses its key without our signature", async () => {
    const row = await photoRow(photoId);
    for (const path of Object.values(paths())) {
      expect((await s.ownerB.fetch(path)).status).toBe(404);
      expect((await s.ownerB.fetch(path.replace(`/workshops/${a.slug}/`, `/workshops/${b.slug}/`))).status).toBe(404);
    }
    expect((await s.ownerB.fetch(`${photosPath(b, inBuild.id)}/${photoId}`, { method: "DELETE" })).status).toBe(404);
    for (const key of [row.file_key, row.thumb_key]) {
      expect((await fetch(fakeUrl(`/f/${key}`))).status).toBe(403); // private: only a URL signed with our key opens it
    }
    expect((await fetch(fakeUrl(`/f/${row.source_key}`))).status).toBe(404); // the original is deleted
    expect((await photoRow(photoId)).removed_at).toBeNull();
  });

  it("hides from the client the photos of a stage the owner has not signed off yet", async () => {
    const c = await createWorkshopWithMembers();
    const people = { owner: await signIn(c.owner), builder: await signIn(c.builder), client: await signIn(c.client), bookkeeper: await signIn(c.bookkeeper) };
    await testDb()("workshops").where({ id: c.id }).update({ require_stage_signoff: true });
    const k = await commissionInBuild(c, people);
    expect((await move(people.builder, c, k.id, "advance", "Neck carved")).status).toBe(200);
    const id = await addPhoto(people.builder, c, k.id, fileOf(await jpegWithGps(120, 90, { seed: 7 }), "carve.jpg"), "Neck carved");
    expect((await photoRow(id)).stage).toBe(DEFAULT_BUILD_STAGES[1]!.key);
    const seen = async () => (await people.client.json<{ stages: Array<{ photos: Array<{ id: number }> }> }>(photosPath(c, k.id))).body.stages.flatMap((g) => g.photos.map((p) => p.id));
    expect(await seen()).not.toContain(id);
    expect((await people.client.fetch(`${photosPath(c, k.id)}/${id}/full`)).status).toBe(404);
    const history = (await people.owner.json<{ history: Array<{ id: number; needsSignoff: boolean }> }>(`${base(c)}/${k.id}/transitions`)).body.history;
    expect((await people.owner.fetch(`${base(c)}/${k.id}/transitions/${history.find((h) => h.needsSignoff)!.id}/signoff`, { method: "POST" })).status).toBe(200);
    expect(await seen()).toContain(id);
  });
});

describe("removing a photo", () => {
  it("lets the owner remove a photo: recorded in the audit log, gone from the gallery, its files deleted", async () => {
    const id = await addPhoto(s.builder, a, inBuild.id, fileOf(await jpegWithGps(300, 200, { seed: 5 }), "blurred.jpg"), "Blurred, take again");
    const row = await photoRow(id);
    expect((await s.client.fetch(`${photosPath(a, inBuild.id)}/${id}`, { method: "DELETE" })).status).toBe(403);
    const r = await s.owner.json<{ removed: { id: number; stage: string } }>(`${photosPath(a, inBuild.id)}/${id}`, { method: "DELETE" });
    expect(r).toEqual({ status: 200, body: { removed: { id, stage: FIRST_STAGE.key } } });

    const audit = await testDb()("audit_log").where({ workshop_id: a.id, action: "photo.removed", entity_type: "photo", entity_id: String(id) }).first();
    expect(audit).toMatchObject({ actor_user_id: a.owner.userId });
    expect(audit.data).toMatchObject({ commissionId: inBuild.id, stage: FIRST_STAGE.key, caption: "Blurred, take again" });
    expect((await photoRow(id)).removed_at).not.toBeNull();

    const listed = (await s.client.json<{ stages: Array<{ photos: Array<{ id: number }> }> }>(photosPath(a, inBuild.id))).body.stages.flatMap((g) => g.photos.map((p) => p.id));
    expect(listed).not.toContain(id);
    expect((await s.client.fetch(`${photosPath(a, inBuild.id)}/${id}/full`)).status).toBe(404);
    const keys = (await fakeFiles()).map((f) => f.key);
    expect(keys).not.toContain(row.file_key);
    expect(keys).not.toContain(row.thumb_key);
    expect((await s.owner.fetch(`${photosPath(a, inBuild.id)}/${id}`, { method: "DELETE" })).status).toBe(404);
  });
});

describe("when the upload service is down", () => {
  it("the upload fails with an error and nothing half-made remains: no photo row, no stored file", async () => {
    await setFakeOutage("unavailable");
    let error: unknown;
    try {
      error = await uploadPhotos(s.builder, a, inBuild.id, [fileOf(await jpegWithGps(200, 150, { seed: 8 }), "outage-test.jpg")], "During the outage").then(
        () => null,
        (e: unknown) => e,
      );
    } finally {
      await setFakeOutage("none");
    }
    // The browser's PUT got the service's 503; the uploader turns this code into its own message.
    expect(error).toMatchObject({ name: "UploadThingError", code: "UPLOAD_FAILED" });
    expect(await testDb()("photos").where({ commission_id: inBuild.id, caption: "During the outage" }).first()).toBeUndefined();
    expect((await fakeFiles()).filter((f) => f.name.startsWith("outage-test"))).toEqual([]);
  });
});
