// The workshop's logo: one private file at the upload service (made by lib/photos/logo-flow.ts),
// its key in `workshops.logo_file_key`. Members see it in the workshop's header through the
// authorised logo route; the build sheet prints it top right.
import { createHash } from "node:crypto";
import { db } from "@/db/knex";
import { can } from "@/lib/auth/permissions";
import type { WorkshopScope } from "@/lib/auth/scope";
import { AppError, forbidden, notFound } from "@/lib/http/errors";
import { MAX_LOGO_BYTES } from "@/lib/photos/rules";
import { readStoredFile } from "@/lib/photos/store";
import type { PrintLogo } from "@/lib/printing/build-sheet-pdf";
import { writeAudit } from "./audit";
import { inTransaction, type Trx } from "./transaction";

const NO_LOGO = "This workshop has no logo.";

async function logoKey(scope: WorkshopScope, trx?: Trx): Promise<string | null> {
  const q = (trx ?? db)("workshops").where({ id: scope.workshopId });
  if (trx) q.forUpdate();
  const row = (await q.first("logo_file_key")) as { logo_file_key: string | null } | undefined;
  return row?.logo_file_key ?? null;
}

/** A short tag that changes with the logo, for the URL (so browsers fetch a new logo at once); never the store key. */
export function logoVersion(key: string): string {
  return createHash("sha256").update(key).digest("hex").slice(0, 12);
}

/** Where members' browsers load the logo from, or null when there is none. */
export function workshopLogoPath(slug: string, key: string | null): string | null {
  return key ? `/api/workshops/${encodeURIComponent(slug)}/logo?v=${logoVersion(key)}` : null;
}

/** The logo's address for the workshop's header and settings (null: no logo yet). */
export async function getWorkshopLogoPath(scope: WorkshopScope, slug: string): Promise<string | null> {
  return workshopLogoPath(slug, await logoKey(scope));
}

/** The store key of the logo, for the route that streams it to a member (404 when there is none). */
export async function getWorkshopLogoFile(scope: WorkshopScope): Promise<{ key: string; contentType: "image/png" }> {
  const key = await logoKey(scope);
  if (!key) throw notFound(NO_LOGO);
  return { key, contentType: "image/png" };
}

function mayManage(scope: WorkshopScope) {
  if (!can(scope.role, "settings.manage")) throw forbidden("Only the owner changes the workshop's logo.");
}

/**
 * Puts a stored logo file in place (owner only), with an audit entry; answers the key of the logo
 * it replaces, whose file the caller deletes once this has committed.
 */
export async function setWorkshopLogo(scope: WorkshopScope, key: string, info: { width: number; height: number; bytes: number }): Promise<{ previousKey: string | null }> {
  mayManage(scope);
  return inTransaction(async (trx) => {
    const previousKey = await logoKey(scope, trx);
    await trx("workshops").where({ id: scope.workshopId }).update({ logo_file_key: key });
    await writeAudit(trx, { workshopId: scope.workshopId, actorUserId: scope.userId, action: "workshop.logo_changed", entityType: "workshop", entityId: scope.workshopId, data: { replaced: previousKey !== null, ...info } });
    return { previousKey };
  });
}

/**
 * Removes the logo (owner only): the column is cleared and the file deleted in the same
 * transaction, so if the upload service cannot be reached nothing changes.
 */
export async function removeWorkshopLogo(scope: WorkshopScope, deleteFiles: (keys: string[]) => Promise<void>): Promise<void> {
  mayManage(scope);
  await inTransaction(async (trx) => {
    const key = await logoKey(scope, trx);
    if (!key) throw notFound(NO_LOGO);
    await trx("workshops").where({ id: scope.workshopId }).update({ logo_file_key: null });
    await writeAudit(trx, { workshopId: scope.workshopId, actorUserId: scope.userId, action: "workshop.logo_removed", entityType: "workshop", entityId: scope.workshopId });
    await deleteFiles([key]);
  });
}

/** PNG or JPEG by the file's first bytes (PNG signature, ISO/IEC 15948; JPEG SOI marker FF D8 FF). */
function printFormat(bytes: Uint8Array): PrintLogo["format"] | null {
  const png = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];
  if (png.every((b, i) => bytes[i] === b)) return "png";
  if (bytes[0] === 0xff && bytes[1] === 0xd8 && bytes[2] === 0xff) return "jpeg";
  return null;
}

/**
 * The logo's bytes for the build sheet's masthead, or null when there is none. A logo the upload
 * service cannot hand over right now is left off (and logged) rather than refusing the printout.
 */
export async function getWorkshopLogoForPrint(scope: WorkshopScope): Promise<PrintLogo | null> {
  const key = await logoKey(scope);
  if (!key) return null;
  try {
    const bytes = new Uint8Array(await readStoredFile(key, MAX_LOGO_BYTES));
    const format = printFormat(bytes);
    return format ? { bytes, format } : null;
  } catch (err) {
    if (err instanceof AppError && (err.code === "unavailable" || err.code === "not_found")) {
      console.error("[logo] printing without the logo:", err.message);
      return null;
    }
    throw err;
  }
}
