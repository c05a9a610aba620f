// The /v6 API that UTApi calls: delete, list, rename, file URLs, signed access, ACL, usage.
import type { IncomingMessage, ServerResponse } from "node:http";
import { readJsonBody, type Router, sendJson } from "../kit/http";
import type { UtContext } from "./context";
import { signUrl } from "./signing";
import type { FileRecord } from "./state";

type Body = Record<string, unknown>;

/** Files named by `fileKeys`/`customIds` (or a single `fileKey`/`customId`). */
function pick(ctx: UtContext, body: Body): FileRecord[] {
  const keys = Array.isArray(body.fileKeys) ? body.fileKeys.map(String) : typeof body.fileKey === "string" ? [body.fileKey] : [];
  const ids = Array.isArray(body.customIds) ? body.customIds.map(String) : typeof body.customId === "string" ? [body.customId] : [];
  return Object.values(ctx.state.files).filter((f) => keys.includes(f.key) || (f.customId !== null && ids.includes(f.customId)));
}

export function registerUtApi(router: Router, ctx: UtContext): void {
  const api = (path: string, fn: (body: Body) => unknown) =>
    router.on("POST", `/v6/${path}`, async (req: IncomingMessage, res: ServerResponse) => {
      if (req.headers["x-uploadthing-api-key"] !== ctx.opts.apiKey) return sendJson(res, 401, { error: "Invalid or missing x-uploadthing-api-key" });
      const body = await readJsonBody(req, res);
      if (body === undefined) return;
      const out = fn((body ?? {}) as Body);
      ctx.store.changed();
      if (out && typeof out === "object" && "status" in out && "error" in out) return sendJson(res, Number(out.status), { error: out.error });
      sendJson(res, 200, out);
    });

  api("deleteFiles", (body) => {
    const files = pick(ctx, body);
    for (const f of files) {
      ctx.bytes.remove(f.key);
      delete ctx.state.files[f.key];
    }
    return { success: true, deletedCount: files.length };
  });
  api("getFileUrl", (body) => ({ data: pick(ctx, body).map((f) => ({ key: f.key, url: ctx.fileUrl(f) })) }));
  api("listFiles", (body) => {
    const limit = Math.min(Math.max(Number(body.limit ?? 500), 1), 500);
    const offset = Math.max(Number(body.offset ?? 0), 0);
    const all = Object.values(ctx.state.files).sort((a, b) => b.uploadedAt - a.uploadedAt);
    const files = all.slice(offset, offset + limit).map((f) => ({
      id: f.id,
      customId: f.customId,
      key: f.key,
      name: f.name,
      size: f.size,
      status: f.status,
      uploadedAt: f.uploadedAt,
    }));
    return { hasMore: offset + limit < all.length, files };
  });
  api("renameFiles", (body) => {
    const updates = Array.isArray(body.updates) ? (body.updates as Body[]) : [];
    for (const u of updates) for (const f of pick(ctx, u)) if (typeof u.newName === "string") f.name = u.newName;
    return { success: true };
  });
  api("updateACL", (body) => {
    const updates = Array.isArray(body.updates) ? (body.updates as Body[]) : [];
    for (const u of updates) for (const f of pick(ctx, u)) f.acl = u.acl === "private" ? "private" : "public-read";
    return { success: true };
  });
  api("requestFileAccess", (body) => {
    const [file] = pick(ctx, body);
    if (!file) return { status: 404, error: "File not found" };
    const ttl = Math.min(Number(body.expiresIn ?? 3600) || 3600, 7 * 86400);
    const signed = signUrl(`${ctx.publicUrl()}/f/${file.key}`, ctx.opts.apiKey, ttl);
    return { url: signed, ufsUrl: signed };
  });
  api("getUsageInfo", () => {
    const files = Object.values(ctx.state.files).filter((f) => f.status === "Uploaded");
    const total = files.reduce((s, f) => s + f.size, 0);
    return { totalBytes: total, appTotalBytes: total, filesUploaded: files.length, limitBytes: 2 * 1024 ** 3 };
  });
}
