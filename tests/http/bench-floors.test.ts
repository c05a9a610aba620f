// The benchmark floors (app/api/bench/**) are shut in normal operation: the app `npm test` serves
// runs without BENCH_FLOOR_TOKEN, so every floor answers 404 like an unknown path, to anyone, with
// or without a guessed token, and runs nothing. Every floor folder is listed from the code, so a new
// floor is covered without an entry here.
import { readdirSync } from "node:fs";
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { createWorkshopWithMembers, type TestWorkshop } from "./fixtures";
import { anonymous, signIn, type HttpSession } from "./session";

const FLOORS = readdirSync(join(process.cwd(), "app", "api", "bench"), { withFileTypes: true })
  .filter((d) => d.isDirectory())
  .map((d) => d.name);

let ws: TestWorkshop;
let owner: HttpSession;

beforeAll(async () => {
  ws = await createWorkshopWithMembers();
  owner = await signIn(ws.owner);
});

describe("benchmark floors", () => {
  it("are found in the code", () => {
    expect(FLOORS).toEqual(expect.arrayContaining(["commission-list", "commission-summary", "overview", "stripe-signature"]));
  });

  for (const floor of FLOORS) {
    it(`${floor}: 404 with no token, a guessed one or an empty one, signed in or not`, async () => {
      const path = `/api/bench/${floor}?workshopId=${ws.id}&id=1`;
      const tokens: Array<Record<string, string>> = [{}, { "x-bench-token": "0".repeat(48) }, { "x-bench-token": "" }];
      for (const who of [anonymous(), owner]) {
        for (const headers of tokens) {
          for (const method of ["GET", "POST"] as const) {
            const res = await who.fetch(path, { method, headers: { ...headers, "content-type": "application/json" }, body: method === "POST" ? "{}" : undefined });
            // A method the floor does not export is Next's own 405; every other answer is our 404.
            if (res.status === 405) continue;
            expect(res.status, `${method} ${path}`).toBe(404);
            expect(((await res.json()) as { error: { code: string } }).error.code).toBe("not_found");
          }
        }
      }
    });
  }
});
