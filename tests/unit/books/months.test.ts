// Calendar months in UTC. Checked against the Gregorian calendar's month lengths (ISO 8601 dates;
// February has 29 days in a year divisible by 4 but not by 100, or by 400) and plain date identities.
import { describe, expect, it } from "vitest";
import { addMonths, isMonth, isMonthOver, monthLabel, monthOf, monthRange, monthsBetween } from "@/lib/books/months";

const DAY = 86_400_000;

describe("months", () => {
  it("recognises months written YYYY-MM", () => {
    expect(isMonth("2027-03")).toBe(true);
    for (const bad of ["2027-3", "2027-13", "2027-00", "27-03", "2027-03-01", 202703, null]) expect(isMonth(bad), String(bad)).toBe(false);
  });

  it("gives each month its Gregorian length (ISO 8601 calendar)", () => {
    const days = (m: string) => {
      const { start, end } = monthRange(m);
      return (end.getTime() - start.getTime()) / DAY;
    };
    expect(days("2027-01")).toBe(31);
    expect(days("2027-02")).toBe(28);
    expect(days("2028-02")).toBe(29); // divisible by 4
    expect(days("2100-02")).toBe(28); // divisible by 100, not by 400
    expect(days("2000-02")).toBe(29); // divisible by 400
    expect(days("2027-04")).toBe(30);
  });

  it("takes the month of a moment in UTC, whatever the local time zone", () => {
    expect(monthOf(new Date("2027-03-31T23:59:59.999Z"))).toBe("2027-03");
    expect(monthOf(new Date("2027-04-01T00:00:00.000Z"))).toBe("2027-04");
    // 00:30 on 1 April in Central European Summer Time is still March in UTC.
    expect(monthOf(new Date("2027-04-01T00:30:00+02:00"))).toBe("2027-03");
  });

  it("steps across years both ways (identity: adding n then -n gives the month back)", () => {
    expect(addMonths("2027-12", 1)).toBe("2028-01");
    expect(addMonths("2027-01", -1)).toBe("2026-12");
    expect(addMonths("2027-05", 19)).toBe("2028-12");
    for (let n = -30; n <= 30; n++) expect(addMonths(addMonths("2027-05", n), -n)).toBe("2027-05");
  });

  it("lists the months between two, newest first, and says when one is over", () => {
    expect(monthsBetween("2026-11", "2027-02")).toEqual(["2027-02", "2027-01", "2026-12", "2026-11"]);
    expect(monthsBetween("2027-02", "2027-02")).toEqual(["2027-02"]);
    expect(isMonthOver("2027-03", new Date("2027-03-31T23:59:59Z"))).toBe(false);
    expect(isMonthOver("2027-03", new Date("2027-04-01T00:00:00Z"))).toBe(true);
    expect(monthLabel("2027-03")).toBe("March 2027");
  });
});
