// Browser helpers for later journeys: sign in through the real form, and open the fake inbox.
import { expect, type Page } from "@playwright/test";

/** Signs in with e-mail and password through /sign-in and waits until the app has taken over. */
export async function signInInBrowser(page: Page, person: { email: string; password: string }, callbackPath = "/workshops"): Promise<void> {
  await page.goto(`/sign-in?callbackUrl=${encodeURIComponent(callbackPath)}`);
  const form = page.getByRole("form", { name: "Sign in with a password" });
  await form.getByLabel("E-mail").fill(person.email);
  await form.getByLabel("Password").fill(person.password);
  await form.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL((u) => !u.pathname.startsWith("/sign-in"));
}

/** The fake e-mail provider's inbox (fakes/resend), as someone trying the demo opens it. */
export function inboxUrl(recipient?: string): string {
  const port = process.env.FAKE_RESEND_PORT ?? "3510";
  return `http://127.0.0.1:${port}/inbox${recipient ? `?to=${encodeURIComponent(recipient)}` : ""}`;
}

/** Opens the newest e-mail to `recipient` whose subject matches, waiting for it to arrive. */
export async function openEmail(page: Page, recipient: string, subject: RegExp): Promise<void> {
  await expect(async () => {
    await page.goto(inboxUrl(recipient));
    await expect(page.getByRole("link", { name: subject }).first()).toBeVisible({ timeout: 1000 });
  }).toPass({ timeout: 30_000 });
  await page.getByRole("link", { name: subject }).first().click();
  await expect(page.getByRole("heading", { level: 1, name: subject })).toBeVisible();
}
