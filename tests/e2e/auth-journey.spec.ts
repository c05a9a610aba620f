// The sign-in journey in a real browser: an owner signs in with a password and invites someone;
// the invitation arrives in the fake inbox; the new person accepts it without a password and lands
// in the workshop; a builder signs in with an e-mailed link.
import { expect, test } from "@playwright/test";
import { closeTestDb } from "../setup/test-db";
import { createWorkshopWithMembers, uniqueEmail, type TestWorkshop } from "../http/fixtures";
import { keepScreenshot } from "./screenshot";
import { openEmail, signInInBrowser } from "./sign-in";

let ws: TestWorkshop;

test.beforeAll(async () => {
  ws = await createWorkshopWithMembers({ name: `Journey Workshop ${Date.now()}` });
});
test.afterAll(async () => closeTestDb());

test("owner invites, the invitee accepts from the fake inbox, a builder signs in by link", async ({ browser }) => {
  test.setTimeout(120_000);
  const invitee = uniqueEmail("journey");

  // The owner signs in with a password: one workshop, so straight into it.
  const ownerCtx = await browser.newContext();
  const owner = await ownerCtx.newPage();
  await owner.goto("/sign-in");
  await keepScreenshot(owner, "sign-in");
  await signInInBrowser(owner, ws.owner);
  await expect(owner).toHaveURL(new RegExp(`/${ws.slug}$`));
  await expect(owner.getByRole("heading", { level: 1, name: ws.name })).toBeVisible();

  // Members: invite the new person as a client.
  await owner.getByRole("navigation", { name: "Workshop" }).getByRole("link", { name: "Members" }).click();
  await expect(owner.getByRole("heading", { name: "Invite someone" })).toBeVisible();
  await owner.getByLabel("E-mail address").fill("not-an-address");
  await owner.getByRole("button", { name: "Send invitation" }).click();
  await expect(owner.getByText("Enter a valid e-mail address")).toBeVisible();
  await owner.getByLabel("E-mail address").fill(invitee);
  await owner.getByLabel("Role", { exact: true }).selectOption("client");
  await owner.getByRole("button", { name: "Send invitation" }).click();
  await expect(owner.getByText(`Invitation sent to ${invitee}.`)).toBeVisible();
  await expect(owner.getByRole("table", { name: "Invitations" }).getByRole("row", { name: new RegExp(invitee) })).toContainText("Waiting");
  await keepScreenshot(owner, "members-owner");

  // The invitee opens the fake inbox in their own browser and follows the link in the e-mail.
  const inviteeCtx = await browser.newContext();
  const inbox = await inviteeCtx.newPage();
  await openEmail(inbox, invitee, /invited you to/);
  await keepScreenshot(inbox, "fake-inbox-invitation");
  // The e-mail's button opens a new tab, as in a mail client.
  const [page] = await Promise.all([
    inviteeCtx.waitForEvent("page"),
    inbox.frameLocator("iframe[title='E-mail body']").getByRole("link", { name: "Accept the invitation" }).click(),
  ]);
  await expect(page.getByRole("heading", { name: `Join ${ws.name}` })).toBeVisible();
  await page.getByLabel("Your name").fill("Journey Newcomer");
  await keepScreenshot(page, "accept-invitation");
  await page.getByRole("button", { name: "Accept and join" }).click();
  // No password chosen: signed in through a one-time link, landing in the workshop as a client.
  await expect(page).toHaveURL(new RegExp(`/${ws.slug}$`));
  await expect(page.getByText("You: Client")).toBeVisible();
  await expect(page.getByRole("link", { name: "Journey Newcomer" })).toBeVisible();
  // A client has no members page.
  await expect(page.getByRole("navigation", { name: "Workshop" }).getByRole("link", { name: "Members" })).toHaveCount(0);

  // The owner sees the new member and the used invitation.
  await owner.reload();
  await expect(owner.getByRole("table", { name: "Members" })).toContainText("Journey Newcomer");
  await expect(owner.getByRole("table", { name: "Invitations" }).getByRole("row", { name: new RegExp(invitee) })).toContainText("Joined");

  // The invitation link works once.
  await openEmail(page, invitee, /invited you to/);
  await page.getByRole("list").getByRole("link", { name: /\/invitations\// }).click();
  await expect(page.getByText("This invitation has already been used.")).toBeVisible();

  // A builder signs in with an e-mailed link.
  const builderCtx = await browser.newContext();
  const builder = await builderCtx.newPage();
  await builder.goto("/sign-in");
  await builder.getByRole("tab", { name: "E-mail me a link" }).click();
  const linkForm = builder.getByRole("form", { name: "Sign in with an e-mailed link" });
  await linkForm.getByLabel("E-mail").fill(ws.builder.email);
  await linkForm.getByRole("button", { name: "E-mail me a sign-in link" }).click();
  await expect(builder.getByText("a sign-in link is on its way")).toBeVisible();
  await openEmail(builder, ws.builder.email, /sign-in link/);
  await builder.getByRole("list").getByRole("link", { name: /callback\/email-link/ }).click();
  await expect(builder).toHaveURL(new RegExp(`/${ws.slug}$`));
  await expect(builder.getByText("You: Builder")).toBeVisible();

  // Signing out ends the session: the workshop sends the builder back to sign-in.
  await builder.getByRole("button", { name: "Sign out" }).click();
  await expect(builder).toHaveURL(/\/$/);
  await builder.goto(`/${ws.slug}`);
  await expect(builder).toHaveURL(/\/sign-in\?callbackUrl=/);

  await Promise.all([ownerCtx.close(), inviteeCtx.close(), builderCtx.close()]);
});

test("the members page and the switcher fit a phone", async ({ page }) => {
  await page.setViewportSize({ width: 375, height: 740 });
  await signInInBrowser(page, ws.owner, `/${ws.slug}/members`);
  await expect(page.getByRole("heading", { name: "Invite someone" })).toBeVisible();
  const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
  expect(overflow).toBeLessThanOrEqual(0);
  await page.getByLabel("Switch workshop").click();
  await expect(page.getByRole("link", { name: "+ Create a workshop" })).toBeVisible();
  await keepScreenshot(page, "members-phone");
});

test("a new person signs up, creates a workshop and becomes its owner", async ({ page }) => {
  const email = uniqueEmail("founder");
  await page.goto("/sign-up");
  await page.getByLabel("Your name").fill("Founding Maker");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill("short");
  await page.getByRole("button", { name: "Create the account" }).click();
  await expect(page.getByText("Use at least 10 characters.")).toBeVisible();
  await page.getByLabel("Password").fill("a-long-enough-password");
  await page.getByRole("button", { name: "Create the account" }).click();
  await expect(page).toHaveURL(/\/workshops\/new$/);
  const name = `Founders Bench ${Date.now()}`;
  // The address follows the name until edited. Typed again until the form has hydrated: on a busy
  // machine the first keystrokes can land before React is listening.
  await expect(async () => {
    await page.getByLabel("Workshop name").fill(name);
    await expect(page.getByLabel("Address")).toHaveValue(name.toLowerCase().replace(/ /g, "-"), { timeout: 1000 });
  }).toPass({ timeout: 30_000 });
  await page.getByLabel("Lengths shown in").selectOption("in");
  await page.getByLabel("Currency").selectOption("USD");
  await page.getByRole("button", { name: "Create the workshop" }).click();
  await expect(page.getByRole("heading", { level: 1, name })).toBeVisible();
  await expect(page.getByText("You: Owner")).toBeVisible();
  await expect(page.getByText("Inches")).toBeVisible();
});
