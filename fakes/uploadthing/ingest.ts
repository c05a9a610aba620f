// The ingest server: the app registers route metadata, the browser HEADs and PUTs each file to its
// presigned URL (resumable with `Range: bytes=N-`), and the fake calls the app back before it
// answers the PUT with the file's URL, hash and the app's server data.
import { createHash } from "node:crypto";
import type { IncomingMessage, ServerResponse } from "node:http";
import { readBody, readJsonBody, type Router, sendJson } from "../kit/http";
import { postCallback, pushDevCallback } from "./callback";
import type { UtContext } from "./context";
import { verifySignedUrl } from "./signing";
import type { FileRecord, Registration } from "./state";

/** `x-ut-*` values are URI-encoded before they go into the query string (so encoded twice). */
function utParam(url: URL, name: string): string | null {
  const v = url.searchParams.get(name);
  if (v === null) return null;
  try {
    return decodeURIComponent(v);
  } catch {
    return v;
  }
}

const fullUrl = (req: IncomingMessage) => `http://${req.headers.host ?? "127.0.0.1"}${req.url ?? "/"}`;

function checkApiKey(ctx: UtContext, req: IncomingMessage, res: ServerResponse): boolean {
  if (req.headers["x-uploadthing-api-key"] === ctx.opts.apiKey) return true;
  sendJson(res, 401, { error: "Invalid or missing x-uploadthing-api-key" });
  return false;
}

/** The presigned URL's checks: signature, expiry, our app id. */
function checkPresigned(ctx: UtContext, req: IncomingMessage, res: ServerResponse): URL | null {
  const check = verifySignedUrl(fullUrl(req), ctx.opts.apiKey);
  if (!check.ok) {
    sendJson(res, check.status, { error: check.message });
    return null;
  }
  if (utParam(check.url, "x-ut-identifier") !== ctx.opts.appId) {
    sendJson(res, 403, { error: "This URL was signed for another app" });
    return null;
  }
  return check.url;
}

async function fileBytesFrom(req: IncomingMessage, body: Buffer): Promise<Buffer | null> {
  const type = req.headers["content-type"] ?? "";
  if (!type.startsWith("multipart/form-data")) return body;
  const form = await new Request("http://ingest.local/", { method: "PUT", headers: { "content-type": type }, body: new Uint8Array(body) }).formData();
  const file = form.get("file");
  if (!file || typeof file === "string") return null;
  return Buffer.from(await file.arrayBuffer());
}

async function registrationFor(ctx: UtContext, key: string, expectOne: boolean): Promise<Registration | null> {
  // The app registers route metadata while the browser starts uploading; give it a moment.
  for (let waited = 0; waited <= (expectOne ? 3000 : 0); waited += 50) {
    const id = ctx.state.registered[key];
    if (id && ctx.state.registrations[id]) return ctx.state.registrations[id]!;
    await new Promise((r) => setTimeout(r, 50));
  }
  return null;
}

function uploadAnswer(ctx: UtContext, file: FileRecord, serverData: unknown) {
  const url = ctx.fileUrl(file);
  return { url, appUrl: url, ufsUrl: url, fileHash: file.fileHash, serverData: serverData ?? null };
}

