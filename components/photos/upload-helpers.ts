// The typed upload hook for the app's photo file route (client side; the router type only).
import { generateReactHelpers } from "@uploadthing/react";
import type { PhotoFileRouter } from "@/lib/photos/file-router";

export const { useUploadThing } = generateReactHelpers<PhotoFileRouter>({ url: "/api/uploadthing" });
