// Calling a server action over HTTP exactly as Next's router does in the browser
// (next/dist/client/components/router-reducer/reducers/server-action-reducer.js): a POST to the
// page's path with the `Next-Action` header carrying the action's id, `Accept: text/x-component`,
// and the arguments encoded by React's `encodeReply`; the answer is a React flight stream whose
// root row is `{ a: <the action's return value>, … }`, decoded with React's own client.
// The action ids come from the build's server-reference manifest (`<distDir>/server/
// server-reference-manifest.json`: id → { filename, exportedName, workers: { "app/…/page": … } }).
import { existsSync, readFileSync } from "node:fs";
import { createRequire } from "node:module";
import { join } from "node:path";
import { ERROR_STATUS, type ErrorCode } from "@/lib/http/errors";
import type { HttpSession } from "../http/session";
import { ROOT } from "./inventory";
import { send } from "./send";

const require = createRequire(import.meta.url);
// The same React Flight client Next ships and uses for actions (turbopack build).
const flight = require("next/dist/compiled/react-server-dom-turbopack/client.node");
const referenceInfo = require("next/dist/shared/lib/server-reference-info");

interface ManifestEntry {
  filename: string;
  exportedName: string;
  workers: Record<string, unknown>;
}

export interface BuiltAction {
  id: string;
  filename: string;
  exportedName: string;
  /** The pages (e.g. `app/(app)/[workshop]/cohorts/page`) whose bundles hold the action. */
  pages: string[];
}

/** Every action in the build the test app runs (NEXT_DIST_DIR, `.next-test` under `npm test`). */
export function builtActions(): BuiltAction[] {
  const file = join(ROOT, process.env.NEXT_DIST_DIR ?? ".next-test", "server", "server-reference-manifest.json");
  if (!existsSync(file)) throw new Error(`${file} is missing: run through \`npm test\`, which builds the app first`);
  const node = (JSON.parse(readFileSync(file, "utf8")) as { node: Record<string, ManifestEntry> }).node;
  return Object.entries(node).map(([id, e]) => ({ id, filename: e.filename, exportedName: e.exportedName, pages: Object.keys(e.workers) }));
}

/** A page that holds the action: the one beside its actions file if there is one, else the shortest. */
export function pageFor(action: BuiltAction): string {
  const dir = action.filename.replace(/\/[^/]+$/, "");
  const beside = action.pages.find((p) => p === `${dir}/page`);
  const page = beside ?? [...action.pages].sort((a, b) => a.length - b.length)[0];
  if (!page) throw new Error(`${action.filename}#${action.exportedName} is in no page's bundle: nothing can call it`);
  return page;
}

/** `app/(app)/[workshop]/cohorts/page` with { workshop: "ws-1" } → `/ws-1/cohorts`. */
export function pagePath(page: string, segments: Record<string, string | number>): string {
  const parts = page
    .split("/")
    .slice(1, -1)
    .filter((s) => !/^\(.*\)$/.test(s))
    .map((s) => {
      const m = /^\[(.+)\]$/.exec(s);
      if (!m) return s;
      const v = segments[m[1]!];
      if (v === undefined) throw new Error(`no value for the segment [${m[1]}] of ${page}`);
      return encodeURIComponent(String(v));
    });
  return `/${parts.join("/")}`;
}

// Client components in the re-rendered page are referenced by module id; the test never renders
// them, so every reference resolves to a stand-in and no chunk is loaded.
const anyModule = new Proxy({}, { get: (_t, id) => new Proxy({}, { get: (_u, name) => ({ id, name, chunks: [], async: false }) }) });
const g = globalThis as Record<string, unknown>;
g.__next_require__ ??= () => ({});
g.__next_chunk_load__ ??= () => Promise.resolve();
g.__turbopack_require__ ??= () => ({});
g.__turbopack_load__ ??= () => Promise.resolve();

export interface ActionAnswer {
  /** The HTTP status of the POST (200 whenever the action ran, whatever it answered). */
  httpStatus: number;
  /** What the action returned (undefined for a redirect or a void action). */
  result: unknown;
  /** `x-action-redirect` when the action redirected. */
  redirect: string | null;
  /** The response body as text (for the no-stack-trace checks). */
  text: string;
}

/** Calls the action `id` with `args` as `s`, posting to `path` (the page the browser is on). */
export async function callAction(s: HttpSession, id: string, path: string, args: unknown[]): Promise<ActionAnswer> {
  const used = referenceInfo.omitUnusedArgs(args, referenceInfo.extractInfoFromServerReferenceId(id));
  const body = await flight.encodeReply(used, { temporaryReferences: flight.createTemporaryReferenceSet() });
  if (typeof body !== "string") throw new Error("these arguments encode as multipart form data; send plain JSON-like values");
  const res = await send(s, { path, method: "POST", body, headers: { accept: "text/x-component", "next-action": id, "content-type": "text/plain;charset=UTF-8" } });
  const text = await res.clone().text();
  const redirect = res.headers.get("x-action-redirect");
  let result: unknown;
  // The flight answer carries the action's value even when re-rendering the page after it failed
  // (a page whose object the action just removed answers 404 around a successful result).
  if ((res.headers.get("content-type") ?? "").startsWith("text/x-component")) {
    const root = (await flight.createFromFetch(Promise.resolve(res), { serverConsumerManifest: { moduleMap: anyModule, serverModuleMap: null, moduleLoading: null } })) as { a?: unknown };
    result = redirect ? undefined : await root.a;
  }
  return { httpStatus: res.status, result, redirect, text };
}

/**
 * One number for what an action answered, comparable with a route's status: 303 for a redirect,
 * 200 for `{ ok: true }`, the status of the error code for `{ ok: false, code }`, else the HTTP
 * status when the action did not run normally (404 unknown action, 500), 204 for no value.
 */
export function actionOutcome(a: ActionAnswer): number {
  if (a.redirect) return 303;
  const r = a.result as { ok?: boolean; code?: ErrorCode } | undefined;
  if (r === undefined || r === null) return a.httpStatus === 200 ? 204 : a.httpStatus;
  if (r.ok === true) return 200;
  if (r.ok === false && r.code && r.code in ERROR_STATUS) return ERROR_STATUS[r.code];
  throw new Error(`the action answered neither { ok } nor a redirect: ${JSON.stringify(r).slice(0, 200)}`);
}
