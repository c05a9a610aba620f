// The part of the Auth.js configuration without providers or database: session strategy, pages,
// cookies, and the callbacks that put the user id into the token. lib/auth/auth.ts adds the rest.
import type { NextAuthConfig } from "next-auth";

declare module "next-auth" {
  interface Session {
    /** When this session was created by a sign-in (ms since epoch): sessions older than a password change are refused. */
    authTime?: number;
  }
}

declare module "@auth/core/jwt" {
  interface JWT {
    authTime?: number;
  }
}

export const SESSION_MAX_AGE_S = 30 * 24 * 60 * 60;

/**
 * Secure (and __Secure-/__Host- prefixed) cookies whenever the public address is https. Decided
 * from APP_URL rather than per request, so the app behind a TLS-terminating proxy, the sign-in
 * gate in proxy.ts and Auth.js all agree on the cookie's name. Cookies are always httpOnly and
 * SameSite=Lax (Auth.js's defaults, kept).
 */
export function usesSecureCookies(appUrl = process.env.APP_URL ?? ""): boolean {
  return appUrl.startsWith("https://");
}

export const authBaseConfig = {
  // JWT sessions: the credentials provider requires them. The token carries only the user id and
  // sign-in time; membership and role are read from the database on every request.
  session: { strategy: "jwt", maxAge: SESSION_MAX_AGE_S },
  trustHost: process.env.AUTH_TRUST_HOST !== "false",
  useSecureCookies: usesSecureCookies(),
  pages: { signIn: "/sign-in", error: "/sign-in", verifyRequest: "/check-email" },
  providers: [],
  callbacks: {
    jwt({ token, user }) {
      if (user?.id) {
        token.sub = String(user.id);
        token.authTime = Date.now();
      }
      return token;
    },
    session({ session, token }) {
      if (token.sub) session.user.id = token.sub;
      session.authTime = token.authTime;
      return session;
    },
  },
  logger: {
    // A refused sign-in is an expected outcome, not a server error worth a stack trace.
    error(error) {
      const name = (error as { type?: string }).type ?? error.name;
      if (["CredentialsSignin", "Verification", "AccessDenied"].includes(name)) return;
      const cause = (error as { cause?: { err?: unknown } }).cause;
      console.error(`[auth] ${name}: ${error.message}`, cause?.err ?? cause ?? "");
    },
    warn(code) {
      if (code !== "debug-enabled") console.warn(`[auth] warning ${code}`);
    },
  },
} satisfies NextAuthConfig;
