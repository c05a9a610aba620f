// Stage photos: who may add one now, storing it, listing a commission's photos by stage, the file
// behind one photo, and removal. Every query starts from the commission the caller may see
// (commission-access.ts), so another workshop's photo, or another client's, is a 404.
import { can } from "@/lib/auth/permissions";
import type { WorkshopScope } from "@/lib/auth/scope";
import { AppError, forbidden, notFound } from "@/lib/http/errors";
import { clientSeesStage, photoStageFor, uploadRefusal } from "@/lib/photos/rules";
import type { PhotoOut, PhotoStageGroup, PhotoVariant } from "@/lib/schemas/photo";
import { stageLabel, stageLine } from "@/lib/workflow/stages";
import { writeAudit } from "./audit";
import { getVisibleCommissionRow, type CommissionRow } from "./commission-access";
import { inTransaction, iso, type Trx } from "./transaction";
import { getWorkshopSettings, type WorkshopSettings } from "./workshop-settings";

/** A processed photo whose files are stored, ready for its row. */
export interface NewPhoto {
  sourceKey: string;
  originalName: string;
  originalBytes: number;
  fileKey: string;
  fileBytes: number;
  thumbKey: string;
  thumbBytes: number;
  contentType: string;
  width: number;
  height: number;
  thumbWidth: number;
  thumbHeight: number;
  caption: string;
}

interface PhotoRow {
  id: number;
  commission_id: number;
  stage: string;
  caption: string;
  uploaded_by: number;
  uploader_name: string;
  file_key: string;
  file_bytes: number;
  thumb_key: string;
  thumb_bytes: number;
  content_type: string;
  width: number;
  height: number;
  thumb_width: number;
  thumb_height: number;
  created_at: Date;
}

const NO_SUCH_PHOTO = "No such photo.";

function refuseUnlessAllowed(scope: WorkshopScope, row: CommissionRow, settings: WorkshopSettings): void {
  const rights = { upload: can(scope.role, "photo.upload"), reference: can(scope.role, "photo.reference") };
  const refusal = uploadRefusal(rights, row.stage, stageLabel(row.stage, settings.buildStages));
  if (refusal) throw refusal.kind === "conflict" ? new AppError("conflict", refusal.message) : forbidden(refusal.message);
}

/**
 * Whether the caller may add photos to this commission now (404 when they cannot see it, 403/409
 * with the reason otherwise); the stage a photo would be filed under.
 */
export async function checkPhotoUpload(scope: WorkshopScope, commissionId: number, trx?: Trx): Promise<{ stage: string; stageLabel: string }> {
  const row = await getVisibleCommissionRow(scope, commissionId, { trx, forUpdate: !!trx });
  const settings = await getWorkshopSettings(scope, trx);
  refuseUnlessAllowed(scope, row, settings);
  const stage = photoStageFor(row.stage, row.held_from);
  return { stage, stageLabel: stageLabel(stage, settings.buildStages) };
}

/** The photo already stored from this upload, if its callback came twice. */
export async function findPhotoBySourceKey(scope: WorkshopScope, commissionId: number, sourceKey: string): Promise<{ id: number; stage: string } | null> {
  return inTransaction(async (trx) => {
    await getVisibleCommissionRow(scope, commissionId, { trx });
    const row = await trx("photos").where({ workshop_id: scope.workshopId, commission_id: commissionId, source_key: sourceKey }).first("id", "stage");
    return row ? { id: Number(row.id), stage: row.stage } : null;
  });
}

/**
 * Stores the row of a photo whose files are in place, filed under the commission's stage now.
 * The caller's right to add it is checked again in the same transaction (the stage may have moved
 * since the upload began).
 */
export async function addPhoto(scope: WorkshopScope, commissionId: number, p: NewPhoto): Promise<{ id: number; stage: string }> {
  return inTransaction(async (trx) => {
    const { stage } = await checkPhotoUpload(scope, commissionId, trx);
    const [id] = await trx("photos").insert({
      workshop_id: scope.workshopId,
      commission_id: commissionId,
      stage,
      caption: p.caption,
      uploaded_by: scope.userId,
      source_key: p.sourceKey,
      original_name: p.originalName.slice(0, 255),
      original_bytes: p.originalBytes,
      file_key: p.fileKey,
      file_bytes: p.fileBytes,
      thumb_key: p.thumbKey,
      thumb_bytes: p.thumbBytes,
      content_type: p.contentType,
      width: p.width,
      height: p.height,
      thumb_width: p.thumbWidth,
      thumb_height: p.thumbHeight,
    });
    await writeAudit(trx, {
      workshopId: scope.workshopId,
      actorUserId: scope.userId,
      action: "photo.added",
      entityType: "photo",
      entityId: Number(id),
      data: { commissionId, stage },
    });
    return { id: Number(id), stage };
  });
}

