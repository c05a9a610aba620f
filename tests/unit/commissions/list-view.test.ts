// The commissions table's address-bar view: what a link carries, what it ignores, and how a change
// resets the page. Checked against the platform's URLSearchParams and the route's own query schema.
import { describe, expect, it } from "vitest";
import { changeView, DEFAULT_VIEW, isFiltered, listApiQuery, listViewParams, readListView, sortingToSort, sortToSorting } from "@/components/commissions/list-view";
import { commissionListQuerySchema } from "@/lib/schemas/commission";

const read = (q: string) => readListView(new URLSearchParams(q));

describe("commission list view", () => {
  it("reads every parameter and writes it back unchanged (a link reopens the same view)", () => {
    const q = "stage=timber&builder=12&client=7&overdue=true&q=Baritone+seven&sort=-number&page=3&pageSize=10";
    const view = read(q);
    expect(view).toEqual({ stage: "timber", builder: 12, client: 7, overdue: true, q: "Baritone seven", sort: "-number", page: 3, pageSize: 10 });
    expect(read(listViewParams(view).toString())).toEqual(view);
    expect(read("builder=none").builder).toBe("none");
  });

  it("leaves defaults out of the address bar", () => {
    expect(listViewParams(DEFAULT_VIEW).toString()).toBe("");
    expect(listViewParams({ ...DEFAULT_VIEW, overdue: false }).toString()).toBe("overdue=false");
  });

  it("falls back to the default for anything unreadable instead of failing", () => {
    expect(read("stage=DROP%20TABLE&builder=-1&client=abc&overdue=maybe&sort=price&page=0&pageSize=7")).toEqual(DEFAULT_VIEW);
    expect(read("page=999999999999").page).toBe(DEFAULT_VIEW.page);
    expect(read(`q=${"x".repeat(200)}`).q).toHaveLength(80);
  });

  it("asks the API with parameters its own schema accepts", () => {
    for (const q of ["", "stage=spec&sort=stage&page=2", "builder=none&overdue=false&q=a%25b", "client=3&pageSize=100&sort=-targetDate"]) {
      const apiParams = Object.fromEntries(new URLSearchParams(listApiQuery(read(q))));
      expect(commissionListQuerySchema.safeParse(apiParams).success, q).toBe(true);
    }
    // Spelled out in a fixed order, so two equal views share one cache entry.
    expect(listApiQuery(read("page=1&sort=-updated"))).toBe(listApiQuery(DEFAULT_VIEW));
  });

  it("starts again at page 1 when a filter changes, and keeps the filters when the page changes", () => {
    const on3 = { ...DEFAULT_VIEW, stage: "deposit", page: 3 };
    expect(changeView(on3, { q: "bass" }).page).toBe(1);
    expect(changeView(on3, { page: 4 })).toEqual({ ...on3, page: 4 });
    expect(isFiltered(DEFAULT_VIEW)).toBe(false);
    expect(isFiltered(on3)).toBe(true);
  });

  it("maps TanStack Table's sorting state to one sort key and back", () => {
    expect(sortToSorting("-targetDate")).toEqual([{ id: "targetDate", desc: true }]);
    expect(sortingToSort([{ id: "number", desc: false }])).toBe("number");
    expect(sortingToSort([])).toBe(DEFAULT_VIEW.sort);
    expect(sortingToSort([{ id: "price", desc: true }])).toBe(DEFAULT_VIEW.sort);
  });
});
