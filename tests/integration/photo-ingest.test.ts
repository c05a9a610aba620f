// What happens to an upload after its bytes are in, when something goes wrong on the way: the
// processing step (lib/photos/upload-flow.ts) with the real UploadThing server SDK against an
// in-process uploads fake we can break on purpose, and the real MariaDB. Whatever fails, no photo
// row is left without its files and no file is left without its row.
import { UTFile } from "uploadthing/server";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ingestUploadedPhoto, type PhotoUploadMetadata } from "@/lib/photos/upload-flow";
import { createWorkshopWithMembers, type TestMember, type TestWorkshop } from "../http/fixtures";
import { closeTestDb, testDb } from "../setup/test-db";
import { jpegWithGps } from "../support/photos";
import { useBreakableUploadsFake } from "./uploads-fake";

const uploads = useBreakableUploadsFake();
let ws: TestWorkshop;

beforeAll(async () => {
  ws = await createWorkshopWithMembers();
});
afterAll(closeTestDb);

let seq = 0;
async function commission(stage: string): Promise<number> {
  const [id] = await testDb()("commissions").insert({
    workshop_id: ws.id,
    number: `T-${++seq}-${Date.now() % 100000}`,
    client_user_id: ws.client.userId,
    builder_user_id: ws.builder.userId,
    title: `Ingest test ${seq}`,
    currency: "EUR",
    deposit_percent: 30,
    stage,
    client_stage: stage,
  });
  return Number(id);
}

/** An original as the browser would have put it at the service: private, with GPS in its EXIF. */
async function storedOriginal(name = "original.jpg"): Promise<{ key: string; name: string; size: number }> {
  const bytes = await jpegWithGps(400, 300, { seed: ++seq });
  const up = await uploads.utapi().uploadFiles(new UTFile([new Uint8Array(bytes)], name, { type: "image/jpeg" }), { acl: "private" });
  if (!up.data) throw new Error(`could not store the original: ${JSON.stringify(up.error)}`);
  return { key: up.data.key, name, size: bytes.length };
}

const meta = (who: TestMember, commissionId: number): PhotoUploadMetadata => ({ slug: ws.slug, userId: who.userId, commissionId, caption: "Ingest test" });
const storedKeys = () => uploads.storedKeys();
const rowsFor = (commissionId: number) => testDb()("photos").where({ commission_id: commissionId }).select("id", "source_key", "file_key", "thumb_key");

describe("processing an uploaded photo", () => {
  it("stores two stripped versions, deletes the original and writes one row", async () => {
    const c = await commission("timber");
    const file = await storedOriginal();
    const result = await ingestUploadedPhoto(meta(ws.builder, c), file);
    expect(result).toEqual({ ok: true, photoId: expect.any(Number), stage: "timber" });
    const [row] = await rowsFor(c);
    expect(storedKeys().sort()).toEqual([row.file_key, row.thumb_key].sort());
    expect(storedKeys()).not.toContain(file.key);
    await uploads.utapi().deleteFiles(storedKeys());
  });

  it("treats a second callback for the same upload as the first: one row", async () => {
    const c = await commission("timber");
    const file = await storedOriginal();
    const first = await ingestUploadedPhoto(meta(ws.builder, c), file);
    const again = await ingestUploadedPhoto(meta(ws.builder, c), file);
    expect(again).toEqual(first);
    expect(await rowsFor(c)).toHaveLength(1);
    await uploads.utapi().deleteFiles(storedKeys());
  });

  it("leaves nothing behind when the service fails while the versions are being stored", async () => {
    const c = await commission("timber");
    const file = await storedOriginal();
    const write = uploads.fake.ctx.bytes.write.bind(uploads.fake.ctx.bytes);
    let writes = 0;
    uploads.fake.ctx.bytes.write = (key, bytes, append) => {
      if (++writes === 2) throw new Error("disk full (test)"); // the second version fails, the first got in
      write(key, bytes, append);
    };
    try {
      const result = await ingestUploadedPhoto(meta(ws.builder, c), file);
      expect(result).toEqual({ ok: false, code: "unavailable", message: "The photo store is not reachable right now. Nothing was saved; try again in a moment." });
    } finally {
      uploads.fake.ctx.bytes.write = write;
    }
    expect(writes).toBe(2);
    expect(await rowsFor(c)).toEqual([]);
    expect(storedKeys()).toEqual([]); // the version that got in and the original are both deleted
  });

  it("deletes what it stored when the row is refused at the end (a client, once the spec stage is over)", async () => {
    const c = await commission("timber");
    const file = await storedOriginal();
    const result = await ingestUploadedPhoto(meta(ws.client, c), file);
    expect(result).toMatchObject({ ok: false, code: "forbidden", message: expect.stringMatching(/only while the spec is being agreed/) });
    expect(await rowsFor(c)).toEqual([]);
    expect(storedKeys()).toEqual([]);
  });

  it("refuses and cleans up when the uploader left the workshop before the callback", async () => {
    const c = await commission("timber");
    const file = await storedOriginal();
    const gone = (await createWorkshopWithMembers()).builder; // a member of another workshop only
    const result = await ingestUploadedPhoto(meta(gone, c), file);
    expect(result).toMatchObject({ ok: false, code: "not_found" });
    expect(await rowsFor(c)).toEqual([]);
    expect(storedKeys()).toEqual([]);
  });

  it("refuses bytes that are not an image, deleting the upload", async () => {
    const c = await commission("timber");
    const up = await uploads.utapi().uploadFiles(new UTFile([new TextEncoder().encode("not a photo")], "pickup.jpg", { type: "image/jpeg" }), { acl: "private" });
    const result = await ingestUploadedPhoto(meta(ws.builder, c), { key: up.data!.key, name: "pickup.jpg", size: 11 });
    expect(result).toMatchObject({ ok: false, code: "validation_failed" });
    expect(storedKeys()).toEqual([]);
  });
});
