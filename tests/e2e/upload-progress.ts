// Records every state an upload's progress bar announces, from before the upload starts.
import type { Page } from "@playwright/test";

export async function watchProgress(page: Page): Promise<() => Promise<string[]>> {
  await page.evaluate(() => {
    const seen: string[] = [];
    (window as unknown as { __progress: string[] }).__progress = seen;
    new MutationObserver(() => {
      const bar = document.querySelector('[role="progressbar"]');
      const text = bar?.getAttribute("aria-valuetext");
      if (bar && text && seen.at(-1) !== text) seen.push(`${bar.getAttribute("aria-valuenow")}|${text}`);
    }).observe(document.body, { subtree: true, childList: true, attributes: true });
  });
  return () => page.evaluate(() => (window as unknown as { __progress: string[] }).__progress);
}
