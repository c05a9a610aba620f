// GET /api/workshops/[workshop]/commissions/[id]/printouts/build-sheet?paper=a4|letter – the build sheet (PDF): spec, computed tables, stages, setup sheet; for whoever may see the commission.
import { z } from "zod";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { getBuildSheetData } from "@/lib/data/printouts";
import { pdfResponse } from "@/lib/http/pdf-response";
import { readQuery } from "@/lib/http/respond";
import { renderBuildSheetPdf } from "@/lib/printing/build-sheet-pdf";
import { idParamSchema } from "@/lib/schemas/ids";
import { printoutQuerySchema } from "@/lib/schemas/printouts";

const params = z.object({ id: idParamSchema });

export const GET = withWorkshop({ permission: "commission.read", params }, async (req, { scope, params, workshop }) => {
  const query = readQuery(req, printoutQuerySchema);
  const data = await getBuildSheetData(scope, params.id);
  const paper = query.paper ?? (workshop.unitPreference === "in" ? "letter" : "a4");
  return pdfResponse(await renderBuildSheetPdf(data, paper), `build-sheet-${data.commission.number}.pdf`);
});
