// GET /api/workshops/[workshop]/commissions/[id]/printouts/fret-template?paper=a4|letter – the 1:1 fret-slot template of the approved spec (PDF), for whoever may see the commission.
import { z } from "zod";
import { withWorkshop } from "@/lib/auth/route-handlers";
import { getTemplatePrintData } from "@/lib/data/printouts";
import { pdfResponse } from "@/lib/http/pdf-response";
import { readQuery } from "@/lib/http/respond";
import { renderFretTemplatePdf } from "@/lib/printing/fret-template-pdf";
import { fretTemplateDrawing, templateCaption } from "@/lib/printing/template-drawing";
import { idParamSchema } from "@/lib/schemas/ids";
import { printoutQuerySchema } from "@/lib/schemas/printouts";

const params = z.object({ id: idParamSchema });

export const GET = withWorkshop({ permission: "commission.read", params }, async (req, { scope, params, workshop }) => {
  const query = readQuery(req, printoutQuerySchema);
  const d = await getTemplatePrintData(scope, params.id);
  const paper = query.paper ?? (workshop.unitPreference === "in" ? "letter" : "a4");
  const drawing = fretTemplateDrawing({
    result: d.spec.result,
    unit: d.unit,
    title: `${d.workshopName} - ${d.commission.number} ${d.commission.title}`,
    subtitle: templateCaption(d.spec.result, d.unit, d.spec),
  });
  return pdfResponse(await renderFretTemplatePdf(drawing, paper), `fret-template-${d.commission.number}-${paper}.pdf`);
});
