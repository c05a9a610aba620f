// HTTP over node:http, answering a web Response, so a test can choose the source address
// (127.0.0.x) the app sees: that is how the per-IP sign-in limit is tested without trusting headers.
// IPv4 always: the app listens on 127.0.0.1 while `localhost` may resolve to ::1 first.
import { request } from "node:http";

export interface RequestOptions {
  method?: string;
  headers?: Record<string, string>;
  body?: string;
  /** Source address of the connection, e.g. "127.0.0.7" (any 127/8 address works on Linux). */
  localAddress?: string;
}

export function httpRequest(url: string, opts: RequestOptions = {}): Promise<Response> {
  return new Promise((resolve, reject) => {
    const req = request(url, { method: opts.method ?? "GET", headers: opts.headers, localAddress: opts.localAddress, family: 4 }, (res) => {
      const chunks: Buffer[] = [];
      res.on("data", (c: Buffer) => chunks.push(c));
      res.on("end", () => {
        const headers = new Headers();
        for (const [k, v] of Object.entries(res.headers)) {
          if (v === undefined) continue;
          for (const one of Array.isArray(v) ? v : [v]) headers.append(k, one);
        }
        const status = res.statusCode ?? 0;
        const body = [204, 304].includes(status) ? null : Buffer.concat(chunks);
        resolve(new Response(body, { status, headers }));
      });
      res.on("error", reject);
    });
    req.on("error", reject);
    req.setTimeout(30_000, () => req.destroy(new Error(`timeout: ${url}`)));
    if (opts.body !== undefined) req.write(opts.body);
    req.end();
  });
}
