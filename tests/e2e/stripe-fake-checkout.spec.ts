// The fake processor's hosted checkout page in a real browser: pay with a test card and land back
// on the success URL; a declined card shows the decline and keeps the payer on the page.
import { expect, test } from "@playwright/test";
import { createStripeClient, stripeSettings } from "../../lib/services/stripe";
import { keepScreenshot } from "./screenshot";

const stripe = createStripeClient(stripeSettings());

async function newSession(baseURL: string) {
  return stripe.checkout.sessions.create({
    mode: "payment",
    line_items: [{ quantity: 1, price_data: { currency: "eur", unit_amount: 96_000, product_data: { name: "Deposit: commission FH-0031" } } }],
    success_url: `${baseURL}/?paid={CHECKOUT_SESSION_ID}`,
    cancel_url: `${baseURL}/?cancelled=1`,
    customer_email: "otto.lindqvist@example.com",
    metadata: { invoice_id: "e2e" },
  });
}

test("pays on the hosted checkout page with a test card and returns to the success URL", async ({ page, baseURL }) => {
  const session = await newSession(baseURL!);
  await page.goto(session.url!);
  await expect(page.getByTestId("amount-due")).toHaveText("€960.00");
  await expect(page.getByText("Test mode: no real money moves")).toBeVisible();
  await keepScreenshot(page, "stripe-fake-checkout");

  await page.getByLabel("Name on card").fill("Otto Lindqvist");
  // The "Use" button of the first test card fills the number.
  await page.getByRole("row", { name: /Visa, succeeds/ }).getByRole("button", { name: "Use" }).click();
  await expect(page.getByLabel("Card number")).toHaveValue("4242424242424242");
  await page.getByLabel("Expiry (MM/YY)").fill("11/32");
  await page.getByLabel("Security code").fill("271");
  await page.getByRole("button", { name: /^Pay €960\.00$/ }).click();

  await page.waitForURL(`${baseURL}/?paid=${session.id}`);
  const after = await stripe.checkout.sessions.retrieve(session.id, { expand: ["payment_intent"] });
  expect(after.status).toBe("complete");
  expect(after.payment_status).toBe("paid");
  expect((after.payment_intent as { status: string }).status).toBe("succeeded");
});

test("a declined card is shown on the page and nothing is charged", async ({ page, baseURL }) => {
  const session = await newSession(baseURL!);
  await page.goto(session.url!);
  await page.getByLabel("Card number").fill("4000 0000 0000 0002");
  await page.getByLabel("Expiry (MM/YY)").fill("11/32");
  await page.getByLabel("Security code").fill("271");
  await page.getByRole("button", { name: /^Pay / }).click();

  await expect(page.getByRole("alert")).toContainText("Your card was declined.");
  expect(page.url()).toBe(session.url);
  await keepScreenshot(page, "stripe-fake-checkout-declined");
  const after = await stripe.checkout.sessions.retrieve(session.id, { expand: ["payment_intent"] });
  expect(after.status).toBe("open");
  expect((after.payment_intent as { status: string }).status).toBe("requires_payment_method");

  // On a phone the page still fits.
  await page.setViewportSize({ width: 375, height: 740 });
  const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
  expect(overflow).toBeLessThanOrEqual(0);

  await page.getByRole("link", { name: "Cancel and go back" }).click();
  await page.waitForURL(`${baseURL}/?cancelled=1`);
});
