// Serving stored files: /f/{key}, /a/{appId}/f/{key} and /a/{appId}/{key} (the URL UTApi's
// generateSignedURL builds in "path" mode). Private files need a valid, unexpired signature.
import type { IncomingMessage, ServerResponse } from "node:http";
import { type Router, sendJson } from "../kit/http";
import type { UtContext } from "./context";
import { verifySignedUrl } from "./signing";

export function registerFiles(router: Router, ctx: UtContext): void {
  const serve = (req: IncomingMessage, res: ServerResponse, key: string, appId: string | null) => {
    const file = ctx.state.files[key];
    if ((appId !== null && appId !== ctx.opts.appId) || !file || file.status !== "Uploaded") return sendJson(res, 404, { error: "Not found" });
    const full = `http://${req.headers.host ?? "127.0.0.1"}${req.url ?? "/"}`;
    const signed = full.includes("&signature=") || full.includes("?signature=");
    if (file.acl === "private" || signed) {
      const check = verifySignedUrl(full, ctx.opts.apiKey);
      if (!check.ok) return sendJson(res, check.status, { error: file.acl === "private" ? `Private file: ${check.message}` : check.message });
    }
    const bytes = ctx.bytes.read(key);
    if (!bytes) return sendJson(res, 404, { error: "Not found" });
    const ascii = file.name.replace(/[^\x20-\x7e]/g, "_").replace(/"/g, "'");
    res.writeHead(200, {
      "Content-Type": file.type,
      "Content-Length": String(bytes.length),
      "Content-Disposition": `${file.contentDisposition}; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(file.name)}`,
      "Cache-Control": file.acl === "private" ? "private, no-store" : "public, max-age=3600",
      "X-Content-Type-Options": "nosniff",
      ETag: `"${file.fileHash}"`,
    });
    res.end(req.method === "HEAD" ? undefined : bytes);
  };
  for (const method of ["GET", "HEAD"]) {
    router.on(method, "/f/:key", (req, res, { key }) => serve(req, res, key!, null));
    router.on(method, "/a/:appId/f/:key", (req, res, { appId, key }) => serve(req, res, key!, appId!));
    router.on(method, "/a/:appId/:key", (req, res, { appId, key }) => serve(req, res, key!, appId!));
  }
}
