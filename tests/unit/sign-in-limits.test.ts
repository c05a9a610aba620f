// The sliding-window arithmetic of the sign-in limit (pure), and who the client is.
import { describe, expect, it } from "vitest";
import { clientIp } from "@/lib/http/client-ip";
import { parseSignInCode } from "@/lib/auth/errors";
import { describeRetry, retryAfterSeconds, signInLimitsFromEnv } from "@/lib/auth/rate-limit";

const W = 15 * 60_000;
const now = new Date("2027-03-01T12:00:00Z");
const ago = (min: number) => new Date(now.getTime() - min * 60_000);

describe("sign-in limit", () => {
  it("allows fewer failures than the limit", () => {
    expect(retryAfterSeconds([ago(1), ago(2), ago(3), ago(4)], 5, W, now)).toBeNull();
  });

  it("refuses at the limit until the oldest counted failure leaves the window", () => {
    // Five failures 1..10 minutes ago: the one 10 minutes ago leaves the window in 5 minutes.
    expect(retryAfterSeconds([ago(1), ago(2), ago(3), ago(4), ago(10)], 5, W, now)).toBe(300);
  });

  it("allows again once the window has passed", () => {
    expect(retryAfterSeconds([ago(1), ago(2), ago(3), ago(4), ago(15)], 5, W, now)).toBeNull();
  });

  it("defaults to 5 per account and 20 per IP in 15 minutes", () => {
    expect(signInLimitsFromEnv({})).toEqual({ windowMs: W, perAccount: 5, perIp: 20 });
  });

  it("says when to try again", () => {
    expect(describeRetry(300, now)).toBe("Try again in 5 minutes (at 12:05 UTC).");
    expect(describeRetry(30, now)).toBe("Try again in 1 minute (at 12:00 UTC).");
  });

  it("reads the refusal code Auth.js passes along", () => {
    expect(parseSignInCode("rate_limited:840")).toEqual({ kind: "rate_limited", retryAfterSeconds: 840 });
    expect(parseSignInCode("invalid_credentials")).toEqual({ kind: "invalid_credentials" });
    expect(parseSignInCode(null)).toEqual({ kind: "other" });
  });
});

describe("client address", () => {
  it("takes the right-most forwarded address (the one the nearest proxy saw)", () => {
    expect(clientIp(new Headers({ "x-forwarded-for": "203.0.113.9, 198.51.100.4" }))).toBe("198.51.100.4");
    expect(clientIp(new Headers({ "x-forwarded-for": "::ffff:127.0.0.7" }))).toBe("127.0.0.7");
    expect(clientIp(new Headers())).toBe("unknown");
  });
});
