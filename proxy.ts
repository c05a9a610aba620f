// Next 16's request interceptor (Node.js runtime): security headers on every page and API answer.
import { NextResponse, type NextRequest } from "next/server";
import { securityHeaders } from "@/lib/http/security-headers";

const headers = securityHeaders({
  uploadOrigin: process.env.FAKE_UPLOADTHING_PORT ? `http://127.0.0.1:${process.env.FAKE_UPLOADTHING_PORT}` : undefined,
  dev: process.env.NODE_ENV === "development",
});

export function proxy(_req: NextRequest) {
  const res = NextResponse.next();
  for (const [k, v] of Object.entries(headers)) res.headers.set(k, v);
  return res;
}

export const config = {
  matcher: ["/((?!_next/static|_next/image|favicon.ico).*)"],
};
