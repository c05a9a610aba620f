// Signing in over HTTP through the real Auth.js credentials flow (GET /api/auth/csrf, then
// POST /api/auth/callback/credentials), returning a fetch that carries the session cookie.
//
//   const owner = await signIn(ws.owner);                 // or signIn({ email, password })
//   const res = await owner.fetch(`/api/workshops/${ws.slug}/members`);
//   const body = await owner.json("/api/me");
import { appUrl } from "./app-url";
import { httpRequest, type RequestOptions } from "./client";

export interface HttpSession {
  /** Sends a request to the app (a path, or a full URL) with this session's cookies; never follows redirects. */
  fetch(path: string, init?: RequestOptions & { json?: unknown; form?: Record<string, string> }): Promise<Response>;
  /** fetch, then the parsed JSON body (throws on a non-JSON answer). */
  json<T = unknown>(path: string, init?: RequestOptions & { json?: unknown }): Promise<{ status: number; body: T }>;
  cookies: Map<string, string>;
  localAddress?: string;
}

function cookieHeader(jar: Map<string, string>): string {
  return [...jar].map(([k, v]) => `${k}=${v}`).join("; ");
}

function absorb(jar: Map<string, string>, res: Response): void {
  for (const line of res.headers.getSetCookie()) {
    const [pair, ...attrs] = line.split(";");
    const eq = pair!.indexOf("=");
    const name = pair!.slice(0, eq).trim();
    const value = pair!.slice(eq + 1).trim();
    const expired = attrs.some((a) => /^\s*max-age=0\s*$/i.test(a) || (/^\s*expires=/i.test(a) && Date.parse(a.split("=")[1]!) < Date.now()));
    if (expired || value === "") jar.delete(name);
    else jar.set(name, value);
  }
}

/** A cookie jar with no session (for 401 checks); also the start of every sign-in. */
export function anonymous(opts: { localAddress?: string } = {}): HttpSession {
  const jar = new Map<string, string>();
  const session: HttpSession = {
    cookies: jar,
    localAddress: opts.localAddress,
    async fetch(path, init = {}) {
      const headers: Record<string, string> = { ...(init.headers ?? {}) };
      if (jar.size) headers.cookie = cookieHeader(jar);
      let body = init.body;
      if (init.json !== undefined) {
        headers["content-type"] = "application/json";
        body = JSON.stringify(init.json);
      } else if (init.form) {
        headers["content-type"] = "application/x-www-form-urlencoded";
        body = new URLSearchParams(init.form).toString();
      }
      const res = await httpRequest(path.startsWith("http") ? path : appUrl(path), {
        method: init.method ?? (body !== undefined ? "POST" : "GET"),
        headers,
        body,
        localAddress: init.localAddress ?? opts.localAddress,
      });
      absorb(jar, res);
      return res;
    },
    async json(path, init) {
      const res = await session.fetch(path, init);
      const text = await res.text();
      try {
        return { status: res.status, body: JSON.parse(text) };
      } catch {
        throw new Error(`${init?.method ?? "GET"} ${path} answered ${res.status} with non-JSON: ${text.slice(0, 200)}`);
      }
    },
  };
  return session;
}

export interface SignInAttempt {
  ok: boolean;
  status: number;
  location: string;
  /** Auth.js's refusal code from the redirect (invalid_credentials, rate_limited:<seconds>), if any. */
  code: string | null;
  session: HttpSession;
}

/** One credentials sign-in attempt; `ok` when a session cookie came back. */
export async function attemptSignIn(email: string, password: string, opts: { localAddress?: string; headers?: Record<string, string> } = {}): Promise<SignInAttempt> {
  const session = anonymous(opts);
  const { body } = await session.json<{ csrfToken: string }>("/api/auth/csrf", { headers: opts.headers });
  const res = await session.fetch("/api/auth/callback/credentials", {
    headers: opts.headers,
    form: { csrfToken: body.csrfToken, email, password, callbackUrl: appUrl("/workshops") },
  });
  const location = res.headers.get("location") ?? "";
  const code = location ? new URL(location, appUrl()).searchParams.get("code") : null;
  const ok = [...session.cookies.keys()].some((k) => k.endsWith("authjs.session-token"));
  return { ok, status: res.status, location, code, session };
}

/** Signs in or throws. */
export async function signIn(person: { email: string; password: string }, opts: { localAddress?: string } = {}): Promise<HttpSession> {
  const a = await attemptSignIn(person.email, person.password, opts);
  if (!a.ok) throw new Error(`sign-in as ${person.email} failed: ${a.status} ${a.location}`);
  return a.session;
}
