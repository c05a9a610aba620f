// GET /api/workshops/[workshop]/commissions/[id]/photos – the commission's photos grouped by stage, for
//     anyone who can see the commission (a client: the stages they have been told of). Uploads go
//     through /api/uploadthing; the images through …/photos/[photoId]/(full|thumb).
import { NextResponse } from "next/server";
import { z } from "zod";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { listCommissionPhotos } from "@/lib/data/photos";
import { photoFileUrl } from "@/lib/photos/urls";
import { idParamSchema } from "@/lib/schemas/ids";

const params = z.object({ id: idParamSchema });

export const GET = withWorkshop({ permission: "photo.read", params }, async (_req, { scope, workshop, params }) => {
  const groups = await listCommissionPhotos(scope, params.id);
  return NextResponse.json({
    stages: groups.map((g) => ({
      ...g,
      photos: g.photos.map((p) => ({ ...p, fullUrl: photoFileUrl(workshop.slug, p, "full"), thumbUrl: photoFileUrl(workshop.slug, p, "thumb") })),
    })),
  });
});
