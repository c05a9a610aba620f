// The commission journey in a real browser, one context per person: a client asks for an
// instrument on a phone; the owner assigns a builder and sets the price; the builder drafts the
// spec on a shop tablet with live figures and sends it; the client approves it, then approves a
// second version seeing what changed; the deposit is recorded (offline, by the bookkeeper over the
// API), which starts the build; the builder moves it on with a note, the owner signs a move off; the client's stage
// e-mails arrive in the fake inbox. Expected figures come from the same pure build-math module
// that tests/unit/lutherie checks against its published sources.
import { expect, test, type Browser, type Page } from "@playwright/test";
import { computeSpec } from "../../lib/lutherie/compute-spec";
import { presetById } from "../../lib/lutherie/presets";
import { formatForce } from "../../lib/lutherie/units";
import type { CommissionDetail } from "../../lib/schemas/commission-out";
import { createWorkshopWithMembers, type TestMember, type TestWorkshop } from "../http/fixtures";
import { signIn } from "../http/session";
import { closeTestDb, testDb } from "../setup/test-db";
import { keepScreenshot } from "./screenshot";
import { openEmail, signInInBrowser } from "./sign-in";

const PHONE = { width: 390, height: 844 };
const TABLET = { width: 1024, height: 768 };

let ws: TestWorkshop;

test.beforeAll(async () => {
  ws = await createWorkshopWithMembers({ name: `Commission Journey ${Date.now()}` });
});
test.afterAll(async () => closeTestDb());

async function personPage(browser: Browser, person: TestMember, path: string, viewport = { width: 1280, height: 900 }): Promise<Page> {
  const ctx = await browser.newContext({ viewport });
  const page = await ctx.newPage();
  await signInInBrowser(page, person, path);
  return page;
}

/** The page itself never scrolls sideways (tables scroll inside their own box). */
async function expectNoSidewaysScroll(page: Page) {
  const { scrollWidth, innerWidth } = await page.evaluate(() => ({ scrollWidth: document.documentElement.scrollWidth, innerWidth: window.innerWidth }));
  expect(scrollWidth, "page width").toBeLessThanOrEqual(innerWidth);
}

const totalN = (spec: ReturnType<typeof six>) => computeSpec(spec).totals.tensionN;
const six = () => structuredClone(presetById("six").spec);

