// The built app, served by next start: landing page, 404 page, health and security headers.
import { afterAll, describe, expect, it } from "vitest";
import { closeTestDb } from "../setup/test-db";
import { appUrl } from "./app-url";
import { createTestUser } from "./fixtures";
import { signIn } from "./session";

afterAll(closeTestDb);

describe("app shell over HTTP", () => {
  it("serves the landing page with security headers", async () => {
    const res = await fetch(appUrl("/"));
    expect(res.status).toBe(200);
    const html = await res.text();
    expect(html).toMatch(/Every commission, from the first spec/);
    expect(res.headers.get("content-security-policy")).toMatch(/frame-ancestors 'none'/);
    expect(res.headers.get("x-content-type-options")).toBe("nosniff");
    expect(res.headers.get("referrer-policy")).toBe("strict-origin-when-cross-origin");
  });

  it("serves its own fonts from the app, not from the network", async () => {
    const html = await (await fetch(appUrl("/"))).text();
    const fonts = [...html.matchAll(/href="([^"]+\.woff2)"/g)].map((m) => m[1]!);
    expect(fonts.length).toBeGreaterThan(0);
    for (const f of fonts) {
      expect(f.startsWith("/_next/")).toBe(true);
      expect((await fetch(appUrl(f))).status).toBe(200);
    }
  });

  it("answers an unknown page with the 404 page (signed in: signed out, any app path leads to sign-in)", async () => {
    const session = await signIn(await createTestUser());
    const res = await session.fetch("/no-such-page");
    expect(res.status).toBe(404);
    expect(await res.text()).toMatch(/Nothing here/);
  });

  it("reports the database in /api/health", async () => {
    const res = await fetch(appUrl("/api/health"));
    expect(res.status).toBe(200);
    expect(await res.json()).toEqual({ ok: true, database: "up" });
  });
});
