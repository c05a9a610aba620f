// Downloads of the shop printouts for one commission: a plain GET form, so the browser saves the
// PDF the route generates (no script needed).
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { buttonClasses } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Select } from "@/components/ui/select";

export function PrintoutsCard({ slug, commissionId, unit, hasApprovedSpec }: { slug: string; commissionId: number; unit: "mm" | "in"; hasApprovedSpec: boolean }) {
  const base = `/api/workshops/${slug}/commissions/${commissionId}/printouts`;
  return (
    <Card>
      <CardHeader title="Printouts" subtitle="PDFs made from the approved spec, in the workshop's unit" />
      <CardBody className="space-y-3">
        {hasApprovedSpec ? (
          <form method="get" action={`${base}/fret-template`} className="flex flex-wrap items-end gap-3">
            <Field id="printout-paper" label="Paper" className="w-56">
              <Select
                id="printout-paper"
                name="paper"
                defaultValue={unit === "in" ? "letter" : "a4"}
                options={[
                  { value: "a4", label: "A4 (210 × 297 mm)" },
                  { value: "letter", label: "Letter (8.5 × 11 in)" },
                ]}
              />
            </Field>
            <button type="submit" className={buttonClasses("primary")}>
              Download fret template
            </button>
            <button type="submit" formAction={`${base}/build-sheet`} className={buttonClasses("secondary")}>
              Download build sheet
            </button>
          </form>
        ) : (
          <p className="text-sm text-graphite-600">The printouts follow the approved spec; this commission has none yet.</p>
        )}
        <p className="text-xs text-graphite-600">
          The fret template is 1:1 and tiles over several pages with overlap and alignment marks. Print at 100% (actual size), never
          &quot;fit to page&quot;, and measure the 100 mm and 4 in rulers on each page before cutting.
        </p>
      </CardBody>
    </Card>
  );
}
