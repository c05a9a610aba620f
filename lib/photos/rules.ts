// The rules of stage photos, pure (no React, no database, no SDK): limits, who may add a photo at
// which stage, which stage a photo is filed under, and which stages a client may see.
import { CANCELLED, ON_HOLD, SPEC } from "@/lib/workflow/stages";

/** Per photo, as uploaded (UploadThing's "8MB" is 8 × 1024² bytes). */
export const MAX_PHOTO_BYTES = 8 * 1024 * 1024;
/** Photos per upload. */
export const MAX_PHOTOS_PER_UPLOAD = 6;
/** Decoded size limit: bigger images are refused before they are decoded in full. */
export const MAX_PHOTO_PIXELS = 100_000_000;
/** Formats we decode, by what the bytes say (sharp's `format`), not by the file's name. */
export const ACCEPTED_FORMATS = ["jpeg", "png", "webp", "avif"] as const;
export const ACCEPTED_MIME_TYPES = ["image/jpeg", "image/png", "image/webp", "image/avif"] as const;
/** Longest edge of the version we serve, and of the thumbnail. */
export const DISPLAY_EDGE_PX = 2560;
export const THUMB_EDGE_PX = 480;
/** The workshop logo: one image of at most 2 MB (UploadThing's "2MB"), kept at most 512 px on its long side. */
export const MAX_LOGO_BYTES = 2 * 1024 * 1024;
export const LOGO_EDGE_PX = 512;

export function formatBytes(bytes: number): string {
  if (bytes < 1024) return `${bytes} bytes`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(0)} KB`;
  return `${(bytes / (1024 * 1024)).toFixed(1).replace(/\.0$/, "")} MB`;
}

export interface ClaimedFile {
  name: string;
  size: number;
  type: string;
}

/** What one upload route takes: how many files, how big, and what a person calls one of them. */
export interface UploadLimits {
  maxFiles: number;
  maxBytes: number;
  /** "photo"; "image" for the logo. */
  noun: string;
}

export const PHOTO_UPLOAD_LIMITS: UploadLimits = { maxFiles: MAX_PHOTOS_PER_UPLOAD, maxBytes: MAX_PHOTO_BYTES, noun: "photo" };
export const LOGO_UPLOAD_LIMITS: UploadLimits = { maxFiles: 1, maxBytes: MAX_LOGO_BYTES, noun: "image" };

/** What is wrong with a batch as the browser describes it (names, sizes, types), or null. */
export function uploadBatchProblem(files: readonly ClaimedFile[], limits: UploadLimits = PHOTO_UPLOAD_LIMITS): { path: string; message: string } | null {
  const { maxFiles, maxBytes, noun } = limits;
  if (files.length === 0) return { path: "files", message: `Choose ${maxFiles === 1 ? "an" : "at least one"} ${noun}.` };
  if (files.length > maxFiles) {
    const message = maxFiles === 1 ? `Choose one ${noun} (you chose ${files.length}).` : `At most ${maxFiles} ${noun}s per upload (you chose ${files.length}).`;
    return { path: "files", message };
  }
  for (const [i, f] of files.entries()) {
    if (f.size > maxBytes) {
      return { path: `files.${i}`, message: `${f.name} is ${formatBytes(f.size)}; ${maxFiles === 1 ? `the ${noun}` : `each ${noun}`} may be at most ${formatBytes(maxBytes)}.` };
    }
    if (f.size === 0) return { path: `files.${i}`, message: `${f.name} is empty.` };
    if (!(ACCEPTED_MIME_TYPES as readonly string[]).includes(f.type)) {
      return { path: `files.${i}`, message: `${f.name} is not a JPEG, PNG, WebP or AVIF ${noun}.` };
    }
  }
  return null;
}

export interface UploadRights {
  /** Holds photo.upload (the owner; a builder, who only sees the commissions assigned to them). */
  upload: boolean;
  /** Holds photo.reference (a client: reference pictures while the spec is agreed). */
  reference: boolean;
}

/** Why this person may not add photos to a commission in `stage` now, or null when they may. */
export function uploadRefusal(rights: UploadRights, stage: string, stageLabel: string): { kind: "forbidden" | "conflict"; message: string } | null {
  if (stage === CANCELLED) return { kind: "conflict", message: "This commission is cancelled: no more photos can be added." };
  if (rights.upload) return null;
  if (rights.reference) {
    if (stage === SPEC) return null;
    return {
      kind: "forbidden",
      message: `Clients can add reference pictures only while the spec is being agreed; this commission is now at “${stageLabel}”.`,
    };
  }
  return { kind: "forbidden", message: "Only the commission's builder and the workshop's owner can add photos." };
}

/** The stage a new photo is filed under: the commission's stage, or the one it was held at. */
export function photoStageFor(stage: string, heldFrom: string | null): string {
  return stage === ON_HOLD && heldFrom ? heldFrom : stage;
}

/**
 * Whether a client sees photos filed under `photoStage`: those up to the stage they have been told
 * of (a move that waits for the owner's sign-off is not shown to them, nor are its photos).
 */
export function clientSeesStage(photoStage: string, clientStage: string, heldFrom: string | null, line: readonly string[]): boolean {
  const told = line.indexOf(photoStageFor(clientStage, heldFrom));
  if (told < 0) return true; // cancelled, or a stage no longer in the template: nothing is held back
  const at = line.indexOf(photoStage);
  return at < 0 || at <= told;
}
