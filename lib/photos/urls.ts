import type { PhotoVariant } from "@/lib/schemas/photo";

/** Where the app serves a photo's image (an authorised route; never the store's own URL). */
export function photoFileUrl(slug: string, photo: { id: number; commissionId: number }, variant: PhotoVariant): string {
  return `/api/workshops/${encodeURIComponent(slug)}/commissions/${photo.commissionId}/photos/${photo.id}/${variant}`;
}

/** The commission's photos page. */
export function photosPagePath(slug: string, commissionId: number): string {
  return `/${slug}/commissions/${commissionId}/photos`;
}
