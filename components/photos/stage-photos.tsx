// A commission's photos grouped by stage, for any page that has the caller's workshop context: the
// full gallery (the photos page) and compact strips per stage (the overview's timeline). Server
// components: they read the photos the caller may see and link each to the authorised image route.
import Link from "next/link";
import type { ReactNode } from "react";
import type { ActionResult } from "@/lib/auth/actions";
import type { WorkshopContext } from "@/lib/auth/workshop-access";
import { listCommissionPhotos } from "@/lib/data/photos";
import { photoFileUrl } from "@/lib/photos/urls";
import type { PhotoOut, PhotoStageGroup } from "@/lib/schemas/photo";
import { RemovePhotoButton } from "./remove-photo-button";

export type RemovePhotoAction = (slug: string, input: { commissionId: number; photoId: number }) => Promise<ActionResult<unknown>>;

const taken = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });

function PhotoFigure({ slug, photo, removeAction }: { slug: string; photo: PhotoOut; removeAction?: RemovePhotoAction }) {
  return (
    <li className="min-w-0">
      <figure className="overflow-hidden rounded-panel border border-spruce-200 bg-white shadow-panel">
        <a href={photoFileUrl(slug, photo, "full")} target="_blank" rel="noopener" className="block bg-spruce-100">
          {/* A plain img: the bytes come from our authorised route, which image optimisation would bypass. */}
          <img
            src={photoFileUrl(slug, photo, "thumb")}
            alt={photo.caption}
            width={photo.thumbWidth}
            height={photo.thumbHeight}
            loading="lazy"
            className="aspect-[4/3] w-full object-cover"
          />
        </a>
        <figcaption className="space-y-1 px-3 py-2">
          <p className="text-sm text-graphite-900">{photo.caption}</p>
          <p className="text-xs text-graphite-500">
            {photo.uploadedBy.name} · {taken.format(new Date(photo.createdAt))} · {photo.width} × {photo.height}
          </p>
          {removeAction ? <RemovePhotoButton slug={slug} commissionId={photo.commissionId} photoId={photo.id} caption={photo.caption} action={removeAction} /> : null}
        </figcaption>
      </figure>
    </li>
  );
}

/**
 * `removeAction` (a server action wrapped by workshopAction) adds a remove button to each photo;
 * pass it only to people who hold photo.remove.
 */
export async function StagePhotos({
  ctx,
  commissionId,
  removeAction,
  emptyText = "No photos yet.",
}: {
  ctx: WorkshopContext;
  commissionId: number;
  removeAction?: RemovePhotoAction;
  emptyText?: string;
}) {
  const groups = await listCommissionPhotos(ctx.scope, commissionId);
  if (groups.length === 0) return <p className="text-sm text-graphite-600">{emptyText}</p>;
  const slug = ctx.workshop.slug;
  return (
    <div className="space-y-8">
      {groups.map((g) => (
        <section key={g.stage} aria-labelledby={`photos-${g.stage}`}>
          <h3 id={`photos-${g.stage}`} className="mb-3 flex items-baseline gap-2 text-base font-semibold">
            {g.label}
            <span className="text-xs font-normal text-graphite-500">
              {g.photos.length} {g.photos.length === 1 ? "photo" : "photos"}
            </span>
          </h3>
          <ul className="grid grid-cols-1 gap-4 sm:grid-cols-2 lg:grid-cols-3">
            {g.photos.map((p) => (
              <PhotoFigure key={p.id} slug={slug} photo={p} removeAction={removeAction} />
            ))}
          </ul>
        </section>
      ))}
    </div>
  );
}

/** How many thumbnails a timeline strip shows before pointing to the photos page. */
const STRIP_SIZE = 4;

function StagePhotoStrip({ slug, group, photosHref }: { slug: string; group: PhotoStageGroup; photosHref: string }) {
  const shown = group.photos.slice(-STRIP_SIZE); // the newest of the stage
  const more = group.photos.length - shown.length;
  return (
    <div role="group" aria-label={`Photos: ${group.label}`} className="space-y-2">
      <ul className="grid grid-cols-2 gap-2 sm:grid-cols-4">
        {shown.map((p) => (
          <li key={p.id} className="min-w-0">
            <a href={photoFileUrl(slug, p, "full")} target="_blank" rel="noopener" className="block overflow-hidden rounded-chip border border-spruce-200 bg-spruce-100">
              <img src={photoFileUrl(slug, p, "thumb")} alt={p.caption} width={p.thumbWidth} height={p.thumbHeight} loading="lazy" className="aspect-[4/3] w-full object-cover" />
            </a>
          </li>
        ))}
      </ul>
      <p className="text-xs text-graphite-600">
        {group.photos.length} {group.photos.length === 1 ? "photo" : "photos"} of {group.label}
        {more > 0 ? ` (${more} more not shown)` : ""} ·{" "}
        <Link href={photosHref} className="font-semibold text-rosewood-700 underline">
          Open the Photos tab
        </Link>
      </p>
    </div>
  );
}

/**
 * The caller's photos of a commission as one compact strip per stage, in the order of the stage
 * line, for the overview's timeline (a client sees the stages they have been told of).
 */
export async function stagePhotoStrips(ctx: WorkshopContext, commissionId: number, photosHref: string): Promise<Array<{ stage: string; strip: ReactNode }>> {
  const groups = await listCommissionPhotos(ctx.scope, commissionId);
  return groups.map((g) => ({ stage: g.stage, strip: <StagePhotoStrip key={g.stage} slug={ctx.workshop.slug} group={g} photosHref={photosHref} /> }));
}
