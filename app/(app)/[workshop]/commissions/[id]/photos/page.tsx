import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { StagePhotos } from "@/components/photos/stage-photos";
import { Alert } from "@/components/ui/alert";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { requireWorkshopPage } from "@/lib/auth/pages";
import { getCommissionSummary } from "@/lib/data/commissions";
import { checkPhotoUpload } from "@/lib/data/photos";
import { AppError } from "@/lib/http/errors";
import { MAX_PHOTO_BYTES, MAX_PHOTOS_PER_UPLOAD, formatBytes } from "@/lib/photos/rules";
import { idParamSchema } from "@/lib/schemas/ids";
import { removePhotoAction } from "./actions";
import { PhotoUploadForm } from "./photo-upload-form";

export const metadata: Metadata = { title: "Photos" };

/** Where new photos would be filed, or why the caller cannot add any now; 404 stays a 404. */
async function uploadState(...args: Parameters<typeof checkPhotoUpload>): Promise<{ stageLabel: string } | { blocker: string }> {
  try {
    return await checkPhotoUpload(...args);
  } catch (err) {
    if (err instanceof AppError && (err.code === "forbidden" || err.code === "conflict")) return { blocker: err.message };
    throw err;
  }
}

// The commission's photos by stage, for everyone who can see the commission; the builder and the
// owner add stage photos here, the client reference pictures while the spec is open. The header and
// tabs come from the commission's layout.
export default async function CommissionPhotosPage({ params }: { params: Promise<{ workshop: string; id: string }> }) {
  const { workshop: slug, id } = await params;
  const ctx = await requireWorkshopPage(slug, "photo.read", `/${slug}/commissions/${id}/photos`);
  const commissionId = idParamSchema.safeParse(id);
  if (!commissionId.success) notFound();

  let commission;
  try {
    commission = await getCommissionSummary(ctx.scope, commissionId.data);
  } catch (err) {
    if (err instanceof AppError && err.code === "not_found") notFound();
    throw err;
  }
  const mayTry = ctx.can(["photo.upload", "photo.reference"]);
  const upload = mayTry ? await uploadState(ctx.scope, commission.id) : null;
  const reference = !ctx.can("photo.upload");

  return (
    <div className="space-y-6">
      {upload && "stageLabel" in upload ? (
        <Card>
          <CardHeader
            title={reference ? "Add reference pictures" : "Add stage photos"}
            subtitle={`Filed under “${upload.stageLabel}”. Up to ${MAX_PHOTOS_PER_UPLOAD} photos of at most ${formatBytes(MAX_PHOTO_BYTES)} each (JPEG, PNG, WebP or AVIF). Location and camera data are removed before anyone sees them.`}
          />
          <CardBody>
            <PhotoUploadForm slug={slug} commissionId={commission.id} stageLabel={upload.stageLabel} />
          </CardBody>
        </Card>
      ) : upload ? (
        <Alert tone="info">{upload.blocker}</Alert>
      ) : null}

      <Card>
        <CardHeader title="Gallery" subtitle="By stage, oldest first. Open a photo for the full size." />
        <CardBody>
          <StagePhotos ctx={ctx} commissionId={commission.id} removeAction={ctx.can("photo.remove") ? removePhotoAction : undefined} />
        </CardBody>
      </Card>
    </div>
  );
}
