// A real browser upload through the UploadThing fake: uploadthing/client (bundled for the page)
// asks a createRouteHandler route for presigned URLs, then HEADs and PUTs cross-origin to the fake,
// which needs CORS right; an origin the fake does not allow is blocked by the browser.
import { build } from "esbuild";
import { expect, test } from "@playwright/test";
import { createRouteHandler, createUploadthing, type FileRouter } from "uploadthing/server";
import { startUploadthingFake, type UploadthingFake } from "../../fakes/uploadthing/app";
import { testOptions } from "../../fakes/uploadthing/options";
import { uploadthingRouteConfig, uploadthingSettings } from "../../lib/services/uploadthing";
import { makePng } from "../fakes/helpers/png";
import { serveFetchHandler, type TestServer } from "../fakes/helpers/web-server";

const CLIENT = `
import { genUploader } from "uploadthing/client";
const mode = new URLSearchParams(location.search).get("fake") ?? "open";
const { uploadFiles } = genUploader({ url: location.origin + "/api/uploadthing?fake=" + mode, package: "@uploadthing/react" });
document.getElementById("go").addEventListener("click", async () => {
  const out = document.getElementById("result");
  try {
    const res = await uploadFiles("stagePhoto", {
      files: [...document.getElementById("file").files],
      input: { stage: "fretwork" },
      onUploadProgress: ({ progress }) => { document.getElementById("bar").value = progress; },
    });
    out.textContent = JSON.stringify(res.map((r) => ({ key: r.key, ufsUrl: r.ufsUrl, serverData: r.serverData })));
  } catch (e) {
    out.textContent = "ERROR " + (e && e.message);
  }
});`;

const PAGE = `<!doctype html><meta charset="utf-8"><title>upload check</title>
<input id="file" type="file" accept="image/*"><button id="go">Upload</button>
<progress id="bar" max="100" value="0"></progress><pre id="result"></pre><script type="module" src="/client.js"></script>`;

let page_server: TestServer;
let openFake: UploadthingFake;
let closedFake: UploadthingFake;
const completed: unknown[] = [];

test.beforeAll(async () => {
  const f = createUploadthing();
  const router = {
    stagePhoto: f({ image: { maxFileSize: "8MB" } })
      .middleware(({ req }) => ({ stage: new URL(req.url).searchParams.get("fake") }))
      .onUploadComplete(({ metadata, file }) => {
        completed.push({ metadata, key: file.key });
        return { accepted: true };
      }),
  } satisfies FileRouter;
  const bundle = (await build({ stdin: { contents: CLIENT, resolveDir: process.cwd() }, bundle: true, write: false, format: "esm", platform: "browser" })).outputFiles[0]!.text;

  let origin = "";
  const handlers: Record<string, (req: Request) => Promise<Response>> = {};
  page_server = await serveFetchHandler(async (req) => {
    const url = new URL(req.url);
    if (url.pathname === "/") return new Response(PAGE, { headers: { "Content-Type": "text/html" } });
    if (url.pathname === "/client.js") return new Response(bundle, { headers: { "Content-Type": "text/javascript" } });
    return handlers[url.searchParams.get("fake") ?? "open"]!(req);
  });
  origin = page_server.url;
  openFake = await startUploadthingFake(testOptions({ allowedOrigins: [origin] }));
  closedFake = await startUploadthingFake(testOptions({ allowedOrigins: ["http://localhost:1"] }));
  for (const [name, fake] of [["open", openFake], ["closed", closedFake]] as const) {
    const settings = uploadthingSettings({
      UPLOADTHING_API_KEY: fake.ctx.opts.apiKey,
      UPLOADTHING_APP_ID: fake.ctx.opts.appId,
      FAKE_UPLOADTHING_PORT: String(fake.port),
      UPLOADTHING_CALLBACK_URL: `${origin}/api/uploadthing?fake=${name}`,
      UPLOADTHING_LOG_LEVEL: "Error",
    });
    handlers[name] = createRouteHandler({ router, config: uploadthingRouteConfig(settings) });
  }
});

test.afterAll(async () => {
  await page_server?.close();
  await openFake?.close();
  await closedFake?.close();
});

test("uploads an image from the browser with progress, and the fake serves the same bytes", async ({ page }) => {
  const png = await makePng(120, 90, 11);
  await page.goto(`${page_server.url}/?fake=open`);
  await page.locator("#file").setInputFiles({ name: "neck-carve.png", mimeType: "image/png", buffer: png });
  await page.getByRole("button", { name: "Upload" }).click();
  await expect(page.locator("#result")).toContainText("ufsUrl");
  const [up] = JSON.parse((await page.locator("#result").textContent())!) as { key: string; ufsUrl: string; serverData: unknown }[];
  expect(up!.serverData).toEqual({ accepted: true });
  expect(await page.locator("#bar").evaluate((el) => (el as HTMLProgressElement).value)).toBe(100);
  expect(completed).toEqual([{ metadata: { stage: "open" }, key: up!.key }]);
  const back = Buffer.from(await (await fetch(up!.ufsUrl)).arrayBuffer());
  expect(back.equals(png)).toBe(true);
});

test("the browser cannot upload to a fake that does not allow the page's origin", async ({ page }) => {
  const png = await makePng(20, 20, 12);
  await page.goto(`${page_server.url}/?fake=closed`);
  await page.locator("#file").setInputFiles({ name: "blocked.png", mimeType: "image/png", buffer: png });
  await page.getByRole("button", { name: "Upload" }).click();
  await expect(page.locator("#result")).toContainText("ERROR");
  expect(Object.values(closedFake.ctx.state.files)).toEqual([]);
});
