// A client pays the deposit in a real browser: from the commission's payments page to the payment
// fake's hosted checkout page, back once with "cancel", then with a test card; the processor's
// webhook confirms it, the commission moves to its first build stage and the receipt arrives in
// the fake inbox.
import { expect, test, type Browser } from "@playwright/test";
import { DEFAULT_BUILD_STAGES } from "../../lib/workflow/stages";
import { closeTestDb } from "../setup/test-db";
import { detail } from "../http/commission-helpers";
import { createWorkshopWithMembers, type TestWorkshop } from "../http/fixtures";
import { commissionAwaitingDeposit, paymentRows } from "../http/payment-helpers";
import { signIn, type HttpSession } from "../http/session";
import { fillTestCard } from "./fake-checkout";
import { keepScreenshot } from "./screenshot";
import { openEmail, signInInBrowser } from "./sign-in";

let ws: TestWorkshop;
let owner: HttpSession;
let commissionId: number;
let commissionNumber: string;

test.beforeAll(async () => {
  ws = await createWorkshopWithMembers({ name: `Deposit Journey ${Date.now()}` });
  const [o, builder, client] = await Promise.all([signIn(ws.owner), signIn(ws.builder), signIn(ws.client)]);
  owner = o;
  const c = await commissionAwaitingDeposit({ owner, builder, client }, ws, { title: "Walnut baritone, 27 in" });
  commissionId = c.id;
  commissionNumber = c.number;
});
test.afterAll(async () => closeTestDb());

const paymentsPathOf = () => `/${ws.slug}/commissions/${commissionId}/payments`;

/** A fresh browser context signed in as `person`, on the commission's payments page. */
async function openPayments(browser: Browser, person: { email: string; password: string }) {
  const ctx = await browser.newContext();
  const page = await ctx.newPage();
  await signInInBrowser(page, person, paymentsPathOf());
  await expect(page).toHaveURL(new RegExp(`${paymentsPathOf()}$`));
  return { ctx, page };
}

test("a client pays the deposit on the hosted checkout page and the build starts", async ({ browser }) => {
  test.setTimeout(120_000);
  const firstStage = DEFAULT_BUILD_STAGES[0]!;
  const paymentsPath = paymentsPathOf();
  const { ctx, page } = await openPayments(browser, ws.client);
  const invoices = page.getByRole("table", { name: "Invoices" });
  await expect(invoices.getByRole("row", { name: /Deposit/ })).toContainText("Due");
  await keepScreenshot(page, "payments-client-due");

  // First visit to the payment page: the client changes their mind and comes back.
  await page.getByRole("button", { name: "Pay deposit €900.00" }).click();
  await page.waitForURL(/\/pay\/cs_test_/);
  const sessionUrl = page.url();
  await expect(page.getByTestId("amount-due")).toHaveText("€900.00");
  await page.getByRole("link", { name: "Cancel and go back" }).click();
  await page.waitForURL((u) => u.pathname === paymentsPath && u.searchParams.get("checkout") === "cancelled");
  await expect(page.getByText("Payment cancelled: nothing was charged.")).toBeVisible();
  await expect(invoices.getByRole("row", { name: /Deposit/ })).toContainText("A card checkout is open");

  // Second click: the same open session, paid with a test card this time.
  await page.getByRole("button", { name: "Pay deposit €900.00" }).click();
  await page.waitForURL(sessionUrl);
  await fillTestCard(page, ws.client.name);
  await keepScreenshot(page, "payments-fake-checkout");
  await page.getByRole("button", { name: /^Pay €900\.00$/ }).click();

  await page.waitForURL((u) => u.pathname === paymentsPath && u.searchParams.get("checkout") === "success");
  // The page refreshes itself until the processor's webhook has been applied.
  await expect(page.getByText("Payment received, thank you.")).toBeVisible({ timeout: 30_000 });
  await expect(invoices.getByRole("row", { name: /Deposit/ })).toContainText("Paid");
  await expect(invoices.getByRole("row", { name: /Balance/ })).toContainText("Due");
  // The commission's header (from the layout) follows the move the payment caused.
  await expect(page.getByTestId("commission-header").locator("[data-stage]")).toHaveAttribute("data-stage", firstStage.key);
  await keepScreenshot(page, "payments-client-paid");

  expect((await detail(owner, ws, commissionId)).stage).toBe(firstStage.key);
  expect((await paymentRows(commissionId)).map((r) => [r.kind, r.status, r.amount_minor])).toEqual([["deposit", "paid", 90_000]]);

  // The receipt, in the fake inbox, links back to the payments page.
  const inbox = await ctx.newPage();
  await openEmail(inbox, ws.client.email, new RegExp(`Receipt: deposit of €900\\.00 for ${commissionNumber}`));
  const body = inbox.frameLocator("iframe[title='E-mail body']");
  await expect(body.locator("body")).toContainText(`we have received your deposit of €900.00 for commission ${commissionNumber}`);
  await expect(body.getByRole("link", { name: "See your payments" })).toHaveAttribute("href", new RegExp(`${paymentsPath}$`));
  await keepScreenshot(inbox, "payments-receipt-email");
  await ctx.close();
});

