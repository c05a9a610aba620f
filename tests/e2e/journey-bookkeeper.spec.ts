// The bookkeeper's journey in a real browser: the ledger (filters in the address bar, totals, the
// CSV of the same filters), then the month's reconciliation against the processor — compare, see
// one exception of each kind, resolve each with a note, lock the month — and the reconciliation's
// CSV, downloaded and read back with csv-parse; then the monthly summary and held and earned. The month
// is made through the app and the payments fake (books-month.ts). Screens kept in tests/artifacts/screens.
import { readFileSync } from "node:fs";
import { expect, test, type Download, type Page } from "@playwright/test";
import { parse } from "csv-parse/sync";
import { EXCEPTION_LABELS } from "../../lib/books/exception-kinds";
import { monthLabel, monthOf } from "../../lib/books/months";
import { closeTestDb } from "../setup/test-db";
import { createWorkshopWithMembers, type TestWorkshop } from "../http/fixtures";
import { cardMonth } from "./books-month";
import { keepScreenshot } from "./screenshot";
import { signInInBrowser } from "./sign-in";

let ws: TestWorkshop;
let month: string;

test.beforeAll(async () => {
  test.setTimeout(240_000);
  ws = await createWorkshopWithMembers({ name: `Books Journey ${Date.now()}`, extra: { client: 1 } });
  month = monthOf(new Date());
  await cardMonth(ws);
});
test.afterAll(async () => closeTestDb());

const LOAD = { timeout: 30_000 };

async function csvOf(download: Download): Promise<Array<Record<string, string>>> {
  const path = await download.path();
  return parse(readFileSync(path!, "utf8"), { bom: true, columns: true }) as Array<Record<string, string>>;
}

async function download(page: Page, name: RegExp): Promise<Download> {
  const [d] = await Promise.all([page.waitForEvent("download"), page.getByRole("link", { name }).click()]);
  return d;
}

test("bookkeeper: ledger, reconciling a month with every kind of exception, locking it, exporting it", async ({ page }) => {
  test.setTimeout(240_000);
  await signInInBrowser(page, ws.bookkeeper, `/${ws.slug}`);
  await page.getByRole("navigation", { name: "Workshop" }).getByRole("link", { name: "Books" }).click();
  await expect(page.getByRole("heading", { name: "Payments ledger" })).toBeVisible(LOAD);

  // The ledger: card entries only, through the filter, which goes to the address bar.
  const ledger = page.getByRole("table", { name: "Payments ledger" });
  await expect(ledger.getByRole("row")).not.toHaveCount(1, LOAD);
  await page.getByLabel("Taken").selectOption("card");
  await expect(page).toHaveURL(/method=card/);
  await expect(page.getByRole("status").filter({ hasText: /Showing 1–\d+ of \d+/ })).toBeVisible(LOAD);
  await expect(ledger.getByRole("row", { name: "Totals in EUR" })).toContainText("settled");
  await keepScreenshot(page, "books-ledger");
  const ledgerRows = await csvOf(await download(page, /Export these entries/));
  expect(ledgerRows.filter((r) => r.row_type === "entry").every((r) => r.method === "card")).toBe(true);
  expect(ledgerRows.filter((r) => r.row_type === "total").map((r) => r.currency)).toEqual(["EUR"]);

  // The month's reconciliation.
  await page.getByRole("navigation", { name: "Books" }).getByRole("link", { name: "Reconciliation" }).click();
  await page.getByRole("link", { name: monthLabel(month) }).click();
  await expect(page.getByRole("heading", { name: `Reconciliation: ${monthLabel(month)}` })).toBeVisible(LOAD);
  await page.getByRole("button", { name: "Compare with the processor" }).click();
  const exceptions = page.getByRole("article");
  await expect(exceptions).toHaveCount(5, LOAD);
  for (const label of Object.values(EXCEPTION_LABELS)) await expect(exceptions.filter({ hasText: label })).toHaveCount(1);
  await expect(page.getByText(/5 exceptions are still open/)).toBeVisible();
  await expect(page.getByRole("heading", { name: /^Payout po_/ }).first()).toBeVisible();
  await keepScreenshot(page, "books-reconciliation-open");

  // Resolve each with a note.
  for (const [kind, label] of Object.entries(EXCEPTION_LABELS)) {
    const card = exceptions.filter({ hasText: label });
    await card.getByLabel("How it was resolved").fill(`Checked ${kind} against the processor's statement.`);
    await card.getByRole("button", { name: "Resolve" }).click();
    await expect(card.getByText("Resolved", { exact: true })).toBeVisible(LOAD);
  }

  // Lock the month.
  const lock = page.getByRole("form", { name: "Lock the month" });
  await lock.getByLabel("Note (optional)").fill("Agreed with the processor's monthly statement.");
  await lock.getByRole("button", { name: "Lock the month" }).click();
  await expect(page.getByText("Reconciled, locked").first()).toBeVisible(LOAD);
  await expect(page.getByRole("button", { name: /Compare/ })).toHaveCount(0);
  await keepScreenshot(page, "books-reconciliation-locked");

  // The reconciliation's CSV: every exception with its note, the pairs and the payouts.
  const rows = await csvOf(await download(page, /Export the reconciliation/));
  const exceptionRows = rows.filter((r) => r.section === "exception");
  expect(exceptionRows.map((r) => r.kind).sort()).toEqual(Object.keys(EXCEPTION_LABELS).sort());
  for (const r of exceptionRows) expect(r).toMatchObject({ state: "resolved", resolution_note: `Checked ${r.kind} against the processor's statement.`, resolved_by: ws.bookkeeper.name, month });
  expect(rows.filter((r) => r.section === "match").length).toBeGreaterThanOrEqual(5);
  expect(rows.some((r) => r.section === "payout")).toBe(true);
  for (const r of rows.filter((x) => x.date)) expect(new Date(r.date!).toISOString()).toBe(r.date);

  // The monthly summary shows the month reconciled; held and earned lists what is still held.
  const booksNav = page.getByRole("navigation", { name: "Books" });
  await booksNav.getByRole("link", { name: "Monthly summary" }).click();
  await expect(page.getByRole("row", { name: monthLabel(month) })).toContainText("Reconciled, locked", LOAD);
  await keepScreenshot(page, "books-summary");
  await booksNav.getByRole("link", { name: "Held and earned" }).click();
  await expect(page.getByRole("heading", { name: "Held and earned" })).toBeVisible(LOAD);
  await expect(page.getByTestId("earned-total")).not.toHaveText("Nothing", LOAD);
  await keepScreenshot(page, "books-held");
});
