// The rules of stage photos. Limits and who-may-upload are product rules (issue 6; no outside
// source); the byte count of "8MB" is checked against UploadThing's own size formatter (the SDK
// reads the route's "8MB" in the same 1024-based units).
import { bytesToFileSize } from "@uploadthing/shared";
import { describe, expect, it } from "vitest";
import { can, ROLES } from "@/lib/auth/permissions";
import { clientSeesStage, MAX_PHOTO_BYTES, MAX_PHOTOS_PER_UPLOAD, photoStageFor, uploadBatchProblem, uploadRefusal } from "@/lib/photos/rules";
import { DEFAULT_BUILD_STAGES, stageLine } from "@/lib/workflow/stages";

const jpeg = (name: string, size = 1000) => ({ name, size, type: "image/jpeg" });
const rightsOf = (role: (typeof ROLES)[number]) => ({ upload: can(role, "photo.upload"), reference: can(role, "photo.reference") });
const line = stageLine(DEFAULT_BUILD_STAGES);

describe("photo limits", () => {
  it("counts 8 MB the way UploadThing does (@uploadthing/shared bytesToFileSize, 1024-based)", () => {
    expect(bytesToFileSize(MAX_PHOTO_BYTES)).toBe("8.00MB");
    expect(bytesToFileSize(MAX_PHOTO_BYTES - 1024 * 1024)).toBe("7.00MB");
  });

  it("accepts up to the count and size limits and names the file that is too big", () => {
    expect(uploadBatchProblem([jpeg("a.jpg", MAX_PHOTO_BYTES)])).toBeNull();
    expect(uploadBatchProblem(Array.from({ length: MAX_PHOTOS_PER_UPLOAD }, (_, i) => jpeg(`${i}.jpg`)))).toBeNull();
    expect(uploadBatchProblem([jpeg("a.jpg"), jpeg("body.jpg", MAX_PHOTO_BYTES + 1)])).toEqual({
      path: "files.1",
      message: "body.jpg is 8 MB; each photo may be at most 8 MB.",
    });
    expect(uploadBatchProblem([jpeg("big.jpg", 9 * 1024 * 1024)])?.message).toBe("big.jpg is 9 MB; each photo may be at most 8 MB.");
  });

  it("refuses an empty batch, too many photos, empty files and types that are not photos", () => {
    expect(uploadBatchProblem([])?.path).toBe("files");
    expect(uploadBatchProblem(Array.from({ length: MAX_PHOTOS_PER_UPLOAD + 1 }, (_, i) => jpeg(`${i}.jpg`)))?.message).toBe(
      `At most ${MAX_PHOTOS_PER_UPLOAD} photos per upload (you chose ${MAX_PHOTOS_PER_UPLOAD + 1}).`,
    );
    expect(uploadBatchProblem([jpeg("zero.jpg", 0)])?.message).toBe("zero.jpg is empty.");
    expect(uploadBatchProblem([{ name: "notes.pdf", size: 10, type: "application/pdf" }])?.message).toMatch(/not a JPEG, PNG, WebP or AVIF/);
  });
});

describe("who may add photos", () => {
  it("lets the owner and the builder add photos at any stage but a cancelled one", () => {
    for (const role of ["owner", "builder"] as const) {
      for (const stage of [...line, "on_hold"]) expect(uploadRefusal(rightsOf(role), stage, stage), `${role} ${stage}`).toBeNull();
      expect(uploadRefusal(rightsOf(role), "cancelled", "Cancelled")?.kind).toBe("conflict");
    }
  });

  it("lets a client add reference pictures in the spec stage only, saying why later", () => {
    expect(uploadRefusal(rightsOf("client"), "spec", "Spec")).toBeNull();
    const later = uploadRefusal(rightsOf("client"), "timber", "Timber selection");
    expect(later).toEqual({ kind: "forbidden", message: "Clients can add reference pictures only while the spec is being agreed; this commission is now at “Timber selection”." });
  });

  it("never lets the bookkeeper add photos", () => {
    expect(uploadRefusal(rightsOf("bookkeeper"), "spec", "Spec")?.message).toBe("Only the commission's builder and the workshop's owner can add photos.");
  });
});

describe("stages of photos", () => {
  it("files a photo under the stage a held commission waits at", () => {
    expect(photoStageFor("on_hold", "finish")).toBe("finish");
    expect(photoStageFor("timber", null)).toBe("timber");
  });

  it("shows a client the stages up to the one they were told of, not a move awaiting sign-off", () => {
    expect(clientSeesStage("spec", "timber", null, line)).toBe(true);
    expect(clientSeesStage("timber", "timber", null, line)).toBe(true);
    expect(clientSeesStage("body_neck_shaping", "timber", null, line)).toBe(false);
    expect(clientSeesStage("finish", "on_hold", "finish", line)).toBe(true);
    expect(clientSeesStage("final_setup", "on_hold", "finish", line)).toBe(false);
    expect(clientSeesStage("final_setup", "cancelled", null, line)).toBe(true);
    expect(clientSeesStage("a_stage_since_removed", "timber", null, line)).toBe(true);
  });
});
