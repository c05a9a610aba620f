// The owner's journey in a real browser, one continuous story in a fresh workshop: the owner
// invites a second builder, who accepts through the fake inbox; the owner hands a commission over
// to them from the commission's page and they find it in their list; the owner renames a build
// stage and adds one, and the commission's stage line follows; the owner uploads the workshop's
// logo through the photo pipeline (a text file named like an image is refused first), and every
// member sees it in the workshop's header.
import { expect as baseExpect, test, type Page } from "@playwright/test";
import { DEFAULT_BUILD_STAGES } from "../../lib/workflow/stages";
import { openCommission } from "../http/commission-helpers";
import { createWorkshopWithMembers, uniqueEmail, type TestWorkshop } from "../http/fixtures";
import { commissionInBuild } from "../http/overview-fixture";
import { signIn } from "../http/session";
import { closeTestDb } from "../setup/test-db";
import { NOT_AN_IMAGE, plainPng } from "../support/photos";
import { hydrated, SLOW } from "./hydration";
import { keepScreenshot } from "./screenshot";
import { openEmail, signInInBrowser } from "./sign-in";
import { watchProgress } from "./upload-progress";

const expect = baseExpect.configure({ timeout: 20_000 });
// A step that cannot happen fails within a minute instead of holding the run until the test times out.
test.use({ actionTimeout: 60_000, navigationTimeout: 60_000 });
const DESKTOP = { width: 1280, height: 900 };

let ws: TestWorkshop;
let inBuild: { id: number; number: string };
let request: { id: number; number: string };

test.beforeAll(async () => {
  ws = await createWorkshopWithMembers({ name: `Owner Journey ${Date.now()}` });
  const [owner, client] = await Promise.all([signIn(ws.owner), signIn(ws.client)]);
  inBuild = await commissionInBuild(owner, client, ws, { builderId: ws.builder.userId, advances: 0, title: "Carved-top single-cut" });
  request = await openCommission(owner, ws, { title: "Fretless bass request" });
});
test.afterAll(async () => closeTestDb());

const nav = (page: Page, name: string) => page.getByRole("navigation", { name: "Workshop" }).getByRole("link", { name, exact: true });
const current = (page: Page) => page.getByRole("list", { name: "Stage line" }).locator("[aria-current=step]");