export function registerIngest(router: Router, ctx: UtContext): void {
  router.on("POST", "/route-metadata", async (req, res) => {
    if (!checkApiKey(ctx, req, res)) return;
    const body = (await readJsonBody(req, res)) as Partial<Registration> | undefined;
    if (body === undefined) return;
    if (!Array.isArray(body.fileKeys) || typeof body.callbackUrl !== "string" || typeof body.callbackSlug !== "string") {
      return sendJson(res, 400, { error: "fileKeys, callbackUrl and callbackSlug are required" });
    }
    const reg: Registration = {
      id: `reg_${Date.now().toString(36)}_${Math.random().toString(36).slice(2, 8)}`,
      fileKeys: body.fileKeys.map(String),
      metadata: body.metadata ?? {},
      isDev: body.isDev === true,
      callbackUrl: body.callbackUrl,
      callbackSlug: body.callbackSlug,
      awaitServerData: body.awaitServerData !== false,
      created: Date.now(),
    };
    const s = ctx.state;
    for (const [id, r] of Object.entries(s.registrations)) if (r.created < Date.now() - 3600_000) delete s.registrations[id];
    s.registrations[reg.id] = reg;
    for (const k of reg.fileKeys) s.registered[k] = reg.id;
    ctx.store.changed();
    if (!reg.isDev) return sendJson(res, 200, { ok: true });
    // Dev mode: keep the answer open and stream a signed callback per file as it arrives.
    res.writeHead(200, { "Content-Type": "application/x-ndjson", "Cache-Control": "no-store" });
    res.flushHeaders();
    ctx.devStreams.set(reg.id, { res, pending: new Set(reg.fileKeys) });
    req.on("close", () => ctx.devStreams.delete(reg.id));
  });

  router.on("POST", "/callback-result", async (req, res) => {
    if (!checkApiKey(ctx, req, res)) return;
    const body = (await readJsonBody(req, res)) as { fileKey?: unknown; callbackData?: unknown; error?: unknown } | undefined;
    if (body === undefined) return;
    if (typeof body.fileKey !== "string") return sendJson(res, 400, { error: "fileKey is required" });
    ctx.results.deliver(body.fileKey, typeof body.error === "string" ? { error: body.error } : { callbackData: body.callbackData ?? null });
    sendJson(res, 200, { ok: true });
  });

  router.on("HEAD", "/:key", (req, res, { key }) => {
    if (!checkPresigned(ctx, req, res)) return;
    const file = ctx.state.files[key!];
    res.writeHead(200, { "x-ut-range-start": String(file?.received ?? 0), "Cache-Control": "no-store" });
    res.end();
  });

  router.on("PUT", "/:key", async (req, res, { key }) => {
    const url = checkPresigned(ctx, req, res);
    if (!url) return;
    const size = Number(utParam(url, "x-ut-file-size"));
    const name = utParam(url, "x-ut-file-name") ?? key!;
    const start = Number(/^bytes=(\d+)-/.exec(String(req.headers.range ?? ""))?.[1] ?? 0);
    const bytes = await fileBytesFrom(req, await readBody(req, Math.max(0, size - start) + 1024 * 1024));
    if (!bytes) return sendJson(res, 400, { error: 'The multipart body has no "file" field' });

    const s = ctx.state;
    const prior = s.files[key!];
    if (prior?.status === "Uploaded") return sendJson(res, 409, { error: "This file is already uploaded" });
    if (start > 0 && (!prior || prior.received !== start)) {
      return sendJson(res, 416, { error: `Resume from byte ${prior?.received ?? 0}, not ${start}` });
    }
    if (start + bytes.length > size) {
      ctx.bytes.remove(key!);
      delete s.files[key!];
      ctx.store.changed();
      return sendJson(res, 413, { error: `The file is larger than the ${size} bytes it was signed for` });
    }
    const file: FileRecord = prior ?? {
      id: `file_${key}`,
      key: key!,
      name,
      size,
      type: utParam(url, "x-ut-file-type") ?? "application/octet-stream",
      customId: utParam(url, "x-ut-custom-id"),
      acl: utParam(url, "x-ut-acl") === "private" ? "private" : "public-read",
      contentDisposition: utParam(url, "x-ut-content-disposition") === "attachment" ? "attachment" : "inline",
      slug: utParam(url, "x-ut-slug"),
      status: "Uploading",
      received: 0,
      fileHash: null,
      uploadedAt: Date.now(),
      lastModified: Date.now(),
      serverData: null,
    };
    ctx.bytes.write(key!, bytes, start > 0);
    file.received = start + bytes.length;
    s.files[key!] = file;
    ctx.store.changed();
    if (file.received < size) {
      return sendJson(res, 200, { error: `Upload incomplete: ${file.received} of ${size} bytes; resume with Range: bytes=${file.received}-` });
    }
    file.fileHash = createHash("md5").update(ctx.bytes.read(key!)!).digest("hex");
    file.status = "Uploaded";
    file.uploadedAt = Date.now();
    ctx.store.changed();

    // Uploads through the app's file route (x-ut-slug) are called back; UTApi uploads are not.
    const reg = await registrationFor(ctx, key!, file.slug !== null);
    if (!reg) return sendJson(res, 200, uploadAnswer(ctx, file, null));
    const waiting = reg.awaitServerData ? ctx.results.wait(key!, ctx.opts.callbackTimeoutMs) : null;
    const told = reg.isDev ? pushDevCallback(ctx, reg, file) : reg.awaitServerData ? await postCallback(ctx, reg, file) : (void postCallback(ctx, reg, file), true);
    if (!told) {
      file.status = "Failed";
      ctx.store.changed();
      return sendJson(res, 502, { error: "The app's upload callback failed; the file was not accepted" });
    }
    const result = waiting ? await waiting : null;
    if (result?.error) {
      file.status = "Failed";
      ctx.store.changed();
      return sendJson(res, 200, { error: result.error });
    }
    file.serverData = result?.callbackData ?? null;
    ctx.store.changed();
    sendJson(res, 200, uploadAnswer(ctx, file, file.serverData));
  });
}
