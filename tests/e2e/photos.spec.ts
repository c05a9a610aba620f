// Stage photos in a real browser: the builder uploads a photo on the commission's photos page
// (@uploadthing/react, straight to the uploads fake) and watches the progress bar; the client
// then finds it in the gallery under its stage. With the upload service down, the builder gets a
// message that says so, and nothing appears.
import { expect, test } from "@playwright/test";
import { closeTestDb } from "../setup/test-db";
import { createWorkshopWithMembers, type TestWorkshop } from "../http/fixtures";
import { commissionInBuild, setFakeOutage } from "../http/photo-helpers";
import { signIn } from "../http/session";
import { jpegWithGps } from "../support/photos";
import { keepScreenshot } from "./screenshot";
import { watchProgress } from "./upload-progress";
import { signInInBrowser } from "./sign-in";

let ws: TestWorkshop;
let commissionId: number;
const photosPage = () => `/${ws.slug}/commissions/${commissionId}/photos`;

test.beforeAll(async () => {
  test.setTimeout(120_000);
  ws = await createWorkshopWithMembers({ name: `Photo Workshop ${Date.now()}` });
  const people = { owner: await signIn(ws.owner), builder: await signIn(ws.builder), client: await signIn(ws.client), bookkeeper: await signIn(ws.bookkeeper) };
  commissionId = (await commissionInBuild(ws, people, { title: "Offset bass, ash body" })).id;
});
test.afterAll(async () => {
  await setFakeOutage("none").catch(() => undefined);
  await closeTestDb();
});

test("the builder uploads a stage photo with a progress bar, and the client sees it in the gallery", async ({ browser }) => {
  test.setTimeout(180_000);
  const builderCtx = await browser.newContext();
  const builder = await builderCtx.newPage();
  await signInInBrowser(builder, ws.builder, photosPage());
  await builder.goto(photosPage());
  await expect(builder.getByRole("heading", { name: "Add stage photos" })).toBeVisible();
  await expect(builder.getByText("No photos yet.")).toBeVisible();

  const photo = await jpegWithGps(2400, 1800, { seed: 21, quality: 92 });
  await builder.getByLabel("Caption").fill("Body blank glued up, clamps off");
  await builder.getByLabel("Photos", { exact: true }).setInputFiles({ name: "body-blank.jpg", mimeType: "image/jpeg", buffer: photo });
  const progress = await watchProgress(builder);
  await builder.getByRole("button", { name: "Upload" }).click();
  const bar = builder.getByRole("progressbar", { name: "Upload progress" });
  await expect(bar).toBeVisible();
  await expect(builder.getByText("1 photo added to “Timber selection”.")).toBeVisible({ timeout: 60_000 });
  await expect(bar).toHaveAttribute("aria-valuenow", "100");
  await expect(bar).toHaveAttribute("aria-valuetext", "Uploaded");
  const states = await progress();
  expect(states[0]).toMatch(/^0\|Uploading… 0 %$/); // the bar shows from the first moment of the upload
  expect(states.at(-1)).toBe("100|Uploaded");
  const gallery = builder.getByRole("region", { name: "Timber selection" });
  await expect(gallery.getByRole("img", { name: "Body blank glued up, clamps off" })).toBeVisible();
  await keepScreenshot(builder, "photos-builder");

  const clientCtx = await browser.newContext();
  const client = await clientCtx.newPage();
  await signInInBrowser(client, ws.client, photosPage());
  await client.goto(photosPage());
  // A client adds reference pictures only while the spec is agreed: no uploader here, the reason instead.
  await expect(client.getByRole("heading", { name: /Add (stage photos|reference pictures)/ })).toHaveCount(0);
  await expect(client.getByText(/reference pictures only while the spec is being agreed/)).toBeVisible();
  const img = client.getByRole("region", { name: "Timber selection" }).getByRole("img", { name: "Body blank glued up, clamps off" });
  await expect(img).toBeVisible();
  await expect.poll(() => img.evaluate((el) => (el as HTMLImageElement).naturalWidth)).toBe(480);
  await expect(client.getByRole("button", { name: /Remove photo/ })).toHaveCount(0);
  await keepScreenshot(client, "photos-client");
  await builderCtx.close();
  await clientCtx.close();
});

test("with the upload service down the builder is told so, and nothing appears", async ({ browser }) => {
  test.setTimeout(120_000);
  const ctx = await browser.newContext();
  const page = await ctx.newPage();
  await signInInBrowser(page, ws.builder, photosPage());
  await page.goto(photosPage());
  const before = await page.getByRole("img").count();
  await page.getByLabel("Caption").fill("Taken during the outage");
  await page.getByLabel("Photos", { exact: true }).setInputFiles({ name: "outage.jpg", mimeType: "image/jpeg", buffer: await jpegWithGps(300, 200, { seed: 22 }) });
  await setFakeOutage("unavailable");
  try {
    await page.getByRole("button", { name: "Upload" }).click();
    await expect(page.getByRole("alert").filter({ hasText: "photo service" })).toHaveText(
      "The photo service could not be reached, so the upload did not go through. Nothing was saved; try again in a moment.",
    );
  } finally {
    await setFakeOutage("none");
  }
  await expect(page.getByRole("progressbar", { name: "Upload progress" })).toHaveAttribute("aria-valuetext", "Not uploaded");
  await page.reload();
  await expect(page.getByRole("img")).toHaveCount(before);
  await expect(page.getByText("Taken during the outage")).toHaveCount(0);
  await ctx.close();
});
