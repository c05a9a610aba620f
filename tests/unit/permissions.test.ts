// The role → permission table. The expectations are the product's rules as issue 4 states them
// (product rule, no outside source): owner runs everything; bookkeeper reads members and money;
// builder sees member names only; client sees neither.
import { describe, expect, it } from "vitest";
import { can, isRole, PERMISSIONS, ROLE_PERMISSIONS, ROLES } from "@/lib/auth/permissions";

describe("permissions", () => {
  it("gives every role only permissions that exist", () => {
    for (const role of ROLES) for (const p of ROLE_PERMISSIONS[role]) expect(PERMISSIONS).toContain(p);
  });

  it("names every permission once, as resource.action", () => {
    expect(new Set(PERMISSIONS).size).toBe(PERMISSIONS.length);
    for (const p of PERMISSIONS) expect(p).toMatch(/^[a-z]+\.[a-z_]+$/);
  });

  it("gives the owner everything except the client's spec approval", () => {
    for (const p of PERMISSIONS) expect(can("owner", p), p).toBe(p !== "spec.approve");
    expect(can("client", "spec.approve")).toBe(true);
  });

  it("lets members see who is in the workshop as the issue says", () => {
    expect([can("owner", "member.read"), can("bookkeeper", "member.read"), can("builder", "member.read"), can("client", "member.read")]).toEqual([true, true, false, false]);
    expect([can("builder", "member.names"), can("client", "member.names")]).toEqual([true, false]);
    for (const role of ["builder", "bookkeeper", "client"] as const) expect(can(role, "member.manage"), role).toBe(false);
  });

  it("keeps money with the owner and the bookkeeper", () => {
    for (const p of ["payment.refund", "payment.record", "reconciliation.manage", "ledger.read"] as const) {
      expect(ROLES.filter((r) => can(r, p)), p).toEqual(["owner", "bookkeeper"]);
    }
  });

  it("lets every role open the workshop", () => {
    for (const role of ROLES) expect(can(role, "workshop.read")).toBe(true);
  });

  it("accepts a list as any-of", () => {
    expect(can("builder", ["member.read", "member.names"])).toBe(true);
    expect(can("client", ["member.read", "member.names"])).toBe(false);
  });

  it("recognises roles", () => {
    expect(isRole("owner")).toBe(true);
    expect(isRole("admin")).toBe(false);
    expect(isRole(3)).toBe(false);
  });
});
