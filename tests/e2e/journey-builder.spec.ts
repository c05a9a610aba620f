// The builder's journey in a real browser, one continuous story in a fresh workshop, on a shop
// tablet: the builder finds the new commission on the board, drafts its spec with live figures and
// sends it; once the client has approved it and the deposit is in (their parts through the API),
// the builder uploads stage photos with the progress bar, sees them in the timeline, moves the
// build through every stage with notes, is shown what delivery still waits for and follows the
// link to the setup sheet, is refused an impossible value, fills in and signs the sheet, then
// downloads the fret template and the build sheet and reads them back; the client then finds the
// signed sheet's summary on the commission's overview.
//
// Expected figures: total tension from the pure build math (tests/unit/lutherie checks it against
// its published sources); fret n at d_n = L·(1 − 2^(−n/12)) from the nut [textbook, 12-TET] for
// the 648 mm preset; A4 = 210 × 297 mm [ISO 216]; saddle move +5 cents on 648 mm = 1.88 mm (worked
// by hand in tests/unit/setup/figures.test.ts).
import { readFileSync } from "node:fs";
import { expect as baseExpect, test, type Page } from "@playwright/test";
import { computeSpec } from "../../lib/lutherie/compute-spec";
import { presetById } from "../../lib/lutherie/presets";
import { formatForce } from "../../lib/lutherie/units";
import type { SpecVersionSummary } from "../../lib/schemas/spec-version";
import { DEFAULT_BUILD_STAGES } from "../../lib/workflow/stages";
import { base, detail, openCommission } from "../http/commission-helpers";
import { createWorkshopWithMembers, type TestWorkshop } from "../http/fixtures";
import { signIn, type HttpSession } from "../http/session";
import { closeTestDb } from "../setup/test-db";
import { readPdfLines } from "../support/pdf-lines";
import { jpegWithGps } from "../support/photos";
import { hydrated, SLOW } from "./hydration";
import { keepScreenshot } from "./screenshot";
import { signInInBrowser } from "./sign-in";
import { watchProgress } from "./upload-progress";

const expect = baseExpect.configure({ timeout: 20_000 });
// A step that cannot happen fails within a minute instead of holding the run until the test times out.
test.use({ actionTimeout: 60_000, navigationTimeout: 60_000 });
const TABLET = { width: 1024, height: 768 };
const PHONE = { width: 390, height: 844 };
const FIRST = DEFAULT_BUILD_STAGES[0]!;

let ws: TestWorkshop;
let api: { owner: HttpSession; bookkeeper: HttpSession; client: HttpSession };
let commission: { id: number; number: string };

test.beforeAll(async () => {
  ws = await createWorkshopWithMembers({ name: `Builder Journey ${Date.now()}` });
  api = { owner: await signIn(ws.owner), bookkeeper: await signIn(ws.bookkeeper), client: await signIn(ws.client) };
  commission = await openCommission(api.owner, ws, { title: "Six-string with a roasted maple neck" });
});
test.afterAll(async () => closeTestDb());

const tab = (page: Page, name: string) => page.getByRole("navigation", { name: "Commission" }).getByRole("link", { name, exact: true });
const current = (page: Page) => page.getByRole("list", { name: "Stage line" }).locator("[aria-current=step]");

