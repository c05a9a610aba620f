// The marked section link (pure). Expected values worked by hand from the app's own paths.
import { describe, expect, it } from "vitest";
import { currentLink } from "@/lib/ui/current-link";

const workshop = ["/ws", "/ws/commissions", "/ws/commissions/board", "/ws/members", "/ws/setup"];
const tabs = ["/ws/commissions/7", "/ws/commissions/7/spec", "/ws/commissions/7/payments"];

describe("currentLink", () => {
  it("marks the page itself", () => {
    expect(currentLink("/ws", workshop)).toBe("/ws");
    expect(currentLink("/ws/commissions/board", workshop)).toBe("/ws/commissions/board");
    expect(currentLink("/ws/commissions/7/spec", tabs)).toBe("/ws/commissions/7/spec");
  });
  it("marks the longest section a deeper page sits in", () => {
    expect(currentLink("/ws/commissions/7/photos", workshop)).toBe("/ws/commissions");
    expect(currentLink("/ws/commissions/new", workshop)).toBe("/ws/commissions");
    expect(currentLink("/ws/account-settings", workshop)).toBe("/ws");
  });
  it("does not take a link for its neighbour that shares a prefix", () => {
    expect(currentLink("/ws/commissions-old", ["/ws/commissions"])).toBeNull();
    expect(currentLink("/ws/setup-queue", ["/ws/setup"])).toBeNull();
    expect(currentLink("/other", workshop)).toBeNull();
  });
});