test("client request → spec with live figures → approval with diff → deposit → build stages and e-mails", async ({ browser }) => {
  test.setTimeout(Math.max(300_000, test.info().timeout));
  const base = `/${ws.slug}/commissions`;

  // 1. The client asks for an instrument, on a phone.
  const client = await personPage(browser, ws.client, base, PHONE);
  await expect(client.getByText("No commissions yet: you have not asked for an instrument.")).toBeVisible();
  await client.getByRole("link", { name: "Ask for a new instrument" }).click();
  await client.getByRole("button", { name: "Send the request" }).click();
  await expect(client.getByText("Give the commission a title (at least 3 characters).")).toBeVisible();
  await client.getByLabel("Title").fill("Seven-string for drop tunings");
  await client.getByLabel("What you have in mind").fill("Alder body, maple neck, 26.5 in scale, two humbuckers.");
  await expectNoSidewaysScroll(client);
  await keepScreenshot(client, "commission-request-phone");
  await client.getByRole("button", { name: "Send the request" }).click();
  await client.waitForURL(new RegExp(`${base}/\\d+$`));
  const id = Number(client.url().split("/").pop());
  await expect(client.getByTestId("commission-title")).toHaveText("Seven-string for drop tunings");
  await expect(client.getByRole("list", { name: "Stage line" }).locator("[aria-current=step]")).toHaveText(/Spec/);
  await expect(client.getByText("The workshop has not sent you a spec yet.")).toBeVisible();
  await expectNoSidewaysScroll(client);

  // 2. The owner sees the request, assigns the builder and sets the price.
  const owner = await personPage(browser, ws.owner, base);
  await owner.getByRole("table", { name: "Commissions" }).getByRole("link").first().click();
  await expect(owner.getByTestId("commission-title")).toHaveText("Seven-string for drop tunings");
  await expect(owner.getByText("Alder body, maple neck")).toBeVisible();
  await owner.getByRole("button", { name: "Change" }).click();
  await owner.getByLabel("Builder").selectOption({ label: ws.builder.name });
  await owner.getByLabel("Price (EUR)").fill("abc");
  await owner.getByRole("button", { name: "Save changes" }).click();
  await expect(owner.getByText("Enter an amount such as 3200 or 3200.50.")).toBeVisible();
  await owner.getByLabel("Price (EUR)").fill("3200");
  await owner.getByRole("button", { name: "Save changes" }).click();
  await expect(owner.getByTestId("price")).toHaveText("€3,200.00");
  await expect(owner.getByText(ws.builder.name).first()).toBeVisible();
  // Nothing can move yet: the spec is not approved, and the button says so.
  await expect(owner.getByRole("button", { name: "Move to Deposit" })).toBeDisabled();
  await expect(owner.getByText("The client has not approved a spec version yet.")).toBeVisible();
  await keepScreenshot(owner, "commission-overview-owner");

  // 3. The builder, on a shop tablet, finds it on the board and drafts the spec.
  const builder = await personPage(browser, ws.builder, `${base}/board`, TABLET);
  const specColumn = builder.getByRole("listitem").filter({ has: builder.getByRole("heading", { name: /^Spec/ }) });
  await expect(specColumn.getByRole("link", { name: /Seven-string for drop tunings/ })).toBeVisible();
  await expectNoSidewaysScroll(builder);
  await keepScreenshot(builder, "board-builder-tablet");
  await specColumn.getByRole("link", { name: /Seven-string for drop tunings/ }).click();
  await builder.getByRole("navigation", { name: "Commission" }).getByRole("link", { name: "Spec" }).click();
  await expect(builder.getByRole("heading", { name: "Draft the first version" })).toBeVisible();
  const live = builder.getByTestId("live-total-tension");
  await expect(live).toHaveText(`${formatForce(totalN(six()), "N")} N`);
  // Live figures: a heavier string 1 raises the total at once, before anything is saved.
  const v1 = six();
  v1.strings[0]!.gaugeIn = 0.011;
  await builder.getByLabel("String 1 gauge (in)").fill("0.011");
  await expect(live).toHaveText(`${formatForce(totalN(v1), "N")} N`);
  await expect(builder.getByTestId("total-tension")).toHaveText(`${formatForce(totalN(v1), "N")} N`);
  // A computed error shows on its field and in the checks; fixing it clears both.
  await builder.getByLabel("String 1 note").fill("A4");
  await expect(builder.getByRole("list", { name: "Errors and warnings" })).toContainText("error");
  await expect(builder.locator("[data-issue=error]").first()).toBeVisible();
  await builder.getByLabel("String 1 note").fill("E4");
  await expect(builder.locator("[data-issue=error]")).toHaveCount(0);
  await builder.getByLabel("Body wood").fill("Alder");
  await builder.getByLabel("Neck wood").fill("Maple");
  await builder.getByLabel("Finish").fill("Satin oil");
  await expectNoSidewaysScroll(builder);
  await keepScreenshot(builder, "spec-editor-tablet");
  await builder.getByRole("button", { name: "Save as version 1" }).click();
  await expect(builder.getByText("Saved as version 1.")).toBeVisible();
  await expect(builder.getByRole("table", { name: "Spec versions" })).toContainText("v1");
  await builder.getByRole("button", { name: "Send version 1 to the client" }).click();
  await expect(builder.getByText("Version 1 is with the client, waiting for their approval.")).toBeVisible();

  // 4. The client gets the e-mail and approves version 1.
  await openEmail(client, ws.client.email, /Your spec is ready to approve/);
  await client.goto(`${base}/${id}/spec`);
  await expect(client.getByRole("heading", { name: "Version 1 is waiting for your approval" })).toBeVisible();
  await expect(client.getByText("Version 1 is locked.", { exact: false })).toBeVisible();
  await expect(client.getByTestId("total-tension")).toHaveText(`${formatForce(totalN(v1), "N")} N`);
  await expectNoSidewaysScroll(client);
  await client.getByRole("button", { name: "Approve version 1" }).click();
  await client.getByRole("dialog").getByRole("button", { name: "Yes, approve version 1" }).click();
  await expect(client.getByText(/You approved version 1 on/)).toBeVisible();
  await expect(client.getByTestId("commission-header").locator("[data-stage]")).toHaveAttribute("data-stage", "deposit");
  await openEmail(client, ws.client.email, /Spec approved, deposit due/);

  // 5. The builder changes the spec: a floating tremolo and a heavier string 6 → version 2.
  await builder.reload();
  await expect(builder.getByRole("heading", { name: "Draft version 2" })).toBeVisible();
  const v2 = structuredClone(v1);
  v2.strings[5]!.gaugeIn = 0.049;
  await builder.getByLabel("String 6 gauge (in)").fill("0.049");
  await builder.getByLabel("Bridge", { exact: true }).selectOption("floating_tremolo");
  await expect(live).toHaveText(`${formatForce(totalN(v2), "N")} N`);
  await builder.getByRole("button", { name: "Save as version 2" }).click();
  await expect(builder.getByText("Saved as version 2.")).toBeVisible();
  await builder.getByRole("button", { name: "Send version 2 to the client" }).click();
  await expect(builder.getByText("Version 2 is with the client, waiting for their approval.")).toBeVisible();

  // 6. The client sees what changed since version 1, with the tension change and the springs note.
  await client.goto(`${base}/${id}/spec`);
  await expect(client.getByRole("heading", { name: "Version 2 is waiting for your approval" })).toBeVisible();
  const changes = client.getByRole("table", { name: "Changed fields" });
  await expect(changes.getByRole("row", { name: /Bridge/ })).toContainText("Fixed bridge");
  await expect(changes.getByRole("row", { name: /Bridge/ })).toContainText("Floating tremolo");
  await expect(changes.getByRole("row", { name: /String 6 gauge/ })).toContainText("0.0490");
  await expect(changes.getByRole("row")).toHaveCount(3); // header + the two changes
  const delta = totalN(v2) - totalN(v1);
  await expect(client.getByTestId("tension-change")).toContainText(`+${formatForce(delta, "N")} N`);
  await expect(client.getByTestId("tremolo-note")).toContainText("tremolo springs must be rebalanced");
  await expectNoSidewaysScroll(client);
  await keepScreenshot(client, "spec-approval-diff-phone");
  await client.getByRole("button", { name: "Approve version 2" }).click();
  await client.getByRole("dialog").getByRole("button", { name: "Yes, approve version 2" }).click();
  await expect(client.getByText(/You approved version 2 on/)).toBeVisible();

  // 7. The deposit is recorded offline by the bookkeeper (the payments screens are another feature's).
  await builder.goto(`${base}/${id}`);
  await expect(builder.getByRole("button", { name: "Move to Timber selection" })).toBeDisabled();
  await expect(builder.getByText("The deposit has not been paid.")).toBeVisible();
  // (Recording the deposit moves the commission on by itself: lib/data/payments.ts.)
  const ownerApi = await signIn(ws.owner);
  const detail = (await ownerApi.json<{ commission: CommissionDetail }>(`/api/workshops/${ws.slug}/commissions/${id}`)).body.commission;
  const bookkeeper = await signIn(ws.bookkeeper);
  const paid = await bookkeeper.fetch(`/api/workshops/${ws.slug}/commissions/${id}/payments`, {
    method: "POST",
    json: { kind: "deposit", amountMinor: detail.money!.depositMinor, reference: "Bank transfer 2027-0042" },
  });
  expect(paid.status).toBe(201);

  // 8. The recorded deposit starts the build; the builder moves it on with a note; the client hears of both.
  await builder.reload();
  const current = (page: Page) => page.getByRole("list", { name: "Stage line" }).locator("[aria-current=step]");
  await expect(current(builder)).toHaveText(/Timber selection/);
  const timeline = builder.getByRole("list", { name: "Timeline" });
  await expect(timeline.getByRole("listitem").first()).toContainText("Deposit → Timber selection");
  await openEmail(client, ws.client.email, /Your build has started/);
  await builder.getByLabel("Note with the move (optional)").fill("Alder body blank and maple neck blank chosen.");
  await builder.getByRole("button", { name: "Move to Body and neck shaping" }).click();
  await expect(builder.getByText("Move to Body and neck shaping: done.")).toBeVisible();
  await expect(timeline.getByRole("listitem").first()).toContainText("Timber selection → Body and neck shaping");
  await expect(timeline.getByRole("listitem").first()).toContainText("Alder body blank and maple neck blank chosen.");
  await expect(current(builder)).toHaveText(/Body and neck shaping/);
  await keepScreenshot(builder, "commission-overview-builder-tablet");
  await openEmail(client, ws.client.email, /Body and neck shaping:/);

  // 9. With the owner's sign-off required, the next move waits for it before the client is told.
  await testDb()("workshops").where({ id: ws.id }).update({ require_stage_signoff: true });
  await builder.reload();
  await builder.getByRole("button", { name: "Move to Fretboard and frets" }).click();
  await expect(builder.getByText("The client is told once the owner signs it off.")).toBeVisible();
  await client.goto(`${base}/${id}`);
  await expect(current(client)).toHaveText(/Body and neck shaping/);
  await owner.goto(`${base}/${id}`);
  await expect(owner.getByText("waiting for the owner's sign-off")).toBeVisible();
  await owner.getByRole("button", { name: "Sign off and tell the client" }).click();
  await expect(owner.getByText("signed off", { exact: true })).toBeVisible();
  await openEmail(client, ws.client.email, /Fretboard and frets:/);
  await client.goto(`${base}/${id}`);
  await expect(current(client)).toHaveText(/Fretboard and frets/);
  await expect(client.getByRole("list", { name: "Timeline" })).toContainText("Alder body blank and maple neck blank chosen.");
  await expectNoSidewaysScroll(client);
  await keepScreenshot(client, "commission-overview-client-phone");

  // 10. Comments both ways.
  await client.getByLabel("Message to the workshop").fill("Could the headstock have a reverse angle?");
  await client.getByRole("button", { name: "Send" }).click();
  await expect(client.getByRole("list", { name: "Comments" })).toContainText("Could the headstock have a reverse angle?");
  await builder.reload();
  await expect(builder.getByRole("list", { name: "Comments" })).toContainText("Could the headstock have a reverse angle?");
  await builder.getByLabel("Message to the client").fill("Yes: we will draw it in the next spec version.");
  await builder.getByRole("button", { name: "Send" }).click();
  await client.reload();
  await expect(client.getByRole("list", { name: "Comments" })).toContainText("we will draw it in the next spec version");
});
