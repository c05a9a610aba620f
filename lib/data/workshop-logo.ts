// The workshop's logo for printouts. HOOK: workshops have no logo yet; when logo upload exists
// (the workshop settings work), return its PNG/JPEG bytes here and the build sheet's masthead
// shows it (lib/printing/build-sheet-pdf.ts draws `logo` when it is not null).
import type { WorkshopScope } from "@/lib/auth/scope";
import type { PrintLogo } from "@/lib/printing/build-sheet-pdf";

export async function getWorkshopLogoForPrint(scope: WorkshopScope): Promise<PrintLogo | null> {
  void scope;
  return null;
}
