// Final setup in a real browser: the builder opens the commission's setup page, is refused an
// impossible value, fills in the sheet (the suggested saddle move follows the cents as typed),
// saves and signs it, then downloads the fret template and the build sheet, which read back as
// PDFs of the chosen paper. Saddle move by model B (SOURCES §2.10): +5 cents on 648 mm is
// 1.8796 mm (worked by hand in tests/unit/setup/figures.test.ts). A4 = 210 × 297 mm [ISO 216].
import { readFileSync } from "node:fs";
import { expect, test } from "@playwright/test";
import { closeTestDb } from "../setup/test-db";
import { createWorkshopWithMembers, type TestWorkshop } from "../http/fixtures";
import { signIn } from "../http/session";
import { commissionInFinalSetup } from "../http/setup-helpers";
import { readPdfLines } from "../support/pdf-lines";
import { keepScreenshot } from "./screenshot";
import { signInInBrowser } from "./sign-in";

let ws: TestWorkshop;
let commissionId: number;

test.beforeAll(async () => {
  ws = await createWorkshopWithMembers({ name: `Setup Workshop ${Date.now()}` });
  const [owner, builder, bookkeeper, client] = await Promise.all([signIn(ws.owner), signIn(ws.builder), signIn(ws.bookkeeper), signIn(ws.client)]);
  commissionId = (await commissionInFinalSetup({ owner, builder, bookkeeper, client }, ws)).id;
});
test.afterAll(async () => closeTestDb());

test("the builder fills in the setup sheet, signs it and downloads the printouts", async ({ browser }) => {
  test.setTimeout(150_000);
  const ctx = await browser.newContext({ acceptDownloads: true });
  const page = await ctx.newPage();
  const path = `/${ws.slug}/commissions/${commissionId}/setup`;
  await signInInBrowser(page, ws.builder, path);
  await expect(page).toHaveURL(new RegExp(`${path}$`));
  await expect(page.getByRole("heading", { name: /^Final setup:/ })).toBeVisible();

  const form = page.getByRole("form", { name: "Setup sheet" });
  const fill = (label: string, value: string) => form.getByLabel(label, { exact: true }).fill(value);
  for (let n = 1; n <= 6; n++) {
    await fill(`String ${n} action at the 12th fret (mm)`, n > 3 ? "2.0" : "1.6");
    await fill(`String ${n} nut slot height at the 1st fret (mm)`, "0.1");
    await fill(`String ${n} intonation error at the 12th fret (cents)`, n === 1 ? "5" : "0.5");
  }
  await expect(page.getByTestId("saddle-move-1")).toHaveText("1.88 mm away from the nut");
  await fill("String 1 pull test force (N)", "2");
  await fill("String 1 pull test deflection (mm)", "4.5");
  await fill("Neck relief (mm)", "0.2");
  await form.getByLabel("Truss rod notes").fill("An eighth of a turn, settled overnight");
  for (const [label, bass, treble] of [
    ["Bridge", "2.4", "1.6"],
    ["Neck", "2.6", "2.0"],
  ] as const) {
    await fill(`${label} pickup height, bass side (mm)`, bass);
    await fill(`${label} pickup height, treble side (mm)`, treble);
  }
  await form.getByLabel("Output jack tight; signal on every pickup").check();
  await form.getByLabel("Bridge and strings bonded to signal ground (continuity measured)").check();
  await expect(page.getByTestId("pull-test-1")).toContainText("72.0 N");
  // The intonation of string 1 is outside ±2 cents: a warning, labelled as common practice.
  await expect(form.getByRole("region", { name: "Outside common-practice ranges" })).toContainText("sharp by 5 cents");

  // An impossible action (25 mm: inches typed as mm?) is refused by the server and nothing is saved.
  await fill("String 2 action at the 12th fret (mm)", "25");
  await form.getByRole("button", { name: "Save draft" }).click();
  await expect(form.getByText("Some measurements cannot be right; nothing was saved.")).toBeVisible();
  await expect(form.getByText(/An action of 25 mm cannot be right/).first()).toBeVisible();
  await fill("String 2 action at the 12th fret (mm)", "1.6");
  await keepScreenshot(page, "setup-sheet-form");

  await form.getByRole("button", { name: "Save and sign" }).click();
  // The page reloads as a readout of the locked revision.
  await expect(page.getByText(/Revision 1 is signed and locked/)).toBeVisible();
  await expect(page.getByRole("heading", { name: "Summary" })).toBeVisible();
  await expect(page.getByText("Signed", { exact: true }).first()).toBeVisible();
  await expect(page.getByRole("table", { name: "Measurements per string" })).toContainText("1.88 mm away from the nut");
  await keepScreenshot(page, "setup-sheet-signed");

  // Printouts: A4, the template first, then the build sheet.
  await page.getByLabel("Paper").selectOption("a4");
  const [template] = await Promise.all([page.waitForEvent("download"), page.getByRole("button", { name: "Download fret template" }).click()]);
  expect(template.suggestedFilename()).toMatch(/^fret-template-\d{4}-\d{3}-a4\.pdf$/);
  const templatePages = await readPdfLines(new Uint8Array(readFileSync(await template.path())));
  expect(templatePages.length).toBeGreaterThan(2);
  for (const p of templatePages) expect([p.widthMm, p.heightMm].map((v) => Math.round(v * 1000) / 1000)).toEqual([210, 297]);
  const [sheet] = await Promise.all([page.waitForEvent("download"), page.getByRole("button", { name: "Download build sheet" }).click()]);
  expect(sheet.suggestedFilename()).toMatch(/^build-sheet-\d{4}-\d{3}\.pdf$/);
  const sheetText = (await readPdfLines(new Uint8Array(readFileSync(await sheet.path())))).map((p) => p.text).join(" ");
  expect(sheetText).toMatch(/Final setup \(revision 1, signed \d{4}-\d{2}-\d{2}\)/);
  expect(sheetText).toContain("1.88 back");
  await ctx.close();
});
