import type { Page } from "@playwright/test";

/** Keeps a screenshot of a main screen under tests/artifacts/screens (ignored by git). */
export async function keepScreenshot(page: Page, name: string): Promise<void> {
  await page.screenshot({ path: `tests/artifacts/screens/${name}.png`, fullPage: true });
}
