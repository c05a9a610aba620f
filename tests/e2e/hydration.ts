// Waits that make browser tests hold on a slow, loaded machine without fixed sleeps.
import { expect, type Locator, type Page } from "@playwright/test";

/** Page loads, uploads and PDF downloads can take tens of seconds on a shared 2-core machine. */
export const SLOW = { timeout: 60_000 };

/**
 * Resolves once React has hydrated the element (it carries React's props on the DOM node), so a
 * click or a keystroke reaches the component and not the bare server HTML.
 */
export async function hydrated(locator: Locator): Promise<Locator> {
  await expect(locator).toBeVisible(SLOW);
  await expect
    .poll(() => locator.evaluate((el) => Object.keys(el).some((k) => k.startsWith("__reactProps$"))), { ...SLOW, message: "the element is hydrated" })
    .toBe(true);
  return locator;
}

/** Goes to `path` and waits for `ready` (an element of the page) to be hydrated. */
export async function openPage(page: Page, path: string, ready: (page: Page) => Locator): Promise<void> {
  await page.goto(path);
  await hydrated(ready(page));
}
