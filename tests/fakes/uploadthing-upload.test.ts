// The UploadThing fake with the real SDK: a createRouteHandler file router served on a local port,
// uploads driven by uploadthing/client's own code, callbacks verified by the SDK, files read back.
import { createHash } from "node:crypto";
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { genUploader } from "uploadthing/client";
import { createRouteHandler, createUploadthing, UTFile, type FileRouter } from "uploadthing/server";
import { afterAll, afterEach, beforeAll, describe, expect, it } from "vitest";
import { z } from "zod";
import { startUploadthingFake, type UploadthingFake } from "@/fakes/uploadthing/app";
import { testOptions } from "@/fakes/uploadthing/options";
import { createUtApi, uploadthingRouteConfig, uploadthingSettings, type UploadthingSettings } from "@/lib/services/uploadthing";
import { makePng } from "./helpers/png";
import { serveFetchHandler, type TestServer } from "./helpers/web-server";
import { FetchXMLHttpRequest } from "./helpers/xhr-over-fetch";

const f = createUploadthing();
const completed: { metadata: Record<string, unknown>; file: { key: string; name: string; size: number; fileHash: string; ufsUrl: string } }[] = [];

const router = {
  stagePhoto: f({ image: { maxFileSize: "8MB", maxFileCount: 4 } })
    .input(z.object({ stage: z.string(), caption: z.string() }))
    .middleware(({ input, req }) => ({ commissionId: "cm_test_1", stage: input.stage, caption: input.caption, by: req.headers.get("x-test-user") }))
    .onUploadComplete(({ metadata, file }) => {
      completed.push({ metadata, file });
      return { photoId: `ph_${file.key.slice(0, 8)}` };
    }),
  quickExpiry: f({ image: { maxFileSize: "1MB" } }, { presignedURLTTL: 1 })
    .middleware(() => ({}))
    .onUploadComplete(() => ({ ok: true })),
  privateScan: f({ image: { maxFileSize: "1MB", acl: "private" } })
    .middleware(() => ({ kind: "scan" }))
    .onUploadComplete(() => ({ stored: true })),
} satisfies FileRouter;

let fake: UploadthingFake;
let app: TestServer;
let settings: UploadthingSettings;
let handler: (req: Request) => Promise<Response>;

/** Settings built by the app's own service module, pointed at this test's fake and app. */
function settingsFor(isDev: boolean): UploadthingSettings {
  return uploadthingSettings({
    UPLOADTHING_API_KEY: fake.ctx.opts.apiKey,
    UPLOADTHING_APP_ID: fake.ctx.opts.appId,
    FAKE_UPLOADTHING_PORT: String(fake.port),
    UPLOADTHING_CALLBACK_URL: `${app.url}/api/uploadthing`,
    UPLOADTHING_IS_DEV: String(isDev),
    UPLOADTHING_LOG_LEVEL: "Error",
  });
}

function useFlow(isDev: boolean) {
  settings = settingsFor(isDev);
  handler = createRouteHandler({ router, config: uploadthingRouteConfig(settings) });
}

const uploader = () =>
  genUploader<typeof router>({ url: `${app.url}/api/uploadthing`, package: "@uploadthing/react", fetch: globalThis.fetch });

/** Asks the app's route for presigned URLs, as the client's first request does. */
async function presign(slug: keyof typeof router, file: { name: string; size: number; type: string }, input: unknown = null) {
  const res = await fetch(`${app.url}/api/uploadthing?actionType=upload&slug=${slug}`, {
    method: "POST",
    headers: { "Content-Type": "application/json", "x-uploadthing-version": "7.7.4" },
    body: JSON.stringify({ files: [{ ...file, lastModified: Date.now() }], input }),
  });
  expect(res.status).toBe(200);
  return (await res.json()) as { url: string; key: string }[];
}

function multipart(bytes: Buffer, type = "image/png"): FormData {
  const fd = new FormData();
  fd.append("file", new Blob([new Uint8Array(bytes)], { type }));
  return fd;
}

beforeAll(async () => {
  (globalThis as { XMLHttpRequest?: unknown }).XMLHttpRequest = FetchXMLHttpRequest;
  fake = await startUploadthingFake(testOptions({ allowedOrigins: ["http://localhost:7777"] }));
  app = await serveFetchHandler((req) => handler(req));
  useFlow(false);
});

afterAll(async () => {
  delete (globalThis as { XMLHttpRequest?: unknown }).XMLHttpRequest;
  await app?.close();
  await fake?.close();
});

afterEach(() => {
  completed.length = 0;
  useFlow(false);
});