test("the owner records a bank transfer and refunds part of the card deposit", async ({ browser }) => {
  test.setTimeout(120_000);
  const { ctx, page } = await openPayments(browser, ws.owner);
  const history = page.getByRole("table", { name: "Payments and refunds" });
  // The workshop sees the processor's fee and net: 1.45 % of 900.00 + 0.25 (the fake's schedule).
  await expect(history.getByRole("row", { name: /Deposit by card/ })).toContainText("€13.30");
  await expect(history.getByRole("row", { name: /Deposit by card/ })).toContainText("€886.70");

  const record = page.getByRole("form", { name: "Record a payment" });
  await record.getByLabel("For").selectOption("balance");
  await record.getByLabel("Amount (EUR)").fill("five hundred");
  await record.getByRole("button", { name: "Record payment" }).click();
  await expect(record.getByText("Enter an amount in EUR, like 900 or 900.50.")).toBeVisible();
  await record.getByLabel("Amount (EUR)").fill("500");
  await record.getByLabel("Reference").fill("x");
  await record.getByRole("button", { name: "Record payment" }).click();
  await expect(record.getByText("Give the reference (bank transfer, receipt number…).")).toBeVisible();
  await record.getByLabel("Reference").fill("Transfer BX-4471");
  await record.getByRole("button", { name: "Record payment" }).click();
  await expect(record.getByText("Payment recorded.")).toBeVisible();
  await expect(history.getByRole("row", { name: /Balance, recorded by the workshop/ })).toContainText("Transfer BX-4471");

  const refund = page.getByRole("form", { name: "Refund a payment" });
  await refund.getByLabel("Payment").selectOption({ label: "#" + String((await paymentRows(commissionId))[0]!.id) + " Deposit by card, €900.00" });
  await refund.getByLabel("Amount").fill("1000");
  await refund.getByRole("button", { name: "Refund…" }).click();
  await expect(refund.getByText("At most €900.00 can be refunded of this payment.")).toBeVisible();
  await refund.getByLabel("Amount").fill("150");
  await refund.getByLabel("Reason").fill("Pickguard left off, agreed with the client");
  await refund.getByRole("button", { name: "Refund…" }).click();
  await expect(refund.getByText(/Refund €150\.00 of payment #\d+ to the client's card\?/)).toBeVisible();
  await refund.getByRole("button", { name: "Confirm refund" }).click();
  await expect(refund.getByText("Refund sent to the payment service.")).toBeVisible();
  // Pending until the processor's event arrives; then it is a refund that went through.
  await expect(async () => {
    await page.reload();
    await expect(history.getByRole("row", { name: /Refund of payment/ })).toContainText("Refunded", { timeout: 1000 });
  }).toPass({ timeout: 30_000 });
  await expect(history.getByRole("row", { name: /Refund of payment/ })).toContainText("Pickguard left off");
  await keepScreenshot(page, "payments-owner");
  const rows = await paymentRows(commissionId);
  expect(rows.map((r) => [r.kind, r.status, r.amount_minor])).toEqual([
    ["deposit", "paid", 90_000],
    ["balance", "paid", 50_000],
    ["refund", "paid", 15_000],
  ]);
  await ctx.close();
});
