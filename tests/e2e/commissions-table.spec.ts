// The commissions table in a real browser: server-side sorting, filters, search and paging, all in
// the address bar (reload, Back and a copied link give the same view); and what each role sees.
// The expected rows come from the fixture made here over the API.
import { expect, test, type Browser, type Page } from "@playwright/test";
import type { CommissionSummary } from "../../lib/schemas/commission-out";
import { approveSpec, openCommission } from "../http/commission-helpers";
import { addMember, createTestUser, createWorkshopWithMembers, uniqueEmail, type TestMember, type TestWorkshop } from "../http/fixtures";
import { signIn } from "../http/session";
import { closeTestDb, testDb } from "../setup/test-db";
import { keepScreenshot } from "./screenshot";
import { signInInBrowser } from "./sign-in";

let ws: TestWorkshop;
let builderB: TestMember;
let clientB: TestMember;
const made: CommissionSummary[] = [];
const inDeposit: number[] = [];

const day = (offset: number) => new Date(Date.now() + offset * 86_400_000).toISOString().slice(0, 10);
const KINDS = ["Baritone", "Seven-string", "Fanned eight", "Short-scale bass", "Offset six", "Travel"];

test.beforeAll(async () => {
  test.setTimeout(240_000);
  ws = await createWorkshopWithMembers({ name: `Table Workshop ${Date.now()}` });
  builderB = await addMember(ws.id, await createTestUser({ email: uniqueEmail("builder-b") }), "builder");
  clientB = await addMember(ws.id, await createTestUser({ email: uniqueEmail("client-b") }), "client");
  const owner = await signIn(ws.owner);
  for (let i = 0; i < 24; i++) {
    made.push(
      await openCommission(owner, ws, {
        title: `${KINDS[i % KINDS.length]} no. ${i + 1}`,
        clientId: i % 3 === 0 ? clientB.userId : ws.client.userId,
        builderId: i === 5 || i === 11 ? null : i % 2 === 0 ? ws.builder.userId : builderB.userId,
        // Every fourth one was due last month: overdue.
        targetDate: i % 4 === 0 ? day(-30 - i) : day(30 + i),
        priceMinor: 250_000 + i * 10_000,
      }),
    );
  }
  // Two of builder A's commissions with client A move on to the deposit stage.
  const [builder, client] = await Promise.all([signIn(ws.builder), signIn(ws.client)]);
  for (const c of made.filter((c) => c.builder?.id === ws.builder.userId && c.client.id === ws.client.userId).slice(0, 2)) {
    await approveSpec(builder, client, ws, c.id);
    inDeposit.push(c.id);
  }
});
test.afterAll(async () => closeTestDb());

async function open(browser: Browser, person: { email: string; password: string }, path: string, viewport = { width: 1280, height: 900 }): Promise<Page> {
  const page = await (await browser.newContext({ viewport })).newPage();
  await signInInBrowser(page, person, path);
  return page;
}

const table = (page: Page) => page.getByRole("table", { name: "Commissions" });
const numbersShown = async (page: Page) => (await table(page).locator("tbody tr td:first-child").allInnerTexts()).map((t) => t.trim());
const status = (page: Page) => page.getByRole("navigation", { name: "Pages" }).getByRole("status");

