// Drill-down links carry the list API's own query names, so the commissions table and
// GET …/commissions read them back unchanged (the round trip through commissionListQuerySchema).
import { describe, expect, it } from "vitest";
import { commissionsListHref } from "@/lib/overview/drill-down";
import { commissionListQuerySchema } from "@/lib/schemas/commission";

const readBack = (href: string) => commissionListQuerySchema.parse(Object.fromEntries(new URL(href, "http://localhost").searchParams));

describe("drill-down links", () => {
  it("leave out unset filters", () => {
    expect(commissionsListHref("fernhollow")).toBe("/fernhollow/commissions");
    expect(commissionsListHref("fernhollow", { cohort: 4 })).toBe("/fernhollow/commissions?cohort=4");
  });

  it("round-trip builder, stage, overdue and cohort through the list query schema", () => {
    const href = commissionsListHref("fernhollow", { builder: 12, stage: "finish", overdue: true, cohort: 3 });
    expect(href).toBe("/fernhollow/commissions?builder=12&stage=finish&overdue=true&cohort=3");
    expect(readBack(href)).toMatchObject({ builder: 12, stage: "finish", overdue: true, cohort: 3 });
    expect(readBack(commissionsListHref("x", { builder: "none" })).builder).toBe("none");
  });
});
