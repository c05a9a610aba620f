// The README's example for POST /api/compute is what the API answers (numbers there are shortened to 6 digits).
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { postCompute } from "./compute-client";

const readme = readFileSync(join(__dirname, "..", "..", "README.md"), "utf8");
const example = readme.slice(readme.indexOf("Example (the response numbers"));
const [request, response] = [...example.matchAll(/```json\n([\s\S]*?)\n```/g)].slice(0, 2).map((m) => JSON.parse(m[1]!));

function same(actual: unknown, documented: unknown, path = "response"): void {
  if (typeof documented === "number") {
    expect(typeof actual, path).toBe("number");
    const a = actual as number;
    expect(Math.abs(a - documented) <= 1e-5 * Math.max(1, Math.abs(documented)), `${path}: ${a} vs ${documented}`).toBe(true);
  } else if (Array.isArray(documented)) {
    expect((actual as unknown[]).length, path).toBe(documented.length);
    documented.forEach((d, i) => same((actual as unknown[])[i], d, `${path}.${i}`));
  } else if (documented && typeof documented === "object") {
    expect(Object.keys(actual as object).sort(), path).toEqual(Object.keys(documented).sort());
    for (const [k, v] of Object.entries(documented)) same((actual as Record<string, unknown>)[k], v, `${path}.${k}`);
  } else expect(actual, path).toEqual(documented);
}

describe("README example", () => {
  it("is the answer POST /api/compute gives", async () => {
    const res = await postCompute(request);
    expect(res.status).toBe(200);
    same(await res.json(), response);
  });
});