test("sorting, filters, search and paging are server-side and live in the address bar", async ({ browser }) => {
  test.setTimeout(Math.max(240_000, test.info().timeout));
  const numbers = made.map((c) => c.number).sort();
  const page = await open(browser, ws.owner, `/${ws.slug}/commissions`);
  await expect(status(page)).toHaveText("Showing 1–24 of 24");

  await page.getByLabel("Per page").selectOption("10");
  await expect(page).toHaveURL(/pageSize=10/);
  await expect(status(page)).toHaveText("Showing 1–10 of 24");

  // Sort by number: ascending, then descending.
  const numberHeader = table(page).getByRole("columnheader", { name: /Number/ });
  await numberHeader.getByRole("button").click();
  await expect(numberHeader).toHaveAttribute("aria-sort", "ascending");
  await expect(page).toHaveURL(/sort=number/);
  await expect.poll(() => numbersShown(page)).toEqual(numbers.slice(0, 10));
  await numberHeader.getByRole("button").click();
  await expect(numberHeader).toHaveAttribute("aria-sort", "descending");
  await expect(page).toHaveURL(/sort=-number/);
  const desc = [...numbers].reverse();
  await expect.poll(() => numbersShown(page)).toEqual(desc.slice(0, 10));

  // Paging.
  await page.getByRole("button", { name: "Next" }).click();
  await expect(page).toHaveURL(/page=2/);
  await expect(status(page)).toHaveText("Showing 11–20 of 24");
  await expect.poll(() => numbersShown(page)).toEqual(desc.slice(10, 20));
  await page.getByRole("button", { name: "Next" }).click();
  await expect(status(page)).toHaveText("Showing 21–24 of 24");
  await expect(page.getByRole("button", { name: "Next" })).toBeDisabled();
  await page.getByRole("button", { name: "Previous" }).click();
  await expect(status(page)).toHaveText("Showing 11–20 of 24");

  // A reload gives the same view.
  await page.reload();
  await expect(status(page)).toHaveText("Showing 11–20 of 24");
  await expect(numberHeader).toHaveAttribute("aria-sort", "descending");
  await expect(page.getByLabel("Per page")).toHaveValue("10");
  await expect.poll(() => numbersShown(page)).toEqual(desc.slice(10, 20));

  // A filter starts again at page 1; Back returns to the page before it.
  await page.getByLabel("Stage").selectOption("deposit");
  await expect(page).toHaveURL(/stage=deposit/);
  await expect(page).not.toHaveURL(/page=/);
  await expect(status(page)).toHaveText("Showing 1–2 of 2");
  const depositNumbers = made.filter((c) => inDeposit.includes(c.id)).map((c) => c.number).sort().reverse();
  await expect.poll(() => numbersShown(page)).toEqual(depositNumbers);
  await page.goBack();
  await expect(status(page)).toHaveText("Showing 11–20 of 24");
  await expect(page.getByLabel("Stage")).toHaveValue("");

  // Search (by title), combined with the overdue filter and the builder filter.
  await page.getByLabel("Search").fill("Baritone");
  await expect(page).toHaveURL(/q=Baritone/);
  const baritones = made.filter((c) => c.title.startsWith("Baritone"));
  await expect(status(page)).toHaveText(`Showing 1–${baritones.length} of ${baritones.length}`);
  await page.getByLabel("Target date").selectOption("true");
  const overdueBaritones = baritones.filter((c) => c.overdue);
  expect(overdueBaritones.length).toBeGreaterThan(0);
  await expect(status(page)).toHaveText(`Showing 1–${overdueBaritones.length} of ${overdueBaritones.length}`);
  await expect(table(page).getByText("overdue")).toHaveCount(overdueBaritones.length);
  await keepScreenshot(page, "commissions-table-filtered");

  // The link carries the view: a new page opens it the same.
  const link = page.url();
  const again = await page.context().newPage();
  await again.goto(link);
  await expect(again.getByLabel("Search")).toHaveValue("Baritone");
  await expect(again.getByLabel("Target date")).toHaveValue("true");
  await expect.poll(() => numbersShown(again)).toEqual(overdueBaritones.map((c) => c.number).sort().reverse().slice(0, 10));

  // Unassigned, and one client's.
  await page.getByRole("button", { name: "Clear filters" }).click();
  await page.getByLabel("Builder").selectOption("none");
  await expect(status(page)).toHaveText("Showing 1–2 of 2");
  await page.getByLabel("Builder").selectOption("");
  await page.getByLabel("Client").selectOption({ label: clientB.name });
  const clientBCount = made.filter((c) => c.client.id === clientB.userId).length;
  await expect(status(page)).toHaveText(`Showing 1–${Math.min(10, clientBCount)} of ${clientBCount}`);
  await expect(table(page).getByRole("cell", { name: ws.client.name, exact: true })).toHaveCount(0);
});