describe("UploadThing fake with the real SDK", () => {
  it("takes an upload from uploadthing/client, calls the file route back signed, and serves the same bytes", async () => {
    const png = await makePng(80, 60, 3);
    const progress: number[] = [];
    const result = await uploader().uploadFiles("stagePhoto", {
      files: [new File([new Uint8Array(png)], "fret-slots.png", { type: "image/png" })],
      input: { stage: "fretwork", caption: "Slots cut, before the wire" },
      headers: { "x-test-user": "builder-7" },
      onUploadProgress: ({ progress: p }) => progress.push(p),
    });
    expect(result).toHaveLength(1);
    const up = result[0]!;
    expect(up.serverData).toEqual({ photoId: `ph_${up.key.slice(0, 8)}` });
    expect(up.fileHash).toBe(createHash("md5").update(png).digest("hex"));
    expect(progress.at(-1)).toBe(100);

    // onUploadComplete ran inside createRouteHandler, after the SDK verified the fake's signature.
    expect(completed).toHaveLength(1);
    expect(completed[0]!.metadata).toEqual({ commissionId: "cm_test_1", stage: "fretwork", caption: "Slots cut, before the wire", by: "builder-7" });
    expect(completed[0]!.file).toMatchObject({ key: up.key, name: "fret-slots.png", size: png.length });

    const back = await fetch(up.ufsUrl);
    expect(back.status).toBe(200);
    expect(back.headers.get("content-type")).toBe("image/png");
    expect(Buffer.from(await back.arrayBuffer()).equals(png)).toBe(true);
    expect(fake.ctx.state.callbacks.at(-1)).toMatchObject({ key: up.key, status: 200, error: null });
  });

  it("works the same in dev mode, where /route-metadata streams signed callbacks the SDK forwards", async () => {
    useFlow(true);
    const png = await makePng(30, 30, 5);
    const [up] = await uploader().uploadFiles("stagePhoto", {
      files: [new File([new Uint8Array(png)], "body-blank.png", { type: "image/png" })],
      input: { stage: "body", caption: "Roughed out" },
    });
    expect(up!.serverData).toEqual({ photoId: `ph_${up!.key.slice(0, 8)}` });
    expect(completed.map((c) => c.metadata.stage)).toEqual(["body"]);
    expect(fake.ctx.state.callbacks.filter((c) => c.key === up!.key)).toEqual([]); // the SDK, not the fake, called the route
    expect(Buffer.from(await (await fetch(up!.ufsUrl)).arrayBuffer()).equals(png)).toBe(true);
  });

  it("refuses a presigned URL whose signature or signed fields were changed", async () => {
    const png = await makePng(10, 10);
    const [p] = await presign("stagePhoto", { name: "a.png", size: png.length, type: "image/png" }, { stage: "neck", caption: "x" });
    const url = new URL(p!.url);
    const biggerFile = p!.url.replace(`x-ut-file-size=${png.length}`, `x-ut-file-size=${png.length * 100}`);
    const badSig = p!.url.slice(0, -4) + (p!.url.endsWith("0000") ? "1111" : "0000");
    for (const tampered of [biggerFile, badSig, `${url.origin}${url.pathname}?${url.searchParams.toString().split("&signature=")[0]}`]) {
      const res = await fetch(tampered, { method: "PUT", body: multipart(png), headers: { Range: "bytes=0-" } });
      expect(res.status).toBe(403);
    }
    expect(fake.ctx.state.files[p!.key]).toBeUndefined();
    expect(completed).toHaveLength(0);
  });

  it("refuses an expired presigned URL (the route's presignedURLTTL)", async () => {
    const png = await makePng(10, 10);
    const [p] = await presign("quickExpiry", { name: "late.png", size: png.length, type: "image/png" });
    await new Promise((r) => setTimeout(r, 1200));
    const res = await fetch(p!.url, { method: "PUT", body: multipart(png), headers: { Range: "bytes=0-" } });
    expect(res.status).toBe(403);
    expect(await res.json()).toEqual({ error: "URL expired" });
  });

  it("refuses more bytes than the URL was signed for", async () => {
    const png = await makePng(20, 20);
    const [p] = await presign("stagePhoto", { name: "small.png", size: 100, type: "image/png" }, { stage: "neck", caption: "x" });
    const res = await fetch(p!.url, { method: "PUT", body: multipart(png), headers: { Range: "bytes=0-" } });
    expect(res.status).toBe(413);
  });

  it("resumes an interrupted upload from the byte HEAD reports in x-ut-range-start", async () => {
    const png = await makePng(50, 50, 9);
    const half = Math.floor(png.length / 2);
    const [p] = await presign("stagePhoto", { name: "resume.png", size: png.length, type: "image/png" }, { stage: "finish", caption: "Sealer coat" });
    const first = await fetch(p!.url, { method: "PUT", body: multipart(png.subarray(0, half)), headers: { Range: "bytes=0-" } });
    expect((await first.json()).error).toMatch(/incomplete/);
    const head = await fetch(p!.url, { method: "HEAD" });
    expect(head.headers.get("x-ut-range-start")).toBe(String(half));
    const rest = await fetch(p!.url, { method: "PUT", body: multipart(png.subarray(half)), headers: { Range: `bytes=${half}-` } });
    const done = (await rest.json()) as { ufsUrl: string; serverData: unknown };
    expect(done.serverData).toEqual({ photoId: `ph_${p!.key.slice(0, 8)}` });
    expect(Buffer.from(await (await fetch(done.ufsUrl)).arrayBuffer()).equals(png)).toBe(true);
  });

  it("the route handler refuses a callback whose signature is wrong (nothing runs)", async () => {
    const body = JSON.stringify({ status: "uploaded", metadata: {}, origin: fake.url, file: { name: "x", size: 1, type: "image/png", key: "k", url: "u", appUrl: "u", ufsUrl: "u", fileHash: "h", customId: null } });
    const res = await fetch(`${app.url}/api/uploadthing?slug=stagePhoto`, {
      method: "POST",
      headers: { "Content-Type": "application/json", "uploadthing-hook": "callback", "x-uploadthing-signature": `hmac-sha256=${"ab".repeat(32)}` },
      body,
    });
    expect(res.status).toBe(400);
    expect(completed).toHaveLength(0);
  });

  it("checks the API key on /route-metadata, /callback-result and the /v6 API", async () => {
    for (const path of ["/route-metadata", "/callback-result", "/v6/listFiles"]) {
      const res = await fetch(`${fake.url}${path}`, { method: "POST", headers: { "x-uploadthing-api-key": "sk_wrong" }, body: "{}" });
      expect(res.status).toBe(401);
    }
  });

  it("UTApi: uploads from the server, lists, signs private files, and deleteFiles makes a file unreachable", async () => {
    const api = createUtApi(settings);
    const png = await makePng(12, 12, 4);
    const up = await api.uploadFiles(new UTFile([new Uint8Array(png)], "server-side.png", { type: "image/png" }));
    expect(up.error).toBeNull();
    const key = up.data!.key;
    const listed = await api.listFiles();
    expect(listed.files.map((x) => x.key)).toContain(key);

    const deleted = await api.deleteFiles([key]);
    expect(deleted).toEqual({ success: true, deletedCount: 1 });
    expect((await fetch(up.data!.ufsUrl)).status).toBe(404);
    expect((await api.listFiles()).files.map((x) => x.key)).not.toContain(key);
  });

  it("serves a private file only through a valid signed URL", async () => {
    const png = await makePng(16, 16, 2);
    const [up] = await uploader().uploadFiles("privateScan", { files: [new File([new Uint8Array(png)], "scan.png", { type: "image/png" })] });
    expect((await fetch(up!.ufsUrl)).status).toBe(403);
    const api = createUtApi(settings);
    const { ufsUrl } = await api.generateSignedURL(up!.key, { expiresIn: 60 });
    expect(ufsUrl.startsWith(`http://localhost:${fake.port}/a/${fake.ctx.opts.appId}/`)).toBe(true);
    const ok = await fetch(ufsUrl);
    expect(ok.status).toBe(200);
    expect(Buffer.from(await ok.arrayBuffer()).equals(png)).toBe(true);
    expect((await fetch(ufsUrl.replace(/.$/, (c) => (c === "0" ? "1" : "0")))).status).toBe(403);
    const access = await api.getSignedURL(up!.key, { expiresIn: 60 });
    expect((await fetch(access.ufsUrl)).status).toBe(200);
  });

  it("answers CORS preflights for the app's origin only", async () => {
    const ask = (origin: string) =>
      fetch(`${fake.url}/somekey`, {
        method: "OPTIONS",
        headers: { Origin: origin, "Access-Control-Request-Method": "PUT", "Access-Control-Request-Headers": "range,x-uploadthing-version,b3,traceparent" },
      });
    const ok = await ask("http://localhost:7777");
    expect(ok.status).toBe(204);
    expect(ok.headers.get("access-control-allow-origin")).toBe("http://localhost:7777");
    expect(ok.headers.get("access-control-allow-methods")).toMatch(/PUT/);
    expect(ok.headers.get("access-control-allow-headers")).toBe("range, x-uploadthing-version, b3, traceparent");
    const other = await ask("http://elsewhere.example.com");
    expect(other.status).toBe(403);
    expect(other.headers.get("access-control-allow-origin")).toBeNull();
  });

  it("keeps files across a restart when it has a data folder", async () => {
    const dir = mkdtempSync(join(tmpdir(), "ut-fake-"));
    try {
      const first = await startUploadthingFake(testOptions({ dataDir: dir }));
      const api = createUtApi({ ...settings, ingestUrl: first.url, apiUrl: first.url, ufsHost: `localhost:${first.port}` });
      const png = await makePng(8, 8, 8);
      const up = await api.uploadFiles(new UTFile([new Uint8Array(png)], "kept.png", { type: "image/png" }));
      const port = first.port;
      await first.close();
      const second = await startUploadthingFake(testOptions({ dataDir: dir, port }));
      try {
        const back = await fetch(up.data!.ufsUrl);
        expect(Buffer.from(await back.arrayBuffer()).equals(png)).toBe(true);
      } finally {
        await second.close();
      }
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
