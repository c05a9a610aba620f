// The overview, cohort and settings pages answer access the way pages should: the owner sees them,
// a role without the permission gets the 403 page, another workshop's owner the 404 page.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestDb } from "../setup/test-db";
import { createWorkshopWithMembers, type TestWorkshop } from "./fixtures";
import { signIn, type HttpSession } from "./session";

let a: TestWorkshop;
let b: TestWorkshop;
let owner: HttpSession, builder: HttpSession, bookkeeper: HttpSession, client: HttpSession, outsider: HttpSession;

beforeAll(async () => {
  [a, b] = await Promise.all([createWorkshopWithMembers(), createWorkshopWithMembers()]);
  [owner, builder, bookkeeper, client, outsider] = await Promise.all([signIn(a.owner), signIn(a.builder), signIn(a.bookkeeper), signIn(a.client), signIn(b.owner)]);
});
afterAll(closeTestDb);

const status = async (s: HttpSession, path: string) => (await s.fetch(path)).status;

describe("owner pages", () => {
  it("settings: the owner only (403 for the other roles, 404 for another workshop's owner)", async () => {
    const path = `/${a.slug}/settings`;
    const page = await owner.fetch(path);
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain("Build stages");
    expect(html).toContain("Timber selection");
    for (const s of [builder, bookkeeper, client]) expect(await status(s, path)).toBe(403);
    const theirs = await outsider.fetch(path);
    expect(theirs.status).toBe(404);
    expect(await theirs.text()).not.toContain(a.name);
  });

  it("overview: owner and bookkeeper; only the owner gets the builder picker", async () => {
    const path = `/${a.slug}/overview`;
    expect(await status(owner, path)).toBe(200);
    const html = await (await bookkeeper.fetch(path)).text();
    expect(html).toContain("Workload");
    expect(html).toContain(a.builder.name);
    for (const s of [builder, client]) expect(await status(s, path)).toBe(403);
    expect(await status(outsider, path)).toBe(404);
    // A stale or foreign cohort filter shows everything with a notice, not an error.
    const stale = await owner.fetch(`${path}?cohort=2147483000`);
    expect(stale.status).toBe(200);
    expect(await stale.text()).toContain("There is no such cohort");
  });

  it("cohorts: owner, bookkeeper and builder; not the client; the nav shows what each role may open", async () => {
    const path = `/${a.slug}/cohorts`;
    const html = await (await owner.fetch(path)).text();
    expect(html).toContain("New cohort");
    expect(await (await builder.fetch(path)).text()).toContain("Your cohorts");
    expect(await status(bookkeeper, path)).toBe(200);
    expect(await status(client, path)).toBe(403);
    expect(await status(outsider, path)).toBe(404);
    expect(await status(owner, `${path}/999999999`)).toBe(404);
    expect(await status(owner, `${path}/abc`)).toBe(404);

    const home = async (s: HttpSession) => (await s.fetch(`/${a.slug}`)).text();
    const ownerHome = await home(owner);
    for (const label of ["Overview", "Cohorts", "Settings"]) expect(ownerHome).toContain(`>${label}</a>`);
    const clientHome = await home(client);
    for (const label of ["Overview", "Cohorts", "Settings"]) expect(clientHome).not.toContain(`>${label}</a>`);
  });
});
