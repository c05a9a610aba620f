// The overview's figures from plain rows. The expectations are worked by hand from the rules the
// overview states (product rules, no outside source) and the textbook median.
import { describe, expect, it } from "vitest";
import { cohortProgress, daysOverMedian, isOverdue, openStages, stageMedians, workload } from "@/lib/overview/figures";
import { DEFAULT_BUILD_STAGES } from "@/lib/workflow/stages";

describe("stage medians", () => {
  it("takes the median of finished stays per stage, in whole UTC days", () => {
    const m = stageMedians([
      { stage: "timber", enteredAt: "2027-01-01T09:00:00Z", leftAt: "2027-01-04T17:00:00Z" }, // 3 d
      { stage: "timber", enteredAt: "2027-02-01T09:00:00Z", leftAt: "2027-02-11T08:00:00Z" }, // 10 d
      { stage: "timber", enteredAt: "2027-03-01T23:59:00Z", leftAt: "2027-03-06T00:01:00Z" }, // 5 d
      { stage: "finish", enteredAt: "2027-01-01T00:00:00Z", leftAt: "2027-01-15T00:00:00Z" }, // 14 d
      { stage: "finish", enteredAt: "2027-02-01T00:00:00Z", leftAt: "2027-02-08T00:00:00Z" }, // 7 d
    ]);
    expect(m.get("timber")).toEqual({ medianDays: 5, stays: 3 });
    expect(m.get("finish")).toEqual({ medianDays: 10.5, stays: 2 });
    expect(m.get("assembly_electronics")).toBeUndefined();
  });

  it("says how far past the median a commission is", () => {
    expect(daysOverMedian(12, 5)).toBe(7);
    expect(daysOverMedian(2, 10.5)).toBe(-8.5);
    expect(daysOverMedian(4, null)).toBeNull();
  });
});

describe("overdue", () => {
  it("is a target before today on a commission still open", () => {
    expect(isOverdue("2027-05-02", "finish", "2027-05-03")).toBe(true);
    expect(isOverdue("2027-05-03", "finish", "2027-05-03")).toBe(false);
    expect(isOverdue("2027-05-02", "delivered", "2027-05-03")).toBe(false);
    expect(isOverdue("2027-05-02", "cancelled", "2027-05-03")).toBe(false);
    expect(isOverdue("2027-05-02", "on_hold", "2027-05-03")).toBe(true);
    expect(isOverdue(null, "finish", "2027-05-03")).toBe(false);
  });
});

describe("open stages", () => {
  it("lists the open stages in the workshop's order, then any stage the template lost", () => {
    const keys = openStages(DEFAULT_BUILD_STAGES, ["finish", "old_stage", "delivered"]).map((s) => s.key);
    expect(keys).toEqual(["spec", "deposit", ...DEFAULT_BUILD_STAGES.map((s) => s.key), "final_setup", "on_hold", "old_stage"]);
    expect(openStages(DEFAULT_BUILD_STAGES)[2]).toEqual({ key: "timber", label: "Timber selection" });
  });
});

describe("workload", () => {
  it("gives every builder a row, adds other assignees, and puts unassigned work last", () => {
    const rows = workload(
      [
        { id: 2, name: "Ilse" },
        { id: 1, name: "Tobias" },
        { id: 3, name: "Idle Builder" },
      ],
      [
        { builderId: 1, builderName: "Tobias", stage: "timber", n: 2, overdue: 1 },
        { builderId: 1, builderName: "Tobias", stage: "finish", n: 1, overdue: 0 },
        { builderId: 2, builderName: "Ilse", stage: "timber", n: 1, overdue: 0 },
        { builderId: null, builderName: null, stage: "spec", n: 4, overdue: 2 },
        { builderId: 9, builderName: "Owner Who Builds", stage: "final_setup", n: 1, overdue: 0 },
      ],
    );
    expect(rows.map((r) => r.builder?.name ?? null)).toEqual(["Idle Builder", "Ilse", "Owner Who Builds", "Tobias", null]);
    expect(rows[3]).toEqual({ builder: { id: 1, name: "Tobias" }, byStage: { timber: 2, finish: 1 }, open: 3, overdue: 1 });
    expect(rows[0]).toEqual({ builder: { id: 3, name: "Idle Builder" }, byStage: {}, open: 0, overdue: 0 });
    expect(rows[4]).toEqual({ builder: null, byStage: { spec: 4 }, open: 4, overdue: 2 });
  });
});

describe("cohort progress", () => {
  it("counts by stage and leaves cancelled commissions out of the delivered share", () => {
    const p = cohortProgress([
      { stage: "delivered", n: 3, overdue: 0 },
      { stage: "timber", n: 2, overdue: 1 },
      { stage: "cancelled", n: 1, overdue: 0 },
      { stage: "finish", n: 1, overdue: 0 },
    ]);
    expect(p).toEqual({ total: 7, byStage: { delivered: 3, timber: 2, cancelled: 1, finish: 1 }, open: 3, overdue: 1, delivered: 3, cancelled: 1, shareDelivered: 0.5 });
  });

  it("has no share for a cohort without commissions, or with only cancelled ones", () => {
    expect(cohortProgress([]).shareDelivered).toBeNull();
    expect(cohortProgress([{ stage: "cancelled", n: 2, overdue: 0 }]).shareDelivered).toBeNull();
  });
});
