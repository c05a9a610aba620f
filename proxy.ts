// Next 16's request interceptor (Node.js runtime): security headers on every page and API answer,
// and the sign-in gate: a signed-out visitor opening an app page is sent to sign-in with a way back.
// The gate only reads the session cookie (no database, no cookie refresh); pages and handlers
// still check the session and membership themselves (lib/auth/workshop-access.ts).
import { NextResponse, type NextRequest } from "next/server";
import { getToken } from "next-auth/jwt";
import { usesSecureCookies } from "@/lib/auth/config";
import { isPublicPath } from "@/lib/auth/public-paths";
import { csrfRefusal } from "@/lib/http/csrf";
import { securityHeaders } from "@/lib/http/security-headers";

const headers = securityHeaders({
  uploadOrigin: process.env.FAKE_UPLOADTHING_PORT ? `http://127.0.0.1:${process.env.FAKE_UPLOADTHING_PORT}` : undefined,
  dev: process.env.NODE_ENV === "development",
});

async function signedIn(req: NextRequest): Promise<boolean> {
  try {
    const token = await getToken({ req, secret: process.env.AUTH_SECRET, secureCookie: usesSecureCookies() });
    return !!token?.sub;
  } catch {
    return false;
  }
}

const appOrigin = (() => {
  try {
    return new URL(process.env.APP_URL ?? "").origin;
  } catch {
    return null;
  }
})();

export async function proxy(req: NextRequest) {
  const { pathname, search } = req.nextUrl;
  let res: NextResponse;
  const refusal = csrfRefusal({
    method: req.method,
    pathname,
    origin: req.headers.get("origin"),
    secFetchSite: req.headers.get("sec-fetch-site"),
    allowedOrigins: [req.nextUrl.origin, ...(appOrigin ? [appOrigin] : [])],
  });
  if (refusal) {
    res = NextResponse.json({ error: { code: "forbidden", message: refusal } }, { status: 403 });
    for (const [k, v] of Object.entries(headers)) res.headers.set(k, v);
    return res;
  }
  // Only page loads are gated; server actions (POST) and the API answer for themselves.
  const isPageLoad = req.method === "GET" || req.method === "HEAD";
  if (isPageLoad && !isPublicPath(pathname) && !(await signedIn(req))) {
    const to = req.nextUrl.clone();
    to.pathname = "/sign-in";
    to.search = new URLSearchParams({ callbackUrl: `${pathname}${search}` }).toString();
    res = NextResponse.redirect(to);
  } else {
    res = NextResponse.next();
  }
  for (const [k, v] of Object.entries(headers)) res.headers.set(k, v);
  return res;
}

export const config = {
  matcher: ["/((?!_next/static|_next/image|favicon.ico).*)"],
};
