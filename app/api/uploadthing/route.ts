// GET  /api/uploadthing – the photo route's config (types, sizes, counts) for the upload components.
// POST /api/uploadthing – upload URLs for a signed-in member (the route's middleware authorises
//      through lib/auth/workshop-access.ts), and the upload service's signed callbacks.
import { createRouteHandler } from "uploadthing/next";
import { photoFileRouter } from "@/lib/photos/file-router";
import { uploadthingRouteConfig } from "@/lib/services/uploadthing";

export const { GET, POST } = createRouteHandler({ router: photoFileRouter, config: uploadthingRouteConfig() });
