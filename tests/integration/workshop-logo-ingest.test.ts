// The logo's processing step and its removal when something goes wrong on the way: the real
// UploadThing server SDK against an in-process uploads fake we can break on purpose, and the real
// MariaDB. Whatever fails, the workshop keeps the logo it had and no file is left behind.
import { UTFile } from "uploadthing/server";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { resolveMemberAccess } from "@/lib/auth/workshop-access";
import { removeWorkshopLogo } from "@/lib/data/workshop-logo";
import { AppError } from "@/lib/http/errors";
import { ingestUploadedLogo } from "@/lib/photos/logo-flow";
import { createWorkshopWithMembers, type TestWorkshop } from "../http/fixtures";
import { closeTestDb, testDb } from "../setup/test-db";
import { plainPng } from "../support/photos";
import { useBreakableUploadsFake } from "./uploads-fake";

const uploads = useBreakableUploadsFake();
let ws: TestWorkshop;

beforeAll(async () => {
  ws = await createWorkshopWithMembers();
});
afterAll(closeTestDb);

let seq = 0;
async function storedOriginal(): Promise<{ key: string; name: string }> {
  const up = await uploads.utapi().uploadFiles(new UTFile([new Uint8Array(await plainPng(200, 80, ++seq))], "logo.png", { type: "image/png" }), { acl: "private" });
  if (!up.data) throw new Error(`could not store the original: ${JSON.stringify(up.error)}`);
  return { key: up.data.key, name: "logo.png" };
}

const storedKeys = () => uploads.storedKeys();
const logoKey = async () => ((await testDb()("workshops").where({ id: ws.id }).first("logo_file_key")) as { logo_file_key: string | null }).logo_file_key;
const owner = () => ({ slug: ws.slug, userId: ws.owner.userId });

describe("processing an uploaded logo", () => {
  it("keeps one PNG and points the workshop at it", async () => {
    const file = await storedOriginal();
    expect(await ingestUploadedLogo(owner(), file)).toEqual({ ok: true, width: 200, height: 80 });
    const key = await logoKey();
    expect(storedKeys()).toEqual([key]);
  });

  it("keeps the logo it had when the service fails while the new one is stored", async () => {
    const before = await logoKey();
    const file = await storedOriginal();
    const write = uploads.fake.ctx.bytes.write.bind(uploads.fake.ctx.bytes);
    uploads.fake.ctx.bytes.write = () => {
      throw new Error("disk full (test)");
    };
    try {
      expect(await ingestUploadedLogo(owner(), file)).toMatchObject({ ok: false, code: "unavailable" });
    } finally {
      uploads.fake.ctx.bytes.write = write;
    }
    expect(await logoKey()).toBe(before);
    expect(storedKeys()).toEqual([before]); // the upload is deleted, the logo in use stays
  });

  it("refuses and cleans up when the owner was made a builder before the callback", async () => {
    const before = await logoKey();
    const file = await storedOriginal();
    await testDb()("memberships").where({ id: ws.owner.membershipId }).update({ role: "builder" });
    try {
      expect(await ingestUploadedLogo(owner(), file)).toEqual({ ok: false, code: "forbidden", message: "Only the workshop's owner changes its logo." });
    } finally {
      await testDb()("memberships").where({ id: ws.owner.membershipId }).update({ role: "owner" });
    }
    expect(await logoKey()).toBe(before);
    expect(storedKeys()).toEqual([before]);
  });
});

describe("removing the logo", () => {
  it("changes nothing when the service cannot delete the file, then removes it with an audit entry", async () => {
    const key = await logoKey();
    const { scope } = await resolveMemberAccess(ws.owner.userId, ws.slug);
    const down = async () => {
      throw new AppError("unavailable", "The photo store is not reachable right now.");
    };
    await expect(removeWorkshopLogo(scope, down)).rejects.toMatchObject({ code: "unavailable" });
    expect(await logoKey()).toBe(key);

    await removeWorkshopLogo(scope, (keys) => uploads.utapi().deleteFiles(keys).then(() => undefined));
    expect(await logoKey()).toBeNull();
    expect(storedKeys()).toEqual([]);
    expect(await testDb()("audit_log").where({ workshop_id: ws.id, action: "workshop.logo_removed" })).toHaveLength(1);
    await expect(removeWorkshopLogo(scope, down)).rejects.toMatchObject({ code: "not_found" });
  });

  it("is the owner's alone", async () => {
    const { scope } = await resolveMemberAccess(ws.builder.userId, ws.slug);
    await expect(removeWorkshopLogo(scope, async () => undefined)).rejects.toMatchObject({ code: "forbidden" });
  });
});