test("each role sees exactly what it should", async ({ browser }) => {
  test.setTimeout(Math.max(240_000, test.info().timeout));
  const mineA = made.filter((c) => c.builder?.id === ws.builder.userId);
  const clientAs = made.filter((c) => c.client.id === ws.client.userId);

  // A builder: only their commissions, and no prices anywhere.
  const builder = await open(browser, ws.builder, `/${ws.slug}/commissions`, { width: 1024, height: 768 });
  await expect(status(builder)).toHaveText(`Showing 1–${mineA.length} of ${mineA.length}`);
  await expect(table(builder).getByRole("columnheader", { name: "Price" })).toHaveCount(0);
  await expect(builder.getByText("€")).toHaveCount(0);
  await expect(builder.getByLabel("Builder")).toHaveCount(0);
  await expect(builder.getByRole("navigation", { name: "Workshop" }).getByRole("link", { name: "Board" })).toBeVisible();
  const othersBuild = made.find((c) => c.builder?.id === builderB.userId)!;
  const refused = await builder.goto(`/${ws.slug}/commissions/${othersBuild.id}`);
  expect(refused?.status()).toBe(404);
  await expect(builder.getByRole("heading", { name: "No such commission" })).toBeVisible();
  await builder.goto(`/${ws.slug}/commissions/${mineA[0]!.id}`);
  await expect(builder.getByTestId("commission-title")).toHaveText(mineA[0]!.title);
  await expect(builder.getByText("Price", { exact: true })).toHaveCount(0);

  // The bookkeeper: every commission with its money, read-only.
  const bookkeeper = await open(browser, ws.bookkeeper, `/${ws.slug}/commissions`);
  await expect(status(bookkeeper)).toHaveText("Showing 1–24 of 24");
  await expect(table(bookkeeper).getByRole("columnheader", { name: "Price" })).toBeVisible();
  await expect(bookkeeper.getByRole("link", { name: "Open a commission" })).toHaveCount(0);
  await expect(bookkeeper.getByRole("navigation", { name: "Workshop" }).getByRole("link", { name: "Board" })).toHaveCount(0);
  expect((await bookkeeper.goto(`/${ws.slug}/commissions/board`))?.status()).toBe(403);

  // A client, on a phone: their own commissions as cards, no sideways scroll, nobody else's.
  const client = await open(browser, ws.client, `/${ws.slug}/commissions`, { width: 390, height: 844 });
  await expect(status(client)).toHaveText(`Showing 1–${clientAs.length} of ${clientAs.length}`);
  const cards = client.getByRole("list", { name: "Commissions" }).getByRole("listitem");
  await expect(cards).toHaveCount(clientAs.length);
  await expect(client.getByText(clientB.name)).toHaveCount(0);
  const { scrollWidth, innerWidth } = await client.evaluate(() => ({ scrollWidth: document.documentElement.scrollWidth, innerWidth: window.innerWidth }));
  expect(scrollWidth).toBeLessThanOrEqual(innerWidth);
  await keepScreenshot(client, "commissions-client-phone");
  const notTheirs = made.find((c) => c.client.id === clientB.userId)!;
  expect((await client.goto(`/${ws.slug}/commissions/${notTheirs.id}`))?.status()).toBe(404);
  expect((await client.goto(`/${ws.slug}/commissions/${notTheirs.id}/spec`))?.status()).toBe(404);
  await expect(client.getByRole("heading", { name: "No such commission" })).toBeVisible();
});

test("moves that stop work ask first; the API's field errors land on the form's fields", async ({ browser }) => {
  test.setTimeout(Math.max(180_000, test.info().timeout));
  const target = made.find((c) => !inDeposit.includes(c.id) && c.builder !== null)!;
  const owner = await open(browser, ws.owner, `/${ws.slug}/commissions/${target.id}`);
  const stageBadge = owner.getByTestId("commission-header").locator("[data-stage]");

  // Hold: a dialog first; keeping it as it is changes nothing.
  await owner.getByRole("button", { name: "Put on hold" }).click();
  const dialog = owner.getByRole("dialog");
  await expect(dialog).toContainText("Work stops until someone resumes it");
  await dialog.getByRole("button", { name: "Keep it as it is" }).click();
  await expect(stageBadge).toHaveAttribute("data-stage", "spec");
  await owner.getByLabel("Note with the move (optional)").fill("Waiting for the client's choice of top wood.");
  await owner.getByRole("button", { name: "Put on hold" }).click();
  await dialog.getByRole("button", { name: "Yes, go ahead" }).click();
  await expect(stageBadge).toHaveAttribute("data-stage", "on_hold");
  await expect(owner.getByRole("list", { name: "Timeline" }).getByRole("listitem").first()).toContainText("Waiting for the client's choice of top wood.");
  // Resume returns it to where it was held.
  await owner.getByRole("button", { name: "Resume at Spec" }).click();
  await dialog.getByRole("button", { name: "Yes, go ahead" }).click();
  await expect(stageBadge).toHaveAttribute("data-stage", "spec");
  // Cancel says what it means, and can be kept.
  await owner.getByRole("button", { name: "Cancel the commission" }).click();
  await expect(dialog).toContainText("This cannot be undone");
  await dialog.getByRole("button", { name: "Keep it as it is" }).click();
  await expect(stageBadge).toHaveAttribute("data-stage", "spec");

  // A client chosen in the form who is no longer a client by the time it is sent: the API's 422
  // names the field, and the form shows it there.
  const leaving = await addMember(ws.id, await createTestUser({ email: uniqueEmail("leaving"), name: `Leaving client ${Date.now()}` }), "client");
  await owner.goto(`/${ws.slug}/commissions/new`);
  await owner.getByLabel("Title").fill("Short-scale bass for a student");
  await owner.getByLabel("Client", { exact: true }).selectOption({ label: leaving.name });
  await testDb()("memberships").where({ id: leaving.membershipId }).update({ role: "builder" });
  await owner.getByRole("button", { name: "Open the commission" }).click();
  await expect(owner.locator("#new-client-error")).toHaveText("Not a client of this workshop.");
  await expect(owner.getByLabel("Client", { exact: true })).toHaveAttribute("aria-invalid", "true");
  await expect(owner).toHaveURL(new RegExp(`/${ws.slug}/commissions/new$`));
});
