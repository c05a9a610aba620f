import { expect, test } from "@playwright/test";
import { keepScreenshot } from "./screenshot";

test("landing page in a real browser, on a desktop and a phone", async ({ page }) => {
  await page.goto("/");
  await expect(page.getByRole("heading", { level: 1 })).toContainText("Every commission");
  await expect(page.getByRole("link", { name: "Sign in to your workshop" })).toBeVisible();
  // The self-hosted display font is loaded (no network fetch: it is served by the app).
  const fontLoaded = await page.evaluate(async () => {
    await document.fonts.ready;
    return [...document.fonts].some((f) => f.status === "loaded");
  });
  expect(fontLoaded).toBe(true);
  await keepScreenshot(page, "landing-desktop");

  await page.setViewportSize({ width: 375, height: 740 });
  await expect(page.getByRole("heading", { level: 1 })).toBeVisible();
  const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
  expect(overflow).toBeLessThanOrEqual(0);
  await keepScreenshot(page, "landing-phone");
});
