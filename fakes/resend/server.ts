// A local stand-in for the Resend HTTP API, as far as the `resend` SDK uses it: POST /emails,
// POST /emails/batch and GET /emails/:id, with Bearer API-key checks and Idempotency-Key handling.
// Plus an inbox page for people (/inbox) and admin endpoints for tests (/admin/*).
//
//   PORT          FAKE_RESEND_PORT (default 3410), bound to 127.0.0.1
//   API key       RESEND_API_KEY (the same value the app uses)
//   state         $FAKES_DATA_DIR/resend-state.json (survives restarts)
//   misbehaviour  FAKE_RESEND_MODE=fail|reject|slow at start, or POST /admin/mode
import { createHash, randomUUID } from "node:crypto";
import { createServer, type IncomingMessage, type ServerResponse } from "node:http";
import { join } from "node:path";
import { inboxPage, linksIn, messagePage } from "./inbox-page";
import { Modes, type ModeRule } from "./modes";
import { Store, type StoredMessage } from "./store";

const port = Number(process.env.FAKE_RESEND_PORT ?? 3410);
const apiKey = process.env.RESEND_API_KEY ?? "re_fake_local_key";
const dataDir = process.env.FAKES_DATA_DIR ?? join(process.env.DATA_DIR ?? ".data", "fakes");
const store = new Store(dataDir);
const modes = new Modes(process.env.FAKE_RESEND_MODE);

/** Every API request the fake saw, newest last (in memory), so tests can count deliveries. */
interface RequestLogEntry {
  at: string;
  path: string;
  idempotencyKey: string | null;
  to: string[];
  outcome: "accepted" | "replayed" | "failed" | "rejected" | "conflict" | "unauthorized" | "invalid";
  status: number;
}
const requestLog: RequestLogEntry[] = [];
const inFlight = new Set<string>();
function logRequest(e: RequestLogEntry): void {
  requestLog.push(e);
  if (requestLog.length > 10_000) requestLog.splice(0, requestLog.length - 10_000);
}

type Json = Record<string, unknown> | unknown[];

function send(res: ServerResponse, status: number, body: Json | string, type = "application/json"): void {
  const text = typeof body === "string" ? body : JSON.stringify(body);
  res.writeHead(status, { "content-type": type === "application/json" ? "application/json; charset=utf-8" : `${type}; charset=utf-8` });
  res.end(text);
}

/** Resend's error body: { statusCode, name, message }. */
function apiError(res: ServerResponse, status: number, name: string, message: string): void {
  send(res, status, { statusCode: status, name, message });
}

async function readBody(req: IncomingMessage): Promise<string> {
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const chunk of req) {
    size += (chunk as Buffer).length;
    if (size > 10 * 1024 * 1024) throw new Error("body too large");
    chunks.push(chunk as Buffer);
  }
  return Buffer.concat(chunks).toString("utf8");
}

const list = (v: unknown): string[] => (v === undefined || v === null ? [] : Array.isArray(v) ? v.map(String) : [String(v)]);
const ADDRESS = /^[^\s@<>]+@[^\s@<>]+\.[^\s@<>]+$/;
const bare = (a: string) => (a.match(/<([^>]+)>/)?.[1] ?? a).trim();

/** Validates one e-mail as the API would; returns the problem or the message to store. */
function toMessage(raw: unknown, key: string | null): { error: string } | { message: StoredMessage } {
  if (!raw || typeof raw !== "object" || Array.isArray(raw)) return { error: "The request body must be a JSON object." };
  const b = raw as Record<string, unknown>;
  if (typeof b.from !== "string" || !ADDRESS.test(bare(b.from))) return { error: "The `from` field must be a valid e-mail address or `Name <email@example.com>`." };
  const to = list(b.to);
  if (to.length === 0) return { error: "Missing `to` field." };
  if (to.length > 50) return { error: "The `to` field can hold at most 50 addresses." };
  for (const t of [...to, ...list(b.cc), ...list(b.bcc)]) if (!ADDRESS.test(bare(t))) return { error: `Invalid address: ${t}` };
  if (typeof b.subject !== "string" || b.subject.length === 0) return { error: "Missing `subject` field." };
  if (typeof b.html !== "string" && typeof b.text !== "string") return { error: "Missing `html` or `text` field." };
  return {
    message: {
      id: randomUUID(),
      from: b.from,
      to,
      cc: list(b.cc),
      bcc: list(b.bcc),
      replyTo: list(b.reply_to),
      subject: b.subject,
      html: typeof b.html === "string" ? b.html : null,
      text: typeof b.text === "string" ? b.text : null,
      headers: (b.headers && typeof b.headers === "object" ? b.headers : {}) as Record<string, string>,
      tags: Array.isArray(b.tags) ? (b.tags as Array<{ name: string; value: string }>) : [],
      idempotencyKey: key,
      createdAt: new Date().toISOString(),
    },
  };
}

