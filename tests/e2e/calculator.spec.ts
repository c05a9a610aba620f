import { readFile } from "node:fs/promises";
import { expect, test } from "@playwright/test";
import { parse } from "csv-parse/sync";
import { computeSpec } from "../../lib/lutherie/compute-spec";
import { presetById } from "../../lib/lutherie/presets";
import { formatForce } from "../../lib/lutherie/units";
import { keepScreenshot } from "./screenshot";

// The public calculator in a real browser: typing updates the figures, units switch, presets load,
// the link carries the spec, and the fret table downloads as CSV. Expected figures come from the
// same pure module the tests in tests/unit/lutherie check against their sources.
const six = presetById("six").spec;
const totalFor = (spec: typeof six) => `${formatForce(computeSpec(spec).totals.tensionN, "N")} N`;

test("calculator: live results, units, presets, shareable link and CSV", async ({ page, context }) => {
  await context.grantPermissions(["clipboard-read", "clipboard-write"]);
  await page.goto("/calculator");
  await expect(page.getByRole("heading", { level: 1, name: "Build calculator" })).toBeVisible();
  await expect(page.getByRole("note", { name: "Safety caution" })).toContainText("Wear eye protection");
  await expect(page.getByTestId("total-tension")).toHaveText(totalFor(six));
  await expect(page.getByTestId("fret-12")).toHaveText("324.00 mm"); // L/2 of 648 mm

  // Typing: a heavier string 1 raises the total at once.
  await page.getByLabel("String 1 gauge (in)").fill("0.011");
  const heavier = structuredClone(six);
  heavier.strings[0]!.gaugeIn = 0.011;
  await expect(page.getByTestId("total-tension")).toHaveText(totalFor(heavier));

  // A bad value is named on its field; the figures stay on the last valid spec.
  await page.getByLabel("Frets").fill("40");
  await expect(page.getByText("Frets must be at most 36")).toBeVisible();
  await expect(page.getByText("The figures below are for the last valid spec")).toBeVisible();
  await page.getByLabel("Frets").fill("24");
  await expect(page.getByRole("cell", { name: "24", exact: true }).first()).toBeVisible();

  // A dangerous spec: string 1 up a fourth is an error in the checks.
  await page.getByLabel("String 1 note").fill("A4");
  const checks = page.getByRole("list", { name: "Errors and warnings" });
  await expect(checks).toContainText("stress is");
  await expect(checks).toContainText("error");
  await page.getByLabel("String 1 note").fill("E4");
  await expect(page.getByText("No errors or warnings for this spec.")).toBeVisible();

  // Units: everything converts; fret 12 is still half the scale.
  await page.getByRole("button", { name: "Inches" }).click();
  await expect(page.getByRole("button", { name: "Inches" })).toHaveAttribute("aria-pressed", "true");
  await expect(page.getByLabel("Bass scale (in)")).toHaveValue("25.5118");
  await expect(page.getByTestId("fret-12")).toHaveText("12.756 in");

  // A preset: the fanned 8-string, loaded in the current unit.
  await page.getByLabel("Start from").selectOption("fanned-eight");
  await expect(page.getByLabel("String 8 note")).toHaveValue("F#1");
  await expect(page.getByLabel("Bass scale (in)")).toHaveValue("28");
  await expect(page.getByRole("columnheader", { name: "From nut, bass (in)" })).toBeVisible();
  await keepScreenshot(page, "calculator-fanned");

  // The link in the address bar carries the spec: open it afresh and get the same form.
  await expect(page).toHaveURL(/\?spec=[A-Za-z0-9_-]+/);
  await expect(page.getByLabel("Link to this spec")).toHaveValue(/\?spec=/);
  const link = page.url();
  const again = await context.newPage();
  await again.goto(link);
  await expect(again.getByLabel("String 8 note")).toHaveValue("F#1");
  await expect(again.getByLabel("Frets")).toHaveValue("27");
  await expect(again.getByRole("button", { name: "Inches" })).toHaveAttribute("aria-pressed", "true");
  await expect(again.getByTestId("fret-12")).toHaveText("14.000 in"); // 28 in / 2
  await again.close();

  // CSV download of the fret table, read back.
  const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("button", { name: "Download CSV" }).click()]);
  expect(download.suggestedFilename()).toBe("scalewright-frets.csv");
  const rows = parse(await readFile((await download.path())!, "utf8")) as string[][];
  expect(rows).toHaveLength(1 + 28);
  const bass = rows[0]!.indexOf("From nut, bass (in)");
  expect(bass).toBeGreaterThan(0);
  expect(rows[13]![0]).toBe("12");
  expect(rows[13]![bass]).toBe("14.000");

  // Copy puts the same table on the clipboard, tab-separated.
  await page.getByRole("button", { name: "Copy table" }).click();
  await expect(page.getByText("Fret table copied")).toBeVisible();
  const copied = await page.evaluate(() => navigator.clipboard.readText());
  expect(copied.split("\n")[13]!.split("\t")[bass]).toBe("14.000");
});

test("calculator: a broken link falls back to the preset, and a phone gets no sideways page scroll", async ({ page }) => {
  await page.goto("/calculator?spec=not-a-spec");
  await expect(page.getByText("The spec in this link could not be read")).toBeVisible();
  await expect(page.getByTestId("total-tension")).toHaveText(totalFor(six));
  await page.setViewportSize({ width: 375, height: 740 });
  await expect(page.getByRole("heading", { level: 1 })).toBeVisible();
  const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
  expect(overflow).toBeLessThanOrEqual(0);
  await keepScreenshot(page, "calculator-phone");
});
