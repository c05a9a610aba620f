// Which timeline entry carries each stage's photos (pure). Cases worked by hand.
import { describe, expect, it } from "vitest";
import { photoAnchors } from "@/components/commissions/timeline-photos";

const history = [
  { id: 1, to: "spec" },
  { id: 2, to: "deposit" },
  { id: 3, to: "timber" },
  { id: 4, to: "on_hold" },
  { id: 5, to: "timber" }, // resumed
  { id: 6, to: "shaping" },
];

describe("photoAnchors", () => {
  it("puts a stage's photos under the newest move into it", () => {
    const { byEntry, leftOver } = photoAnchors(history, ["spec", "timber", "shaping"]);
    expect(Object.fromEntries(byEntry)).toEqual({ 1: ["spec"], 5: ["timber"], 6: ["shaping"] });
    expect(leftOver).toEqual([]);
  });
  it("leaves over stages no move went into, in the order given", () => {
    const { byEntry, leftOver } = photoAnchors(history.slice(0, 2), ["spec", "carving", "timber"]);
    expect(Object.fromEntries(byEntry)).toEqual({ 1: ["spec"] });
    expect(leftOver).toEqual(["carving", "timber"]);
  });
  it("has nothing to place without photos", () => {
    const { byEntry, leftOver } = photoAnchors(history, []);
    expect(byEntry.size).toBe(0);
    expect(leftOver).toEqual([]);
  });
});
