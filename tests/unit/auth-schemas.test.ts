// Inputs of sign-in, sign-up and workshops: what is accepted, and the field paths of what is not.
import { describe, expect, it } from "vitest";
import { usesSecureCookies } from "@/lib/auth/config";
import { onAppOrigin } from "@/lib/auth/links";
import { isPublicPath } from "@/lib/auth/public-paths";
import { callbackPathSchema, emailSchema, signUpSchema } from "@/lib/schemas/auth";
import { invitationSignUpSchema } from "@/lib/schemas/member";
import { slugFromName, slugSchema, workshopCreateSchema } from "@/lib/schemas/workshop";

describe("auth inputs", () => {
  it("normalises e-mail addresses so lookups and limits match", () => {
    expect(emailSchema.parse("  Maren.Ostby@Example.COM ")).toBe("maren.ostby@example.com");
    expect(emailSchema.safeParse("not an address").success).toBe(false);
  });

  it("reports each bad sign-up field by its path", () => {
    const r = signUpSchema.safeParse({ name: "", email: "x", password: "short" });
    expect(r.success).toBe(false);
    expect(r.error!.issues.map((i) => i.path.join("."))).toEqual(["name", "email", "password"]);
  });

  it("only returns to same-site paths after sign-in", () => {
    expect(callbackPathSchema.parse("/fernhollow/members")).toBe("/fernhollow/members");
    for (const evil of ["https://evil.example.com/", "//evil.example.com", "/\\evil.example.com", undefined]) {
      expect(callbackPathSchema.parse(evil)).toBe("/workshops");
    }
  });

  it("treats an empty invitation password as no password", () => {
    const r = invitationSignUpSchema.parse({ token: "t".repeat(43), name: "Ada", password: "" });
    expect(r.password).toBeUndefined();
    expect(invitationSignUpSchema.safeParse({ token: "t".repeat(43), name: "Ada", password: "short" }).success).toBe(false);
  });

  it("puts links on APP_URL's origin whatever host the request named", () => {
    process.env.APP_URL = "http://localhost:3000";
    expect(onAppOrigin("http://evil.example.com:8080/api/auth/callback/email-link?token=abc")).toBe("http://localhost:3000/api/auth/callback/email-link?token=abc");
  });

  it("uses Secure cookies exactly when the public address is https", () => {
    expect(usesSecureCookies("https://shop.example.com")).toBe(true);
    expect(usesSecureCookies("http://localhost:3000")).toBe(false);
  });

  it("gates app pages but not sign-in, invitations or the API", () => {
    for (const p of ["/", "/sign-in", "/sign-up", "/reset/abc", "/invitations/abc", "/api/me", "/_next/static/x.js", "/check-email"]) expect(isPublicPath(p), p).toBe(true);
    for (const p of ["/fernhollow", "/fernhollow/members", "/account", "/workshops"]) expect(isPublicPath(p), p).toBe(false);
  });
});

describe("workshop inputs", () => {
  it("proposes a slug from a name", () => {
    expect(slugFromName("Quillmere Custom Guitars")).toBe("quillmere-custom-guitars");
    expect(slugFromName("  Ørsted & Söhne — Luthiers ")).toBe("orsted-sohne-luthiers");
  });

  it("refuses slugs that would shadow the app's own pages", () => {
    for (const s of ["account", "api", "sign-in", "workshops"]) expect(slugSchema.safeParse(s).success, s).toBe(false);
    expect(slugSchema.safeParse("fern--hollow").success).toBe(false);
    expect(slugSchema.parse("Fernhollow")).toBe("fernhollow");
  });

  it("accepts ISO 4217 currencies the runtime knows (ISO 4217 list via Intl)", () => {
    expect(workshopCreateSchema.parse({ name: "Test", slug: "test-shop", unitPreference: "in", currency: "usd" }).currency).toBe("USD");
    const bad = workshopCreateSchema.safeParse({ name: "T", slug: "x", unitPreference: "ft", currency: "ZZZ" });
    expect(bad.error!.issues.map((i) => i.path.join("."))).toEqual(["name", "slug", "unitPreference", "currency"]);
  });
});
