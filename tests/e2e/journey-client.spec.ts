// The client's journey in a real browser, one continuous story in a fresh workshop, on a phone: the
// client asks for an instrument and adds a reference picture; the workshop prices it and sends a
// spec (its part through the API); the client approves the spec, then a changed version 2 after
// seeing what changed and by how much the tension moves, sees the deposit due on the
// overview, pays it on the payment fake's hosted checkout page and watches the build start; the
// builder's stage photos then appear in the overview's timeline under their stage; the stage
// e-mails arrive in the fake inbox and their button leads back to that timeline.
import { expect as baseExpect, test, type Page } from "@playwright/test";
import { computeSpec } from "../../lib/lutherie/compute-spec";
import { formatForce } from "../../lib/lutherie/units";
import { DEFAULT_BUILD_STAGES } from "../../lib/workflow/stages";
import { base, draftSpec, move, sixStringSpec } from "../http/commission-helpers";
import { createWorkshopWithMembers, type TestWorkshop } from "../http/fixtures";
import { fileOf, installXhr, uploadPhotos } from "../http/photo-helpers";
import { signIn, type HttpSession } from "../http/session";
import { closeTestDb } from "../setup/test-db";
import { jpegWithGps, plainPng } from "../support/photos";
import { hydrated, SLOW } from "./hydration";
import { fillTestCard } from "./fake-checkout";
import { keepScreenshot } from "./screenshot";
import { openEmail, signInInBrowser } from "./sign-in";

const expect = baseExpect.configure({ timeout: 20_000 });
// A step that cannot happen fails within a minute instead of holding the run until the test times out.
test.use({ actionTimeout: 60_000, navigationTimeout: 60_000 });
const PHONE = { width: 390, height: 844 };
const [TIMBER, SHAPING] = DEFAULT_BUILD_STAGES as [(typeof DEFAULT_BUILD_STAGES)[number], (typeof DEFAULT_BUILD_STAGES)[number]];

let ws: TestWorkshop;
let api: { owner: HttpSession; builder: HttpSession };

test.beforeAll(async () => {
  installXhr(); // the builder's uploads go through the real upload client from this process
  ws = await createWorkshopWithMembers({ name: `Client Journey ${Date.now()}` });
  api = { owner: await signIn(ws.owner), builder: await signIn(ws.builder) };
});
test.afterAll(async () => closeTestDb());

/** The page itself never scrolls sideways (tables scroll inside their own box). */
async function expectNoSidewaysScroll(page: Page) {
  const { scrollWidth, innerWidth } = await page.evaluate(() => ({ scrollWidth: document.documentElement.scrollWidth, innerWidth: window.innerWidth }));
  expect(scrollWidth, "page width").toBeLessThanOrEqual(innerWidth);
}

const stageOf = (page: Page) => page.getByTestId("commission-header").locator("[data-stage]");
const tab = (page: Page, name: string) => page.getByRole("navigation", { name: "Commission" }).getByRole("link", { name, exact: true });

