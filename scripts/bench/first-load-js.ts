// First-load JavaScript of a page: every script the server's HTML makes the browser fetch on a
// first visit (the <script src> tags except noModule polyfills, and <link rel="modulepreload"/"preload" as="script">),
// counted once each, gzipped at level 9 as a CDN would serve them. Used by `npm run bench` (the
// table) and by the budget test (tests/http/first-load-js.test.ts).
import { gzipSync } from "node:zlib";

export const FIRST_LOAD_BUDGET_KB = 180;

export interface PageWeight {
  path: string;
  status: number;
  scripts: number;
  rawKb: number;
  gzipKb: number;
}

const SCRIPT_TAG = /<script[^>]*\ssrc="([^"]+)"[^>]*>/g;
const PRELOAD = /<link[^>]*rel="(?:modulepreload|preload)"[^>]*>/g;
const HREF = /\shref="([^"]+)"/;

/** Script URLs a page's HTML loads, resolved against the page. */
export function scriptUrls(html: string, pageUrl: string): string[] {
  const found = new Set<string>();
  for (const m of html.matchAll(SCRIPT_TAG)) {
    // noModule scripts are the legacy polyfills: browsers that run modules never fetch them.
    if (/\snomodule/i.test(m[0])) continue;
    found.add(new URL(m[1]!.replace(/&amp;/g, "&"), pageUrl).href);
  }
  for (const m of html.matchAll(PRELOAD)) {
    if (!/as="script"/.test(m[0]) && !/modulepreload/.test(m[0])) continue;
    const href = HREF.exec(m[0])?.[1];
    if (href) found.add(new URL(href.replace(/&amp;/g, "&"), pageUrl).href);
  }
  return [...found];
}

/**
 * Weighs one page as a browser with `cookie` would first load it. Redirects are not followed, so
 * a page that sends the visitor elsewhere (to sign in, say) shows as its 3xx status.
 */
export async function weighPage(base: string, path: string, cookie = "", cache = new Map<string, Buffer>()): Promise<PageWeight> {
  const pageUrl = `${base}${path}`;
  const res = await fetch(pageUrl, { headers: cookie ? { cookie } : {}, redirect: "manual" });
  const html = await res.text();
  let raw = 0;
  let gz = 0;
  const urls = scriptUrls(html, pageUrl);
  for (const u of urls) {
    let body = cache.get(u);
    if (!body) {
      body = Buffer.from(await (await fetch(u)).arrayBuffer());
      cache.set(u, body);
    }
    raw += body.length;
    gz += gzipSync(body, { level: 9 }).length;
  }
  return { path, status: res.status, scripts: urls.length, rawKb: raw / 1024, gzipKb: gz / 1024 };
}
