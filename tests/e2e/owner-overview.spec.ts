// The owner's journey in a real browser: the builders' workload on the overview, filtered by a
// cohort, a drill-down into the commissions table's address with the same filters, a builder
// reassigned, then the stage template changed in settings — and a stage that still has a
// commission in it refused with its name. The fixture is built through the API.
import { expect, test } from "@playwright/test";
import { closeTestDb } from "../setup/test-db";
import { openCommission } from "../http/commission-helpers";
import { addMember, createTestUser, createWorkshopWithMembers, uniqueEmail, type TestMember, type TestWorkshop } from "../http/fixtures";
import { commissionInBuild } from "../http/overview-fixture";
import { signIn } from "../http/session";
import { keepScreenshot } from "./screenshot";
import { signInInBrowser } from "./sign-in";

let ws: TestWorkshop;
let second: TestMember;
let inTimber: { id: number; number: string };
let offset: { id: number; number: string };
let cohortId: number;

test.beforeAll(async () => {
  test.setTimeout(180_000);
  ws = await createWorkshopWithMembers({ name: `Overview Workshop ${Date.now()}` });
  second = await addMember(ws.id, await createTestUser({ email: uniqueEmail("builder"), name: "Second Builder" }), "builder");
  const [owner, client] = await Promise.all([signIn(ws.owner), signIn(ws.client)]);
  inTimber = await commissionInBuild(owner, client, ws, { builderId: ws.builder.userId, advances: 0, title: "Cohort seven-string" });
  offset = await openCommission(owner, ws, { title: "Offset for the second builder", builderId: second.userId });
  await openCommission(owner, ws, { title: "First builder's request", builderId: ws.builder.userId });
  const r = await owner.json<{ cohort: { id: number } }>(`/api/workshops/${ws.slug}/cohorts`, {
    json: { name: "Winter production course", startsOn: "2027-01-04", endsOn: "2027-04-30", builderIds: [ws.builder.userId] },
  });
  cohortId = r.body.cohort.id;
  const put = await owner.fetch(`/api/workshops/${ws.slug}/commissions/${inTimber.id}`, { method: "PATCH", json: { cohortId } });
  expect(put.status).toBe(200);
});
test.afterAll(async () => closeTestDb());

// Page loads on a shared 2-core machine can take longer than the default 5 s.
const LOAD = { timeout: 30_000 };

test("owner: workload, cohort filter, drill-down, reassigning, stage template", async ({ page }) => {
  test.setTimeout(180_000);
  await signInInBrowser(page, ws.owner, `/${ws.slug}`);
  await page.getByRole("navigation", { name: "Workshop" }).getByRole("link", { name: "Overview" }).click();
  await expect(page.getByRole("heading", { name: "Overview", exact: true })).toBeVisible(LOAD);

  // The workload: one row per builder, counts by stage.
  const workload = page.getByRole("table", { name: "Workload by builder and stage" });
  await expect(workload.getByRole("row", { name: new RegExp(ws.builder.name) })).toContainText("2");
  await expect(workload.getByRole("row", { name: /Second Builder/ })).toContainText("1");
  await expect(page.getByRole("img", { name: /Open commissions per builder/ })).toBeVisible();
  await keepScreenshot(page, "overview-owner");

  // Filter by the cohort: only its commission is counted.
  await page.getByLabel("Cohort", { exact: true }).selectOption({ label: "Winter production course" });
  await page.getByRole("button", { name: "Show" }).click();
  await expect(page).toHaveURL(new RegExp(`/${ws.slug}/overview\\?cohort=${cohortId}$`));
  await expect(page.getByRole("heading", { name: "Overview: Winter production course" })).toBeVisible(LOAD);
  await expect(page.getByText("1 open commission", { exact: true })).toBeVisible();
  await expect(page.getByRole("listitem", { name: "Cohort Winter production course" })).toContainText("0 of 1 delivered (0 %)");

  // Drill down from the builder × stage cell into the commissions table, same filters in the address.
  await workload.getByRole("link", { name: `${ws.builder.name}, Timber selection: 1` }).click();
  await expect(page).toHaveURL(`/${ws.slug}/commissions?builder=${ws.builder.userId}&stage=timber&cohort=${cohortId}`, LOAD);
  await page.goBack();
  await expect(page.getByRole("heading", { name: "Overview: Winter production course" })).toBeVisible(LOAD);

  // Reassign the cohort's commission to the second builder.
  await page.getByLabel(`Builder of ${inTimber.number}`).selectOption({ label: "Second Builder" });
  await expect(page.getByText(`${inTimber.number} is now with Second Builder.`)).toBeVisible(LOAD);
  await expect(workload.getByRole("row", { name: /Second Builder/ })).toContainText("1");
  await expect(workload.getByRole("link", { name: "Second Builder, Timber selection: 1" })).toBeVisible(LOAD);

  // The cohort's own page: put another open commission into it.
  await page.getByRole("link", { name: "Manage cohorts" }).click();
  await page.getByRole("link", { name: "Winter production course" }).click();
  await expect(page.getByRole("heading", { name: "Winter production course" })).toBeVisible(LOAD);
  const inCohort = page.getByRole("table", { name: "Commissions in this cohort" });
  await expect(inCohort.getByRole("row")).toHaveCount(2); // header and one commission
  await page.getByLabel("Add a commission").selectOption({ label: `${offset.number} · Offset for the second builder` });
  await page.getByRole("button", { name: "Add to the cohort" }).click();
  await expect(inCohort.getByRole("row")).toHaveCount(3, LOAD);
  await keepScreenshot(page, "cohort-owner");

  // Settings: rename the first stage, add one and move it up, save.
  await page.getByRole("navigation", { name: "Workshop" }).getByRole("link", { name: "Settings" }).click();
  const stages = page.getByRole("list", { name: "Build stages" });
  await expect(stages.getByRole("listitem")).toHaveCount(6, LOAD);
  await page.getByLabel("Name of stage 1").fill("Wood choice");
  await page.getByLabel("New stage name").fill("Binding and purfling");
  await page.getByRole("button", { name: "Add stage" }).click();
  await expect(stages.getByRole("listitem")).toHaveCount(7);
  await page.getByRole("button", { name: "Move Binding and purfling up" }).click();
  await page.getByRole("button", { name: "Save build stages" }).click();
  await expect(page.getByText("Build stages saved.")).toBeVisible(LOAD);
  await keepScreenshot(page, "settings-owner");
  await page.reload();
  await expect(page.getByLabel("Name of stage 1")).toHaveValue("Wood choice", LOAD);
  await expect(page.getByLabel("Name of stage 6")).toHaveValue("Binding and purfling");
  await expect(stages.getByText("binding_and_purfling")).toBeVisible();

  // Removing the stage the commission is in is refused, naming the stage and the commission.
  await page.getByRole("button", { name: "Remove Wood choice" }).click();
  await page.getByRole("button", { name: "Save build stages" }).click();
  await expect(page.getByRole("alert").filter({ hasText: `"Wood choice" still has 1 commission in it (${inTimber.number})` }).first()).toBeVisible();

  // The overview names the stage by its new label.
  await page.getByRole("navigation", { name: "Workshop" }).getByRole("link", { name: "Overview" }).click();
  await expect(workload.getByRole("link", { name: "Second Builder, Wood choice: 1" })).toBeVisible(LOAD);
});
