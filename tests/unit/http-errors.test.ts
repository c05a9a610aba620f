// The one error mapper: status codes, field paths, no internals leaked.
import { describe, expect, it } from "vitest";
import { z } from "zod";
import { AppError, toErrorBody } from "@/lib/http/errors";

describe("toErrorBody", () => {
  it("maps a ZodError to 422 with dotted field paths", () => {
    const r = z.object({ strings: z.array(z.object({ gaugeIn: z.number() })) }).safeParse({ strings: [{ gaugeIn: "x" }] });
    const { status, body } = toErrorBody(r.error);
    expect(status).toBe(422);
    expect(body.error.issues?.[0]?.path).toBe("strings.0.gaugeIn");
  });

  it("keeps an AppError's code and message", () => {
    expect(toErrorBody(new AppError("conflict", "Approve the spec first."))).toEqual({
      status: 409,
      body: { error: { code: "conflict", message: "Approve the spec first." } },
    });
  });

  it("maps a lost database connection to 503 and anything else to a generic 500", () => {
    expect(toErrorBody(Object.assign(new Error("connect ECONNREFUSED"), { code: "ECONNREFUSED" })).status).toBe(503);
    const generic = toErrorBody(new Error("SELECT * FROM secret_table"));
    expect(generic.status).toBe(500);
    expect(JSON.stringify(generic.body)).not.toMatch(/secret_table/);
  });
});
