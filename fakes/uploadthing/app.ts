// The UploadThing fake as an object: build it with options, listen, close. server.ts runs it from
// the environment; tests start their own on a free port.
import type { IncomingMessage, ServerResponse } from "node:http";
import { dispatch, Router, sendJson } from "../kit/http";
import { listen, Outage, type RunningServer } from "../kit/serve";
import { registerAdmin } from "./admin";
import { CallbackResults, type UtContext } from "./context";
import { handleCors } from "./cors";
import { registerFiles } from "./files";
import { registerIngest } from "./ingest";
import type { UploadthingFakeOptions } from "./options";
import { openState } from "./state";
import { registerUtApi } from "./ut-api";

export interface UploadthingFake {
  readonly url: string;
  readonly port: number;
  readonly ctx: UtContext;
  close(): Promise<void>;
}

export async function startUploadthingFake(opts: UploadthingFakeOptions): Promise<UploadthingFake> {
  const { store, bytes } = openState(opts.dataDir);
  let running: RunningServer | null = null;
  const outage = new Outage(() => running);
  const ctx: UtContext = {
    opts,
    store,
    bytes,
    get state() {
      return store.state;
    },
    results: new CallbackResults(),
    devStreams: new Map(),
    publicUrl: () => opts.publicUrl ?? running?.url ?? `http://127.0.0.1:${opts.port}`,
    fileUrl: (file) => `${opts.publicUrl ?? running?.url}/f/${file.key}`,
    log: (m) => {
      if (!opts.quiet) console.log(`[uploadthing fake] ${m}`);
    },
  };

  const router = new Router();
  router.on("GET", "/health", (_req, res) => sendJson(res, 200, { ok: true, service: "uploadthing-fake" }));
  router.on("GET", "/", (_req, res) =>
    sendJson(res, 200, {
      service: "UploadThing fake (local)",
      ingest: ctx.publicUrl(),
      files: Object.keys(ctx.state.files).length,
      admin: `${ctx.publicUrl()}/admin`,
    }),
  );
  registerAdmin(router, ctx, outage);
  registerIngest(router, ctx);
  registerUtApi(router, ctx);
  registerFiles(router, ctx);

  const handle = async (req: IncomingMessage, res: ServerResponse) => {
    const url = new URL(req.url ?? "/", "http://fake.local");
    if (handleCors(req, res, opts.allowedOrigins)) return;
    const open = url.pathname === "/health" || url.pathname.startsWith("/admin");
    if (outage.unavailable && !open) return sendJson(res, 503, { error: "The upload service is unavailable right now (planned outage)" });
    if (!(await dispatch(router, req, res, url))) sendJson(res, 404, { error: `Nothing at ${req.method} ${url.pathname}` });
  };
  running = await listen(handle, opts.port);
  const server = running;
  return {
    url: server.url,
    port: server.port,
    ctx,
    async close() {
      outage.end(false);
      for (const s of ctx.devStreams.values()) s.res.end();
      store.flush();
      await server.close();
    },
  };
}
