// GET /api/workshops/[workshop]/commissions/[id]/photos/[photoId]/full|thumb – the image bytes,
//     streamed from the private store to someone who can see the commission; 404 for anyone else.
import { z } from "zod";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { getPhotoFile } from "@/lib/data/photos";
import { openStoredFile } from "@/lib/photos/store";
import { idParamSchema } from "@/lib/schemas/ids";
import { photoVariantSchema } from "@/lib/schemas/photo";

const params = z.object({ id: idParamSchema, photoId: idParamSchema, variant: photoVariantSchema });

export const GET = withWorkshop({ permission: "photo.read", params }, async (_req, { scope, params }) => {
  const file = await getPhotoFile(scope, params.id, params.photoId, params.variant);
  const upstream = await openStoredFile(file.key);
  return new Response(upstream.body, {
    headers: {
      "Content-Type": file.contentType,
      "Content-Length": upstream.headers.get("content-length") ?? String(file.bytes),
      "Content-Disposition": `inline; filename="photo-${params.photoId}-${params.variant}.jpg"`,
      // Only this browser may keep it, briefly; the answer depends on who asks.
      "Cache-Control": "private, max-age=300",
      Vary: "Cookie",
      "X-Content-Type-Options": "nosniff",
    },
  });
});