test("client: request → spec approval → deposit on the checkout page → stage photos in the timeline → stage e-mails", async ({ browser }) => {
  test.setTimeout(Math.max(480_000, test.info().timeout));
  const context = await browser.newContext({ viewport: PHONE });
  const client = await context.newPage();

  // 1. The client asks for an instrument.
  await signInInBrowser(client, ws.client, `/${ws.slug}/commissions/new`);
  const send = await hydrated(client.getByRole("button", { name: "Send the request" }));
  await client.getByLabel("Title").fill("Short-scale offset for a small player");
  await client.getByLabel("What you have in mind").fill("24 in scale, alder body, two single coils, sunburst.");
  await send.click();
  await client.waitForURL(new RegExp(`/${ws.slug}/commissions/\\d+$`), SLOW);
  const id = Number(new URL(client.url()).pathname.split("/").pop());
  await expect(client.getByTestId("commission-title")).toHaveText("Short-scale offset for a small player");
  await expect(stageOf(client)).toHaveAttribute("data-stage", "spec");
  await expect(client.getByText("The workshop has not sent you a spec yet.")).toBeVisible();

  // 2. While the spec is agreed the client may add reference pictures, on the Photos tab.
  await tab(client, "Photos").click();
  await expect(client.getByRole("heading", { name: "Add reference pictures" })).toBeVisible(SLOW);
  await hydrated(client.getByRole("button", { name: "Upload" }));
  await client.getByLabel("Caption").fill("The sunburst I have in mind");
  await client.getByLabel("Photos", { exact: true }).setInputFiles({ name: "sunburst.png", mimeType: "image/png", buffer: await plainPng(600, 400, 5) });
  await client.getByRole("button", { name: "Upload" }).click();
  await expect(client.getByText("1 photo added to “Spec”.")).toBeVisible(SLOW);
  await expectNoSidewaysScroll(client);

  // 3. The workshop's part, through the API: the owner prices it and assigns the builder; the
  //    builder drafts the spec and sends it.
  const patched = await api.owner.fetch(`${base(ws)}/${id}`, { method: "PATCH", json: { priceMinor: 280_000, builderId: ws.builder.userId } });
  expect(patched.status).toBe(200);
  const version = await draftSpec(api.builder, ws, id);
  expect((await api.builder.fetch(`${base(ws)}/${id}/spec-versions/${version.id}/submit`, { method: "POST", json: {} })).status).toBe(200);

  // 4. The e-mail says the spec is ready; the client approves it.
  await openEmail(client, ws.client.email, /Your spec is ready to approve/);
  await client.goto(`/${ws.slug}/commissions/${id}/spec`);
  await expect(client.getByRole("heading", { name: "Version 1 is waiting for your approval" })).toBeVisible(SLOW);
  await (await hydrated(client.getByRole("button", { name: "Approve version 1" }))).click();
  await client.getByRole("dialog").getByRole("button", { name: "Yes, approve version 1" }).click();
  await expect(client.getByText(/You approved version 1 on/)).toBeVisible();
  await expect(stageOf(client)).toHaveAttribute("data-stage", "deposit");
  await openEmail(client, ws.client.email, /Spec approved, deposit due/);

  // 4b. The builder changes string 6 and sends version 2: the client sees what changed since the
  //     approved version 1, with the change in total tension, and approves again.
  const v1Spec = sixStringSpec();
  const v2Spec = sixStringSpec();
  v2Spec.strings[5]!.gaugeIn = 0.049;
  const version2 = await draftSpec(api.builder, ws, id, v2Spec);
  expect((await api.builder.fetch(`${base(ws)}/${id}/spec-versions/${version2.id}/submit`, { method: "POST", json: {} })).status).toBe(200);
  await client.goto(`/${ws.slug}/commissions/${id}/spec`);
  await expect(client.getByRole("heading", { name: "Version 2 is waiting for your approval" })).toBeVisible(SLOW);
  const changes = client.getByRole("table", { name: "Changed fields" });
  await expect(changes.getByRole("row", { name: /String 6 gauge/ })).toContainText("0.0490");
  await expect(changes.getByRole("row")).toHaveCount(2); // header + the one change
  const delta = computeSpec(v2Spec).totals.tensionN - computeSpec(v1Spec).totals.tensionN;
  await expect(client.getByTestId("tension-change")).toContainText(`+${formatForce(delta, "N")} N`);
  await expectNoSidewaysScroll(client);
  await keepScreenshot(client, "journey-client-spec-diff-phone");
  await (await hydrated(client.getByRole("button", { name: "Approve version 2" }))).click();
  await client.getByRole("dialog").getByRole("button", { name: "Yes, approve version 2" }).click();
  await expect(client.getByText(/You approved version 2 on/)).toBeVisible();
  await expect(stageOf(client)).toHaveAttribute("data-stage", "deposit");

  // 5. The overview shows what is due, with the way to pay it.
  await client.goto(`/${ws.slug}/commissions/${id}`);
  const money = client.getByTestId("money");
  await expect(money.getByTestId("price")).toHaveText("€2,800.00");
  await expect(money.getByTestId("deposit-status")).toContainText("Due");
  await expect(money.getByTestId("deposit-status")).toContainText("€840.00 to pay"); // 30 % of 2,800.00
  await expect(money.getByTestId("balance-status")).toContainText("Not due yet");
  await keepScreenshot(client, "journey-client-overview-deposit-due-phone");
  await (await hydrated(client.getByRole("link", { name: "Pay the deposit on the Payments tab" }))).click();

  // 6. The deposit, on the payment fake's hosted page.
  await client.waitForURL((u) => u.pathname === `/${ws.slug}/commissions/${id}/payments`, SLOW);
  const pay = await hydrated(client.getByTestId("pay-now").getByRole("button", { name: "Pay deposit €840.00" }));
  await expectNoSidewaysScroll(client);
  await keepScreenshot(client, "journey-client-payments-phone");
  await pay.click();
  await client.waitForURL(/\/pay\/cs_test_/, SLOW);
  await expect(client.getByTestId("amount-due")).toHaveText("€840.00");
  await fillTestCard(client, ws.client.name);
  await keepScreenshot(client, "journey-client-fake-checkout-phone");
  await client.getByRole("button", { name: /^Pay €840\.00$/ }).click();
  await client.waitForURL((u) => u.pathname === `/${ws.slug}/commissions/${id}/payments` && u.searchParams.get("checkout") === "success", SLOW);
  // The page refreshes itself until the processor's webhook has been applied; the header follows.
  await expect(client.getByText("Payment received, thank you.")).toBeVisible(SLOW);
  await expect(client.getByRole("table", { name: "Invoices" }).getByRole("row", { name: /Deposit/ })).toContainText("Paid");
  await expect(stageOf(client)).toHaveAttribute("data-stage", TIMBER.key);
  await openEmail(client, ws.client.email, /Receipt: deposit of €840\.00/);
  await openEmail(client, ws.client.email, /Your build has started/);

  // 7. The builder photographs the work and moves it on (through the API, as the builder's app would).
  const [up] = await uploadPhotos(api.builder, ws, id, [fileOf(await jpegWithGps(1600, 1200, { seed: 41 }), "blank.jpg")], "Alder body blank, two pieces glued");
  expect(up?.serverData).toMatchObject({ ok: true, stage: TIMBER.key });
  expect((await move(api.builder, ws, id, "advance", "Body routed and the neck carved.")).status).toBe(200);

  // 8. The stage e-mail arrives; its button opens the commission, whose timeline shows each stage's photos.
  await openEmail(client, ws.client.email, new RegExp(`${SHAPING.label}:`));
  const [overview] = await Promise.all([
    context.waitForEvent("page"),
    client.frameLocator("iframe[title='E-mail body']").getByRole("link", { name: "See the progress photos" }).click(),
  ]);
  await overview.waitForURL((u) => u.pathname === `/${ws.slug}/commissions/${id}`, SLOW);
  const timeline = overview.getByRole("list", { name: "Timeline" });
  await expect(timeline.getByRole("listitem").first()).toContainText(`${TIMBER.label} → ${SHAPING.label}`, SLOW);
  await expect(timeline.getByRole("listitem").first()).toContainText("Body routed and the neck carved.");
  const timberPhotos = timeline.getByRole("group", { name: `Photos: ${TIMBER.label}` });
  const photo = timberPhotos.getByRole("img", { name: "Alder body blank, two pieces glued" });
  await expect(photo).toBeVisible();
  await expect.poll(() => photo.evaluate((el) => (el as HTMLImageElement).naturalWidth), SLOW).toBe(480); // the thumbnail
  // …under the move into that stage, not under the newer one.
  await expect(timeline.getByRole("listitem").filter({ hasText: `Deposit → ${TIMBER.label}` })).toContainText("1 photo of");
  await expect(timeline.getByRole("group", { name: "Photos: Spec" }).getByRole("img", { name: "The sunburst I have in mind" })).toBeVisible();
  await expect(overview.getByTestId("money").getByTestId("deposit-status")).toContainText("Paid");
  await expect(overview.getByTestId("money").getByTestId("paid-so-far")).toHaveText("€840.00");
  await expectNoSidewaysScroll(overview);
  await keepScreenshot(overview, "journey-client-timeline-photos-phone");

  // 9. The Photos tab has the full gallery by stage.
  await (await hydrated(timberPhotos.getByRole("link", { name: "Open the Photos tab" }))).click();
  await overview.waitForURL((u) => u.pathname === `/${ws.slug}/commissions/${id}/photos`, SLOW);
  await expect(overview.getByRole("region", { name: TIMBER.label }).getByRole("img", { name: "Alder body blank, two pieces glued" })).toBeVisible();
  await expect(overview.getByText(/reference pictures only while the spec is being agreed/)).toBeVisible();
  await context.close();
});
