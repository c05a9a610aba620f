// The CSRF guard's decisions. Source for the header semantics: the Fetch Metadata Request Headers
// specification (W3C, Sec-Fetch-Site values "same-origin", "same-site", "cross-site", "none") and
// RFC 6454 §7 (the Origin header; the serialised value "null" for opaque origins).
import { describe, expect, it } from "vitest";
import { csrfRefusal } from "@/lib/http/csrf";

const base = { pathname: "/api/workshops/a/commissions", allowedOrigins: ["http://localhost:3000"] };

describe("csrfRefusal", () => {
  it("lets reads through whatever their origin", () => {
    expect(csrfRefusal({ ...base, method: "GET", origin: "https://evil.example.com", secFetchSite: "cross-site" })).toBeNull();
  });

  it("refuses a state-changing request a browser marks as cross-site", () => {
    expect(csrfRefusal({ ...base, method: "POST", origin: null, secFetchSite: "cross-site" })).toMatch(/another site/);
    expect(csrfRefusal({ ...base, method: "DELETE", origin: "https://evil.example.com", secFetchSite: null })).toMatch(/another site/);
    expect(csrfRefusal({ ...base, method: "PATCH", origin: "null", secFetchSite: null })).toMatch(/without an origin/);
  });

  it("accepts the app's own origin and requests with no browser headers (servers, scripts)", () => {
    expect(csrfRefusal({ ...base, method: "POST", origin: "http://localhost:3000", secFetchSite: "same-origin" })).toBeNull();
    expect(csrfRefusal({ ...base, method: "POST", origin: null, secFetchSite: null })).toBeNull();
  });

  it("leaves server-to-server callbacks and pages (server actions) to their own checks", () => {
    expect(csrfRefusal({ ...base, pathname: "/api/webhooks/stripe", method: "POST", origin: "https://evil.example.com", secFetchSite: "cross-site" })).toBeNull();
    expect(csrfRefusal({ ...base, pathname: "/acme/members", method: "POST", origin: "https://evil.example.com", secFetchSite: "cross-site" })).toBeNull();
  });
});