function authorised(req: IncomingMessage, res: ServerResponse): boolean {
  const header = req.headers.authorization;
  if (!header || !header.startsWith("Bearer ")) {
    apiError(res, 401, "missing_api_key", "Missing API key in the authorization header. Include the following header in the request: Authorization: Bearer YOUR_API_KEY");
    return false;
  }
  if (header.slice(7) !== apiKey) {
    apiError(res, 403, "invalid_api_key", "API key is invalid");
    return false;
  }
  return true;
}

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** Applies the misbehaviour rule for these recipients; true when it already answered. */
async function misbehave(rule: ModeRule | undefined, res: ServerResponse, log: Omit<RequestLogEntry, "outcome" | "status">): Promise<boolean> {
  if (!rule) return false;
  if (rule.mode === "slow") {
    await sleep(rule.delayMs ?? 3000);
    return false;
  }
  if (rule.mode === "fail") {
    const status = rule.status ?? 503;
    logRequest({ ...log, outcome: "failed", status });
    apiError(res, status, status === 429 ? "rate_limit_exceeded" : "application_error", "The fake provider is told to fail right now.");
    return true;
  }
  const status = rule.status ?? 422;
  logRequest({ ...log, outcome: "rejected", status });
  apiError(res, status, "validation_error", "The fake provider is told to reject this message.");
  return true;
}

async function handleSend(req: IncomingMessage, res: ServerResponse, path: string, batch: boolean): Promise<void> {
  const key = (req.headers["idempotency-key"] as string | undefined) ?? null;
  const logBase = { at: new Date().toISOString(), path, idempotencyKey: key };
  if (!authorised(req, res)) {
    logRequest({ ...logBase, to: [], outcome: "unauthorized", status: res.statusCode });
    return;
  }
  let raw: unknown;
  const text = await readBody(req);
  try {
    raw = JSON.parse(text);
  } catch {
    logRequest({ ...logBase, to: [], outcome: "invalid", status: 400 });
    return apiError(res, 400, "invalid_parameter", "The request body is not valid JSON.");
  }
  const items = batch ? raw : [raw];
  if (!Array.isArray(items) || items.length === 0 || items.length > 100) {
    logRequest({ ...logBase, to: [], outcome: "invalid", status: 422 });
    return apiError(res, 422, "validation_error", "A batch is an array of 1 to 100 e-mails.");
  }
  const recipients = items.flatMap((i) => list((i as Record<string, unknown>)?.to));
  const entry = { ...logBase, to: recipients };

  const fingerprint = createHash("sha256").update(text).digest("hex");
  if (key) {
    if (key.length > 256) return apiError(res, 422, "invalid_idempotency_key", "The key must be between 1-256 chars.");
    const seen = store.idempotent(key);
    if (seen) {
      if (seen.fingerprint !== fingerprint) {
        logRequest({ ...entry, outcome: "conflict", status: 409 });
        return apiError(res, 409, "invalid_idempotent_request", "Same idempotency key used with a different request payload.");
      }
      logRequest({ ...entry, outcome: "replayed", status: 200 });
      return send(res, 200, seen.batch ? { data: seen.ids.map((id) => ({ id })) } : { id: seen.ids[0] });
    }
    if (inFlight.has(key)) {
      logRequest({ ...entry, outcome: "conflict", status: 409 });
      return apiError(res, 409, "concurrent_idempotent_requests", "Same idempotency key used while original request is still in progress.");
    }
    inFlight.add(key);
  }
  try {
    if (await misbehave(modes.take(recipients), res, entry)) return;
    const messages: StoredMessage[] = [];
    for (const item of items) {
      const r = toMessage(item, key);
      if ("error" in r) {
        logRequest({ ...entry, outcome: "invalid", status: 422 });
        return apiError(res, 422, "validation_error", r.error);
      }
      messages.push(r.message);
    }
    store.add(messages, key, fingerprint, batch);
    logRequest({ ...entry, outcome: "accepted", status: 200 });
    for (const m of messages) console.log(`[fake resend] accepted "${m.subject}" to ${m.to.join(", ")}: http://127.0.0.1:${port}/inbox/${m.id}`);
    send(res, 200, batch ? { data: messages.map((m) => ({ id: m.id })) } : { id: messages[0]!.id });
  } finally {
    if (key) inFlight.delete(key);
  }
}

