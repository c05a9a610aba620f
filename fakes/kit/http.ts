// Small HTTP helpers shared by the fakes: a path router, body reading and JSON/HTML answers.
import type { IncomingMessage, ServerResponse } from "node:http";

export type Params = Record<string, string>;
export type Handler = (req: IncomingMessage, res: ServerResponse, params: Params, url: URL) => Promise<void> | void;

interface Route<H> {
  method: string;
  parts: string[];
  handler: H;
}

/** A router on "/v1/things/:id" patterns, for any kind of handler. */
export class Router<H = Handler> {
  private routes: Route<H>[] = [];

  on(method: string, pattern: string, handler: H): this {
    this.routes.push({ method, parts: pattern.split("/").filter(Boolean), handler });
    return this;
  }

  match(method: string, pathname: string): { handler: H; params: Params } | null {
    const segments = pathname.split("/").filter(Boolean);
    for (const r of this.routes) {
      if (r.method !== method || r.parts.length !== segments.length) continue;
      const params: Params = {};
      const ok = r.parts.every((p, i) => {
        const seg = safeDecode(segments[i]!);
        if (p.startsWith(":")) params[p.slice(1)] = seg;
        return p.startsWith(":") || p === seg;
      });
      if (ok) return { handler: r.handler, params };
    }
    return null;
  }
}

/** Runs the matching HTTP handler; false when nothing matched. */
export async function dispatch(router: Router<Handler>, req: IncomingMessage, res: ServerResponse, url: URL): Promise<boolean> {
  const m = router.match(req.method ?? "GET", url.pathname);
  if (!m) return false;
  await m.handler(req, res, m.params, url);
  return true;
}

function safeDecode(s: string): string {
  try {
    return decodeURIComponent(s);
  } catch {
    return s;
  }
}

/** Reads the whole request body, refusing more than `limit` bytes. */
export async function readBody(req: IncomingMessage, limit = 64 * 1024 * 1024): Promise<Buffer> {
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const chunk of req) {
    size += (chunk as Buffer).length;
    if (size > limit) throw new Error("request body too large");
    chunks.push(chunk as Buffer);
  }
  return Buffer.concat(chunks);
}

export function sendJson(res: ServerResponse, status: number, body: unknown, headers: Record<string, string> = {}): void {
  const text = JSON.stringify(body, null, 2);
  res.writeHead(status, { "Content-Type": "application/json; charset=utf-8", "Cache-Control": "no-store", ...headers });
  res.end(text);
}

export function sendHtml(res: ServerResponse, status: number, html: string): void {
  res.writeHead(status, { "Content-Type": "text/html; charset=utf-8", "Cache-Control": "no-store" });
  res.end(html);
}

export function redirect(res: ServerResponse, location: string): void {
  res.writeHead(303, { Location: location, "Cache-Control": "no-store" });
  res.end();
}

/** Parses a JSON body, or answers 400 and returns undefined. */
export async function readJsonBody(req: IncomingMessage, res: ServerResponse): Promise<unknown> {
  const raw = (await readBody(req)).toString("utf8");
  if (raw.trim() === "") return {};
  try {
    return JSON.parse(raw);
  } catch {
    sendJson(res, 400, { error: { message: "The body is not valid JSON." } });
    return undefined;
  }
}

/** Escapes text for HTML element content and attribute values. */
export function esc(value: unknown): string {
  return String(value ?? "")
    .replace(/&/g, "&amp;")
    .replace(/</g, "&lt;")
    .replace(/>/g, "&gt;")
    .replace(/"/g, "&quot;")
    .replace(/'/g, "&#39;");
}