test("builder: spec with live figures → stage photos with progress → every stage → setup sheet signed → printouts read back", async ({ browser }) => {
  test.setTimeout(Math.max(600_000, test.info().timeout));
  const { id } = commission;
  const context = await browser.newContext({ viewport: TABLET, acceptDownloads: true });
  const page = await context.newPage();

  // 1. The board: the new commission waits in the spec column.
  await signInInBrowser(page, ws.builder, `/${ws.slug}/commissions/board`);
  const specColumn = page.getByRole("listitem").filter({ has: page.getByRole("heading", { name: /^Spec/ }) });
  await (await hydrated(specColumn.getByRole("link", { name: /Six-string with a roasted maple neck/ }))).click();
  await page.waitForURL((u) => u.pathname === `/${ws.slug}/commissions/${id}`, SLOW);
  await (await hydrated(tab(page, "Spec"))).click();

  // 2. The spec, with figures that follow every edit before anything is saved.
  await expect(page.getByRole("heading", { name: "Draft the first version" })).toBeVisible(SLOW);
  const spec = structuredClone(presetById("six").spec);
  const live = page.getByTestId("live-total-tension");
  await expect(live).toHaveText(`${formatForce(computeSpec(spec).totals.tensionN, "N")} N`);
  spec.strings[5]!.gaugeIn = 0.048;
  await expect(async () => {
    // Typed again until the form has hydrated and recomputed (keystrokes before hydration are lost).
    await page.getByLabel("String 6 gauge (in)").fill("0.048");
    await expect(live).toHaveText(`${formatForce(computeSpec(spec).totals.tensionN, "N")} N`, { timeout: 2000 });
  }).toPass(SLOW);
  await page.getByLabel("Neck wood").fill("Roasted maple");
  await page.getByLabel("Body wood").fill("Alder");
  await keepScreenshot(page, "journey-builder-spec-tablet");
  await page.getByRole("button", { name: "Save as version 1" }).click();
  await expect(page.getByText("Saved as version 1.")).toBeVisible(SLOW);
  await page.getByRole("button", { name: "Send version 1 to the client" }).click();
  await expect(page.getByText("Version 1 is with the client, waiting for their approval.")).toBeVisible(SLOW);

  // 3. The client approves and the bookkeeper records the deposit (their parts, through the API).
  const versions = (await api.client.json<{ versions: SpecVersionSummary[] }>(`${base(ws)}/${id}/spec-versions`)).body.versions;
  expect((await api.client.fetch(`${base(ws)}/${id}/spec-versions/${versions[0]!.id}/approve`, { method: "POST" })).status).toBe(200);
  const deposit = (await detail(api.owner, ws, id)).money!.depositMinor;
  const paid = await api.bookkeeper.fetch(`${base(ws)}/${id}/payments`, { method: "POST", json: { kind: "deposit", amountMinor: deposit, reference: "Transfer BJ-0917" } });
  expect(paid.status).toBe(201);

  // 4. Stage photos, with the progress bar from the first byte to the prepared photo.
  await tab(page, "Photos").click();
  await expect(page.getByRole("heading", { name: "Add stage photos" })).toBeVisible(SLOW);
  await expect(page.getByText(`Filed under “${FIRST.label}”.`, { exact: false })).toBeVisible();
  await hydrated(page.getByRole("button", { name: "Upload" }));
  await page.getByLabel("Caption").fill("Neck blank roasted, body halves matched");
  await page.getByLabel("Photos", { exact: true }).setInputFiles([
    { name: "neck-blank.jpg", mimeType: "image/jpeg", buffer: await jpegWithGps(2000, 1500, { seed: 51 }) },
    { name: "body-halves.jpg", mimeType: "image/jpeg", buffer: await jpegWithGps(1500, 2000, { seed: 52 }) },
  ]);
  const progress = await watchProgress(page);
  await page.getByRole("button", { name: "Upload" }).click();
  await expect(page.getByText(`2 photos added to “${FIRST.label}”.`)).toBeVisible({ timeout: 90_000 });
  const states = await progress();
  expect(states[0]).toMatch(/^0\|Uploading… 0 %$/);
  expect(states).toContain("100|Removing location data and making thumbnails…");
  expect(states.at(-1)).toBe("100|Uploaded");
  await expect(page.getByRole("region", { name: FIRST.label }).getByRole("img")).toHaveCount(2);
  await keepScreenshot(page, "journey-builder-photos-tablet");

  // 5. The overview: the photos under their stage in the timeline; every build stage, with a note.
  await tab(page, "Overview").click();
  const timeline = page.getByRole("list", { name: "Timeline" });
  await expect(timeline.getByRole("group", { name: `Photos: ${FIRST.label}` }).getByRole("img")).toHaveCount(2, SLOW);
  await expect(current(page)).toHaveText(new RegExp(FIRST.label));
  for (const next of [...DEFAULT_BUILD_STAGES.slice(1).map((s) => s.label), "Final setup"]) {
    const note = `Ready for ${next.toLowerCase()}.`;
    await page.getByLabel("Note with the move (optional)").fill(note);
    await (await hydrated(page.getByRole("button", { name: `Move to ${next}` }))).click();
    await expect(page.getByText(`Move to ${next}: done.`)).toBeVisible(SLOW);
    await expect(timeline.getByRole("listitem").first()).toContainText(`→ ${next}`);
    await expect(timeline.getByRole("listitem").first()).toContainText(note);
  }
  await expect(current(page)).toHaveText(/Final setup/);

  // 6. Delivery waits for the signed sheet and the balance; the sheet is one click away (the
  //    balance is the client's and the bookkeeper's: a builder gets no link to money).
  await expect(page.getByRole("button", { name: "Move to Delivered" })).toBeDisabled();
  const missing = page.getByRole("list", { name: "Missing" });
  await expect(missing.getByRole("listitem").filter({ hasText: "The balance has not been paid." }).getByRole("link")).toHaveCount(0);
  await keepScreenshot(page, "journey-builder-final-setup-waiting-tablet");
  await missing.getByRole("listitem").filter({ hasText: "The final setup sheet is not filled in and signed." }).getByRole("link", { name: "Open the setup sheet" }).click();
  await page.waitForURL((u) => u.pathname === `/${ws.slug}/commissions/${id}/setup`, SLOW);

  // 7. The setup sheet: an impossible value refused, the rest filled in, signed and locked.
  const form = page.getByRole("form", { name: "Setup sheet" });
  await hydrated(form.getByRole("button", { name: "Save draft" }));
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
  await form.getByLabel("Truss rod notes").fill("A sixth of a turn, settled overnight");
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
  await expect(form.getByRole("region", { name: "Outside common-practice ranges" })).toContainText("sharp by 5 cents");
  await fill("String 2 action at the 12th fret (mm)", "25");
  await form.getByRole("button", { name: "Save draft" }).click();
  await expect(form.getByText("Some measurements cannot be right; nothing was saved.")).toBeVisible(SLOW);
  await expect(form.getByText(/An action of 25 mm cannot be right/).first()).toBeVisible();
  await fill("String 2 action at the 12th fret (mm)", "1.6");
  await keepScreenshot(page, "journey-builder-setup-form-tablet");
  await form.getByRole("button", { name: "Save and sign" }).click();
  await expect(page.getByText(/Revision 1 is signed and locked/)).toBeVisible(SLOW);
  await expect(page.getByRole("heading", { name: "Summary" })).toBeVisible();
  await expect(page.getByText("Signed", { exact: true }).first()).toBeVisible();
  await expect(page.getByRole("table", { name: "Measurements per string" })).toContainText("1.88 mm away from the nut");
  await keepScreenshot(page, "journey-builder-setup-signed-tablet");

  // 8. The printouts on A4, read back: the template at 1:1, the build sheet with the signed sheet.
  await (await hydrated(page.getByLabel("Paper"))).selectOption("a4");
  const [template] = await Promise.all([page.waitForEvent("download", SLOW), page.getByRole("button", { name: "Download fret template" }).click()]);
  expect(template.suggestedFilename()).toBe(`fret-template-${commission.number}-a4.pdf`);
  const pages = await readPdfLines(new Uint8Array(readFileSync(await template.path())));
  expect(pages.length).toBeGreaterThanOrEqual(3); // 648 mm does not fit one 297 mm page
  pages.forEach((p, i) => {
    expect([p.widthMm, p.heightMm].map((v) => Math.round(v * 1000) / 1000)).toEqual([210, 297]);
    expect(p.text).toContain(`Page ${i + 1} of ${pages.length}`);
    expect(p.text).toMatch(/Print at 100% \(actual size\)/);
  });
  const first = pages[0]!;
  const across = (s: (typeof first.segments)[number]) => Math.abs(s.y1 - s.y2) < 1e-6;
  const nut = first.segments.find((s) => s.widthPt === 0.6 && across(s))!;
  const frets = first.segments.filter((s) => s.widthPt === 0.25 && across(s) && Math.hypot(s.x2 - s.x1, s.y2 - s.y1) > 40 && Math.hypot(s.x2 - s.x1, s.y2 - s.y1) < 60);
  expect(frets.length).toBeGreaterThan(3);
  const fromNut = frets.map((f) => nut.y1 - f.y1).sort((a, b) => a - b);
  fromNut.forEach((d, i) => expect(Math.abs(d - 648 * (1 - 2 ** (-(i + 1) / 12))), `fret ${i + 1}`).toBeLessThan(0.05));

  const [sheet] = await Promise.all([page.waitForEvent("download", SLOW), page.getByRole("button", { name: "Download build sheet" }).click()]);
  expect(sheet.suggestedFilename()).toBe(`build-sheet-${commission.number}.pdf`);
  const sheetText = (await readPdfLines(new Uint8Array(readFileSync(await sheet.path())))).map((p) => p.text).join(" ");
  expect(sheetText).toMatch(/Final setup \(revision 1, signed \d{4}-\d{2}-\d{2}\)/);
  expect(sheetText).toContain("1.88 back");
  expect(sheetText).toContain("Ready for final setup.");

  // 9. The overview carries the signed sheet's summary; so does the client's, on a phone.
  await tab(page, "Overview").click();
  const summary = page.getByRole("region", { name: "Final setup" });
  await expect(summary.getByRole("list", { name: "Setup summary" })).toContainText(`Signed off by ${ws.builder.name}`, SLOW);
  const clientContext = await browser.newContext({ viewport: PHONE });
  const client = await clientContext.newPage();
  await signInInBrowser(client, ws.client, `/${ws.slug}/commissions/${id}`);
  const clientSummary = client.getByRole("region", { name: "Final setup" });
  await expect(clientSummary.getByRole("list", { name: "Setup summary" })).toContainText("Neck relief at the 8th fret: 0.20 mm", SLOW);
  await expect(client.getByTestId("money").getByTestId("balance-status")).toContainText("Due");
  await keepScreenshot(client, "journey-builder-client-sees-setup-phone");
  await clientContext.close();
  await context.close();
});