/** The SDK's `emails.get` shape. */
function apiEmail(m: StoredMessage) {
  return {
    object: "email",
    id: m.id,
    to: m.to,
    from: m.from,
    created_at: m.createdAt,
    subject: m.subject,
    html: m.html,
    text: m.text,
    bcc: m.bcc,
    cc: m.cc,
    reply_to: m.replyTo,
    last_event: "delivered",
    scheduled_at: null,
    tags: m.tags,
  };
}

/** What tests read: the message plus the links in it. */
function adminMessage(m: StoredMessage) {
  return { ...m, links: m.html ? linksIn(m.html) : [] };
}

async function route(req: IncomingMessage, res: ServerResponse): Promise<void> {
  const url = new URL(req.url ?? "/", `http://127.0.0.1:${port}`);
  const path = url.pathname.replace(/\/+$/, "") || "/";
  const method = req.method ?? "GET";

  if (method === "GET" && path === "/health") return send(res, 200, { ok: true });
  if (method === "GET" && path === "/") {
    res.writeHead(302, { location: "/inbox" });
    return void res.end();
  }

  // --- the API the SDK calls ---
  if (method === "POST" && path === "/emails") return handleSend(req, res, path, false);
  if (method === "POST" && path === "/emails/batch") return handleSend(req, res, path, true);
  const getOne = path.match(/^\/emails\/([0-9a-f-]{36})$/);
  if (method === "GET" && getOne) {
    if (!authorised(req, res)) return;
    const m = store.get(getOne[1]!);
    return m ? send(res, 200, apiEmail(m)) : apiError(res, 404, "not_found", "Email not found");
  }

  // --- the inbox for people ---
  if (method === "GET" && path === "/inbox") {
    const to = url.searchParams.get("to") ?? undefined;
    return send(res, 200, inboxPage(store.list({ to, limit: 200 }), to), "text/html");
  }
  const inboxOne = path.match(/^\/inbox\/([0-9a-f-]{36})(\/html)?$/);
  if (method === "GET" && inboxOne) {
    const m = store.get(inboxOne[1]!);
    if (!m) return send(res, 404, "<!doctype html><p>No such e-mail. <a href='/inbox'>Inbox</a></p>", "text/html");
    return inboxOne[2] ? send(res, 200, m.html ?? "", "text/html") : send(res, 200, messagePage(m), "text/html");
  }

  // --- admin endpoints for tests ---
  if (method === "GET" && path === "/admin/messages") {
    const to = url.searchParams.get("to") ?? undefined;
    const since = url.searchParams.get("since") ?? undefined;
    return send(res, 200, { data: store.list({ to, since }).map(adminMessage) });
  }
  if (method === "GET" && path === "/admin/requests") {
    const to = url.searchParams.get("to")?.toLowerCase();
    return send(res, 200, { data: requestLog.filter((r) => !to || r.to.some((t) => t.toLowerCase() === to)) });
  }
  if (method === "GET" && path === "/admin/mode") return send(res, 200, { rules: modes.list() });
  if (method === "POST" && path === "/admin/mode") {
    let rule: ModeRule;
    try {
      rule = JSON.parse(await readBody(req)) as ModeRule;
    } catch {
      return apiError(res, 400, "invalid_parameter", "Send JSON: {mode, match?, status?, delayMs?, remaining?}");
    }
    if (!["ok", "fail", "reject", "slow"].includes(rule.mode)) return apiError(res, 422, "validation_error", "mode is ok, fail, reject or slow");
    modes.set(rule);
    console.log(`[fake resend] mode ${rule.mode}${rule.match ? ` for recipients containing ${rule.match}` : ""}`);
    return send(res, 200, { rules: modes.list() });
  }
  if (method === "DELETE" && path === "/admin/mode") {
    modes.clear();
    return send(res, 200, { rules: [] });
  }
  if (method === "DELETE" && path === "/admin/messages") {
    store.clear();
    requestLog.splice(0);
    return send(res, 200, { ok: true });
  }
  apiError(res, 404, "not_found", `No route ${method} ${path}`);
}

const server = createServer((req, res) => {
  route(req, res).catch((err) => {
    console.error("[fake resend]", err);
    if (!res.headersSent) apiError(res, 500, "internal_server_error", "The fake failed unexpectedly.");
    else res.end();
  });
});

server.listen(port, "127.0.0.1", () => {
  console.log(`[fake resend] listening on http://127.0.0.1:${port} (inbox: /inbox, state in ${dataDir})`);
});

for (const sig of ["SIGTERM", "SIGINT"] as const) process.on(sig, () => server.close(() => process.exit(0)));
