// Pages answer access the way pages should: signed out → sign-in with a way back; another
// workshop or none → the 404 page; a role without the permission → the 403 page.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestDb } from "../setup/test-db";
import { appUrl } from "./app-url";
import { createWorkshopWithMembers, type TestWorkshop } from "./fixtures";
import { anonymous, signIn } from "./session";

let a: TestWorkshop;
let b: TestWorkshop;

beforeAll(async () => {
  [a, b] = await Promise.all([createWorkshopWithMembers(), createWorkshopWithMembers()]);
});
afterAll(closeTestDb);

describe("workshop pages", () => {
  it("send a signed-out visitor to sign-in and back", async () => {
    for (const path of [`/${a.slug}`, `/${a.slug}/members`, "/account", "/workshops/new", "/no-such-workshop"]) {
      const res = await anonymous().fetch(path);
      expect(res.status, path).toBe(307);
      expect(new URL(res.headers.get("location")!, appUrl()).toString(), path).toBe(appUrl(`/sign-in?callbackUrl=${encodeURIComponent(path)}`));
    }
  });

  it("show another workshop exactly like one that does not exist", async () => {
    const outsider = await signIn(b.owner);
    const theirs = await outsider.fetch(`/${a.slug}/members`);
    const none = await outsider.fetch("/no-such-workshop-at-all/members");
    expect(theirs.status).toBe(404);
    expect(none.status).toBe(404);
    const [x, y] = [await theirs.text(), await none.text()];
    expect(x).toContain("Nothing here");
    expect(x).not.toContain(a.name);
    expect(y).toContain("Nothing here");
  });

  it("answer 403 to a client on the members page, and show the owner everything", async () => {
    const client = await signIn(a.client);
    const denied = await client.fetch(`/${a.slug}/members`);
    expect(denied.status).toBe(403);
    expect(await denied.text()).toContain("Not for your role");
    expect((await client.fetch(`/${a.slug}`)).status).toBe(200);

    const owner = await signIn(a.owner);
    const page = await owner.fetch(`/${a.slug}/members`);
    expect(page.status).toBe(200);
    const html = await page.text();
    for (const m of a.members) expect(html).toContain(m.email);
    expect(html).toContain("Invite someone");
  });

  it("show a builder the names without addresses", async () => {
    const builder = await signIn(a.builder);
    const html = await (await builder.fetch(`/${a.slug}/members`)).text();
    expect(html).toContain(a.owner.name);
    expect(html).not.toContain(a.owner.email);
  });

  it("serve the sign-in, sign-up and reset pages to anyone", async () => {
    for (const path of ["/sign-in", "/sign-up", "/reset"]) expect((await anonymous().fetch(path)).status, path).toBe(200);
  });

  it("explain a rate-limited sign-in with the time to retry", async () => {
    const html = await (await anonymous().fetch("/sign-in?error=CredentialsSignin&code=rate_limited%3A600")).text();
    expect(html).toMatch(/Too many failed sign-ins\. Try again in 10 minutes \(at \d\d:\d\d UTC\)\./);
  });
});