function photoQuery(trx: Trx, scope: WorkshopScope, commissionId: number) {
  return trx("photos as p")
    .join("users as u", "u.id", "p.uploaded_by")
    .where({ "p.workshop_id": scope.workshopId, "p.commission_id": commissionId })
    .whereNull("p.removed_at");
}

/** A client sees only the stages they have been told of; everyone else every stage. */
function stageFilter(scope: WorkshopScope, row: CommissionRow, line: readonly string[]) {
  return (stage: string) => scope.role !== "client" || clientSeesStage(stage, row.client_stage, row.held_from, line);
}

function toPhotoOut(r: PhotoRow, settings: WorkshopSettings): PhotoOut {
  return {
    id: Number(r.id),
    commissionId: Number(r.commission_id),
    stage: r.stage,
    stageLabel: stageLabel(r.stage, settings.buildStages),
    caption: r.caption,
    uploadedBy: { id: Number(r.uploaded_by), name: r.uploader_name },
    width: r.width,
    height: r.height,
    thumbWidth: r.thumb_width,
    thumbHeight: r.thumb_height,
    bytes: r.file_bytes,
    createdAt: iso(r.created_at),
  };
}

/** The commission's photos the caller may see, grouped by stage in the order of the stage line. */
export async function listCommissionPhotos(scope: WorkshopScope, commissionId: number): Promise<PhotoStageGroup[]> {
  return inTransaction(async (trx) => {
    const row = await getVisibleCommissionRow(scope, commissionId, { trx });
    const settings = await getWorkshopSettings(scope, trx);
    const line = stageLine(settings.buildStages);
    const sees = stageFilter(scope, row, line);
    const rows = (await photoQuery(trx, scope, commissionId).orderBy("p.created_at", "asc").orderBy("p.id", "asc").select("p.*", "u.name as uploader_name")) as PhotoRow[];
    const groups = new Map<string, PhotoStageGroup>();
    for (const r of rows.filter((x) => sees(x.stage))) {
      const g = groups.get(r.stage) ?? { stage: r.stage, label: stageLabel(r.stage, settings.buildStages), photos: [] };
      g.photos.push(toPhotoOut(r, settings));
      groups.set(r.stage, g);
    }
    // Stages of the line first, in order; a stage since dropped from the template last.
    const order = (stage: string) => (line.includes(stage) ? line.indexOf(stage) : line.length);
    return [...groups.values()].sort((a, b) => order(a.stage) - order(b.stage));
  });
}

/** The stored file behind one photo the caller may see (404 for anything else). */
export async function getPhotoFile(
  scope: WorkshopScope,
  commissionId: number,
  photoId: number,
  variant: PhotoVariant,
): Promise<{ key: string; contentType: string; bytes: number }> {
  return inTransaction(async (trx) => {
    const row = await getVisibleCommissionRow(scope, commissionId, { trx });
    const photo = (await photoQuery(trx, scope, commissionId).where("p.id", photoId).first("p.*", "u.name as uploader_name")) as PhotoRow | undefined;
    if (!photo) throw notFound(NO_SUCH_PHOTO);
    const settings = await getWorkshopSettings(scope, trx);
    if (!stageFilter(scope, row, stageLine(settings.buildStages))(photo.stage)) throw notFound(NO_SUCH_PHOTO);
    return variant === "thumb"
      ? { key: photo.thumb_key, contentType: photo.content_type, bytes: photo.thumb_bytes }
      : { key: photo.file_key, contentType: photo.content_type, bytes: photo.file_bytes };
  });
}

/**
 * Removes a photo: marks the row removed with an audit entry and, in the same transaction, deletes
 * its files at the upload service through `deleteFiles` — if that fails, nothing changes.
 */
export async function removePhoto(
  scope: WorkshopScope,
  commissionId: number,
  photoId: number,
  deleteFiles: (keys: string[]) => Promise<void>,
): Promise<{ id: number; stage: string }> {
  return inTransaction(async (trx) => {
    await getVisibleCommissionRow(scope, commissionId, { trx });
    const photo = await trx("photos")
      .where({ id: photoId, workshop_id: scope.workshopId, commission_id: commissionId })
      .whereNull("removed_at")
      .forUpdate()
      .first("id", "stage", "caption", "file_key", "thumb_key", "uploaded_by");
    if (!photo) throw notFound(NO_SUCH_PHOTO);
    await trx("photos").where({ id: photoId, workshop_id: scope.workshopId }).update({ removed_at: trx.raw("CURRENT_TIMESTAMP(3)"), removed_by: scope.userId });
    await writeAudit(trx, {
      workshopId: scope.workshopId,
      actorUserId: scope.userId,
      action: "photo.removed",
      entityType: "photo",
      entityId: photoId,
      data: { commissionId, stage: photo.stage, caption: photo.caption, uploadedBy: photo.uploaded_by },
    });
    await deleteFiles([photo.file_key, photo.thumb_key]);
    return { id: photoId, stage: photo.stage };
  });
}
