// The first-load JavaScript of every main page stays within the budget (gzipped), measured on the
// production build `npm test` serves: what a phone on a slow line has to fetch before the page
// works. A size budget, not a speed assertion (speed is `npm run bench`'s job). The budget, 180 kB
// gzipped, is the product's own figure (issue 9); gzip is Node's zlib at level 9.
import { beforeAll, describe, expect, it } from "vitest";
import { FIRST_LOAD_BUDGET_KB, weighPage, type PageWeight } from "../../scripts/bench/first-load-js";
import { appUrl } from "./app-url";
import { prepareMainPages, type MainPagesFixture } from "./main-pages";

let fx: MainPagesFixture;

beforeAll(async () => {
  fx = await prepareMainPages();
}, 120_000);

describe("first-load JavaScript", () => {
  it(`stays under ${FIRST_LOAD_BUDGET_KB} kB gzipped on every main page, each page as the person who sees the most of it`, async () => {
    const cache = new Map<string, Buffer>();
    const weights: Array<PageWeight & { label: string }> = [];
    for (const p of fx.pages) weights.push({ label: p.label, ...(await weighPage(appUrl(), p.path, fx.cookieOf(p.as), cache)) });
    for (const w of weights) {
      // A redirect to sign-in or an error page would weigh the wrong page.
      expect(w.status, w.label).toBe(200);
      expect(w.scripts, w.label).toBeGreaterThan(0);
    }
    console.table(weights.map((w) => ({ page: w.label, scripts: w.scripts, "raw kB": w.rawKb.toFixed(1), "gzip kB": w.gzipKb.toFixed(1) })));
    const over = weights.filter((w) => w.gzipKb > FIRST_LOAD_BUDGET_KB).map((w) => `${w.label} (${w.path}): ${w.gzipKb.toFixed(1)} kB`);
    expect(over).toEqual([]);
  }, 120_000);
});
