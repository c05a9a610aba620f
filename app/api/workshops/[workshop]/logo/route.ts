// GET /api/workshops/[workshop]/logo – the workshop's logo (PNG), streamed from the private store
//     to any member; 404 when there is none, and for anyone outside the workshop.
import { withWorkshop } from "@/lib/auth/route-handlers";
import { getWorkshopLogoFile } from "@/lib/data/workshop-logo";
import { openStoredFile } from "@/lib/photos/store";

export const GET = withWorkshop({ permission: "workshop.read" }, async (_req, { scope }) => {
  const file = await getWorkshopLogoFile(scope);
  const upstream = await openStoredFile(file.key);
  return new Response(upstream.body, {
    headers: {
      "Content-Type": file.contentType,
      ...(upstream.headers.get("content-length") ? { "Content-Length": upstream.headers.get("content-length")! } : {}),
      "Content-Disposition": 'inline; filename="workshop-logo.png"',
      // Pages link it with a version that changes with the logo (?v=…), so it may be kept a while;
      // only by this browser, as the answer depends on who asks.
      "Cache-Control": "private, max-age=3600",
      Vary: "Cookie",
      "X-Content-Type-Options": "nosniff",
    },
  });
});
