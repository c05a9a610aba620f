// The setup pages answer access the way pages should: signed out → sign-in and back; another
// workshop, another client's or an unassigned builder's commission → the 404 page; and each role
// gets its own view (the builder the form, the client only what is signed, the owner the ranges form).
import { beforeAll, describe, expect, it } from "vitest";
import { appUrl } from "./app-url";
import { createWorkshopWithMembers, type TestWorkshop } from "./fixtures";
import { anonymous, signIn, type HttpSession } from "./session";
import { commissionInFinalSetup, goodSheet, putSheet, signSheet, type Sessions } from "./setup-helpers";

let a: TestWorkshop;
let b: TestWorkshop;
let s: Sessions;
let id: number;
let page: string;

beforeAll(async () => {
  [a, b] = await Promise.all([createWorkshopWithMembers({ extra: { builder: 1, client: 1 } }), createWorkshopWithMembers()]);
  const [owner, builder, bookkeeper, client] = await Promise.all([signIn(a.owner), signIn(a.builder), signIn(a.bookkeeper), signIn(a.client)]);
  s = { owner, builder, bookkeeper, client };
  id = (await commissionInFinalSetup(s, a)).id;
  page = `/${a.slug}/commissions/${id}/setup`;
});

const html = async (who: HttpSession, path: string) => {
  const res = await who.fetch(path);
  return { status: res.status, text: await res.text() };
};

describe("setup pages", () => {
  it("send a signed-out visitor to sign-in and back", async () => {
    for (const path of [page, `/${a.slug}/setup`]) {
      const res = await anonymous().fetch(path);
      expect(res.status, path).toBe(307);
      expect(new URL(res.headers.get("location")!, appUrl()).toString()).toBe(appUrl(`/sign-in?callbackUrl=${encodeURIComponent(path)}`));
    }
  });

  it("show the 404 page to another workshop, another client, an unassigned builder and a malformed id", async () => {
    const outsider = await signIn(b.owner);
    const otherClient = await signIn(a.members.filter((m) => m.role === "client")[1]!);
    const otherBuilder = await signIn(a.members.filter((m) => m.role === "builder")[1]!);
    // Those who may not see the commission get nothing of it; the owner asking for a malformed
    // revision may see the commission (its header), but gets the 404 page for the revision.
    for (const [who, path, mayKnowCommission] of [
      [outsider, page, false],
      [otherClient, page, false],
      [otherBuilder, page, false],
      [s.owner, `/${a.slug}/commissions/abc/setup`, false],
      [s.owner, `/${a.slug}/commissions/${id}/setup?revision=x`, true],
    ] as const) {
      const r = await html(who, path);
      expect(r.status, path).toBe(404);
      expect(r.text).toContain("Nothing here");
      if (!mayKnowCommission) expect(r.text, path).not.toContain("Test commission");
    }
  });

  it("give the builder the form, the client nothing until it is signed, then the signed sheet", async () => {
    const builderView = await html(s.builder, page);
    expect(builderView.status).toBe(200);
    expect(builderView.text).toContain("Save and sign");
    expect(builderView.text).toContain("Download fret template");
    const before = await html(s.client, page);
    expect(before.text).toContain("The workshop has not signed off the final setup yet.");
    await putSheet(s.builder, a, id, goodSheet());
    expect((await html(s.client, page)).text).not.toContain("An eighth of a turn");
    await signSheet(s.builder, a, id, 1);
    const after = await html(s.client, page);
    expect(after.text).toContain("An eighth of a turn, settled overnight");
    expect(after.text).not.toContain("Save and sign");
    expect(after.text).not.toContain("Reopen as revision");
  });

  it("list the commission in the workshop's setup area, with the ranges form for the owner only", async () => {
    const owner = await html(s.owner, `/${a.slug}/setup`);
    expect(owner.status).toBe(200);
    expect(owner.text).toContain(`/${a.slug}/commissions/${id}/setup`);
    expect(owner.text).toContain("Save ranges");
    const bookkeeper = await html(s.bookkeeper, `/${a.slug}/setup`);
    expect(bookkeeper.text).toContain("Common-practice ranges");
    expect(bookkeeper.text).not.toContain("Save ranges");
    const client = await html(s.client, `/${a.slug}/setup`);
    expect(client.text).toContain(`/${a.slug}/commissions/${id}/setup`);
    expect(client.text).not.toContain("Common-practice ranges");
  });
});
