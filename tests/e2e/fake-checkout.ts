// Fills in the payment fake's hosted checkout page with a test card that the fake accepts.
import type { Page } from "@playwright/test";

export async function fillTestCard(page: Page, name: string, card = { number: "4242 4242 4242 4242", expiry: "11/32", cvc: "271" }): Promise<void> {
  await page.getByLabel("Name on card").fill(name);
  await page.getByLabel("Card number").fill(card.number);
  await page.getByLabel("Expiry (MM/YY)").fill(card.expiry);
  await page.getByLabel("Security code").fill(card.cvc);
}