test("owner: invite a builder through the inbox → hand a commission over → change the stage template → upload the logo", async ({ browser }) => {
  test.setTimeout(Math.max(480_000, test.info().timeout));
  const invitee = uniqueEmail("second-builder");
  const ownerContext = await browser.newContext({ viewport: DESKTOP });
  const owner = await ownerContext.newPage();

  // 1. Invite a second builder.
  await signInInBrowser(owner, ws.owner, `/${ws.slug}/members`);
  await hydrated(owner.getByRole("button", { name: "Send invitation" }));
  await owner.getByLabel("E-mail address").fill(invitee);
  await owner.getByLabel("Role", { exact: true }).selectOption("builder");
  await owner.getByRole("button", { name: "Send invitation" }).click();
  await expect(owner.getByText(`Invitation sent to ${invitee}.`)).toBeVisible(SLOW);
  await expect(owner.getByRole("table", { name: "Invitations" }).getByRole("row", { name: new RegExp(invitee) })).toContainText("Waiting");

  // 2. They accept from the fake inbox, in their own browser, and land in the workshop as a builder.
  const builderContext = await browser.newContext({ viewport: { width: 1024, height: 768 } });
  const inbox = await builderContext.newPage();
  await openEmail(inbox, invitee, /invited you to/);
  const [join] = await Promise.all([
    builderContext.waitForEvent("page"),
    inbox.frameLocator("iframe[title='E-mail body']").getByRole("link", { name: "Accept the invitation" }).click(),
  ]);
  await expect(join.getByRole("heading", { name: `Join ${ws.name}` })).toBeVisible(SLOW);
  await hydrated(join.getByRole("button", { name: "Accept and join" }));
  await join.getByLabel("Your name").fill("Odile Marchetti");
  await join.getByRole("button", { name: "Accept and join" }).click();
  await expect(join).toHaveURL(new RegExp(`/${ws.slug}$`), SLOW);
  await expect(join.getByText("You: Builder")).toBeVisible();
  await owner.reload();
  await expect(owner.getByRole("table", { name: "Members" })).toContainText("Odile Marchetti", SLOW);

  // 3. Hand the commission in build over to the new builder, from the commission's own page.
  await nav(owner, "Commissions").click();
  const row = (page: Page) => page.getByRole("table", { name: "Commissions" }).getByRole("row", { name: /Carved-top single-cut/ });
  await (await hydrated(row(owner).getByRole("link", { name: inBuild.number }))).click();
  await owner.waitForURL((u) => u.pathname === `/${ws.slug}/commissions/${inBuild.id}`, SLOW);
  await expect(nav(owner, "Commissions")).toHaveAttribute("aria-current", "true"); // the section stays marked
  await (await hydrated(owner.getByRole("button", { name: "Change" }))).click();
  await expect(owner.getByLabel("Builder").locator("option", { hasText: "Odile Marchetti" })).toHaveCount(1, SLOW);
  await owner.getByLabel("Builder").selectOption({ label: "Odile Marchetti" });
  await owner.getByRole("button", { name: "Save changes" }).click();
  await expect(owner.getByTestId("commission-header")).toContainText("Odile Marchetti", SLOW);
  await keepScreenshot(owner, "journey-owner-reassigned");
  // The new builder finds it in their list; the old one no longer sees it.
  await join.goto(`/${ws.slug}/commissions`);
  await expect(row(join)).toContainText("Odile Marchetti", SLOW);
  const oldBuilder = await signIn(ws.builder);
  expect((await oldBuilder.fetch(`/api/workshops/${ws.slug}/commissions/${inBuild.id}`)).status).toBe(404);

  // 4. The stage template: rename the first build stage and add one after it.
  await nav(owner, "Settings").click();
  const stages = owner.getByRole("list", { name: "Build stages" });
  await expect(stages.getByRole("listitem")).toHaveCount(DEFAULT_BUILD_STAGES.length, SLOW);
  await hydrated(owner.getByRole("button", { name: "Save build stages" }));
  await owner.getByLabel("Name of stage 1").fill("Wood choice and drying");
  await owner.getByLabel("New stage name").fill("Binding and purfling");
  await owner.getByRole("button", { name: "Add stage" }).click();
  await expect(stages.getByRole("listitem")).toHaveCount(DEFAULT_BUILD_STAGES.length + 1);
  // From the end of the list up to second place.
  for (let k = 0; k < DEFAULT_BUILD_STAGES.length - 1; k++) await owner.getByRole("button", { name: "Move Binding and purfling up" }).click();
  await expect(owner.getByLabel("Name of stage 2")).toHaveValue("Binding and purfling");
  await owner.getByRole("button", { name: "Save build stages" }).click();
  await expect(owner.getByText("Build stages saved.")).toBeVisible(SLOW);
  // The commission's stage line follows: its stage keeps its key and takes the new name.
  await owner.goto(`/${ws.slug}/commissions/${inBuild.id}`);
  await expect(current(owner)).toHaveText(/Wood choice and drying/, SLOW);
  await expect(owner.getByRole("list", { name: "Stage line" }).getByRole("listitem").nth(3)).toHaveText(/Binding and purfling/);
  await expect(owner.getByRole("button", { name: "Move to Binding and purfling" })).toBeEnabled();

  // 5. The logo, through the photo pipeline: a text file named like an image is refused by its content.
  await nav(owner, "Settings").click();
  const logoForm = owner.getByRole("form", { name: "Workshop logo" });
  await hydrated(logoForm.getByRole("button", { name: "Upload logo" }));
  await expect(logoForm.getByText("No logo yet", { exact: false })).toBeVisible();
  await logoForm.getByLabel("Logo image").setInputFiles({ name: "logo.png", mimeType: "image/png", buffer: NOT_AN_IMAGE });
  await logoForm.getByRole("button", { name: "Upload logo" }).click();
  await expect(logoForm.getByRole("alert")).toHaveText("logo.png is not an image we can read: upload a JPEG, PNG, WebP or AVIF image.", SLOW);
  await expect(owner.getByTestId("workshop-logo")).toHaveCount(0);

  await logoForm.getByLabel("Logo image").setInputFiles({ name: "bench-mark.png", mimeType: "image/png", buffer: await plainPng(900, 300, 12) });
  const progress = await watchProgress(owner);
  await logoForm.getByRole("button", { name: "Upload logo" }).click();
  await expect(logoForm.getByText("Logo saved (512 × 171 px).", { exact: false })).toBeVisible({ timeout: 90_000 }); // 900 × 300 fitted within 512
  expect((await progress()).at(-1)).toBe("100|Uploaded");
  const logo = owner.getByTestId("workshop-logo");
  await expect(logo).toBeVisible(SLOW);
  await expect.poll(() => logo.evaluate((el) => (el as HTMLImageElement).naturalWidth), SLOW).toBe(512);
  await expect(logoForm.getByRole("img", { name: "The workshop's logo" })).toBeVisible();
  await keepScreenshot(owner, "journey-owner-settings-logo");

  // Every member sees it in the header; the request's page too (any page of the workshop).
  await join.goto(`/${ws.slug}/commissions/${inBuild.id}`);
  const theirs = join.getByTestId("workshop-logo");
  await expect(theirs).toBeVisible(SLOW);
  await expect.poll(() => theirs.evaluate((el) => (el as HTMLImageElement).naturalWidth), SLOW).toBe(512);
  await keepScreenshot(join, "journey-owner-new-builder-sees-logo-tablet");
  const clientContext = await browser.newContext({ viewport: { width: 390, height: 844 } });
  const client = await clientContext.newPage();
  await signInInBrowser(client, ws.client, `/${ws.slug}/commissions/${request.id}`);
  await expect.poll(() => client.getByTestId("workshop-logo").evaluate((el) => (el as HTMLImageElement).naturalWidth), SLOW).toBe(512);
  await keepScreenshot(client, "journey-owner-client-sees-logo-phone");
  await Promise.all([ownerContext.close(), builderContext.close(), clientContext.close()]);
});
