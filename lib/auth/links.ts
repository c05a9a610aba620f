// Links that go into e-mail are built on APP_URL, never on the request's Host header, so a forged
// Host cannot make us mail someone a link to another site.

export function appBaseUrl(env: Record<string, string | undefined> = process.env): string {
  return (env.APP_URL ?? "http://localhost:3000").replace(/\/+$/, "");
}

export function appLink(path: string): string {
  return `${appBaseUrl()}${path.startsWith("/") ? path : `/${path}`}`;
}

/** The same link with its origin replaced by APP_URL's (for links Auth.js builds from the request). */
export function onAppOrigin(url: string): string {
  const u = new URL(url);
  const base = new URL(appBaseUrl());
  u.protocol = base.protocol;
  u.host = base.host;
  return u.toString();
}
