// The per-IP limit on POST /api/compute: 429 with Retry-After and a clear JSON error, per address.
import { describe, expect, it } from "vitest";
import { presetById } from "@/lib/lutherie/presets";
import { postCompute, testIp } from "./compute-client";

describe("POST /api/compute rate limit", () => {
  it("answers 429 with Retry-After once an address is over its limit, and only for that address", async () => {
    const ip = `192.0.2.${1 + Math.floor(Math.random() * 254)}`; // TEST-NET-1, RFC 5737: nobody else's bucket
    const spec = presetById("six").spec;
    const first = await postCompute(spec, ip);
    expect(first.status).toBe(200);
    const limit = Number(first.headers.get("ratelimit-limit"));
    expect(limit).toBeGreaterThan(0);
    expect(limit).toBeLessThan(1000); // the test app runs with the documented default, not the bench's
    expect(Number(first.headers.get("ratelimit-remaining"))).toBe(limit - 1);

    let last = first;
    for (let i = 1; i <= limit; i++) last = await postCompute(spec, ip);
    expect(last.status).toBe(429);
    const retry = Number(last.headers.get("retry-after"));
    expect(retry).toBeGreaterThanOrEqual(1);
    const body = (await last.json()) as { error: { code: string; message: string; retryAfterSeconds: number } };
    expect(body.error.code).toBe("rate_limited");
    expect(body.error.retryAfterSeconds).toBe(retry);
    expect(body.error.message).toMatch(/Too many requests/);
    expect(last.headers.get("ratelimit-remaining")).toBe("0");

    const other = await postCompute(spec, testIp());
    expect(other.status).toBe(200);
  });
});
