// /admin/… — JSON controls for tests and demos (no key: the fake listens on 127.0.0.1 only).
import { readJsonBody, type Router, sendJson } from "../kit/http";
import type { Outage, OutageMode } from "../kit/serve";
import type { UtContext } from "./context";

export const ADMIN_ENDPOINTS: Record<string, string> = {
  "GET /admin/files": "every stored file record (key, name, size, type, acl, status, slug, fileHash, serverData)",
  "GET /admin/callbacks": "the callbacks sent to the app, newest last, with status or error",
  "POST /admin/outage": '{mode:"unavailable"|"refuse"|"none", seconds?} — 503 for ingest, API and files, or refuse connections for `seconds` (default 5)',
  "POST /admin/reset": "delete every file and registration",
};

export function registerAdmin(router: Router, ctx: UtContext, outage: Outage): void {
  router.on("GET", "/admin", (_req, res) => sendJson(res, 200, { endpoints: ADMIN_ENDPOINTS }));
  router.on("GET", "/admin/files", (_req, res) => sendJson(res, 200, { data: Object.values(ctx.state.files) }));
  router.on("GET", "/admin/callbacks", (_req, res) => sendJson(res, 200, { data: ctx.state.callbacks }));
  router.on("POST", "/admin/reset", (_req, res) => {
    outage.end();
    for (const s of ctx.devStreams.values()) s.res.end();
    ctx.devStreams.clear();
    ctx.bytes.clear();
    ctx.store.reset();
    sendJson(res, 200, { ok: true });
  });
  router.on("POST", "/admin/outage", async (req, res) => {
    const body = (await readJsonBody(req, res)) as { mode?: unknown; seconds?: unknown } | undefined;
    if (body === undefined) return;
    const mode = (body.mode ?? "unavailable") as OutageMode;
    if (!["unavailable", "refuse", "none"].includes(mode)) return sendJson(res, 400, { error: 'mode must be "unavailable", "refuse" or "none"' });
    const seconds = body.seconds === undefined ? null : Number(body.seconds);
    if (seconds !== null && !(seconds > 0 && seconds <= 600)) return sendJson(res, 400, { error: "seconds must be between 0 and 600" });
    outage.start(mode, seconds);
    sendJson(res, 200, outage.describe());
  });
}
