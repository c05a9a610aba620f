// GET /api/workshops/[workshop]/commission-stages over HTTP: the stage line for every member who
// sees commissions, in the workshop's own order; another workshop answers 404; signed out 401.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEFAULT_BUILD_STAGES } from "@/lib/workflow/stages";
import { closeTestDb, testDb } from "../setup/test-db";
import { createWorkshopWithMembers, type TestWorkshop } from "./fixtures";
import { anonymous, signIn } from "./session";

let a: TestWorkshop;
let b: TestWorkshop;
const path = (ws: TestWorkshop) => `/api/workshops/${ws.slug}/commission-stages`;

beforeAll(async () => {
  [a, b] = await Promise.all([createWorkshopWithMembers(), createWorkshopWithMembers()]);
});
afterAll(closeTestDb);

describe("commission stages", () => {
  it("gives every role the line: spec, deposit, the build stages, final setup, delivered; and the side states", async () => {
    for (const person of [a.owner, a.builder, a.bookkeeper, a.client]) {
      const r = await (await signIn(person)).json<{ stages: Array<{ key: string; label: string }>; sideStages: Array<{ key: string }> }>(path(a));
      expect(r.status, person.role).toBe(200);
      expect(r.body.stages.map((s) => s.key)).toEqual(["spec", "deposit", ...DEFAULT_BUILD_STAGES.map((s) => s.key), "final_setup", "delivered"]);
      expect(r.body.stages[2]).toEqual(DEFAULT_BUILD_STAGES[0]);
      expect(r.body.sideStages.map((s) => s.key)).toEqual(["on_hold", "cancelled"]);
    }
  });

  it("follows the workshop's own template", async () => {
    const ws = await createWorkshopWithMembers();
    await testDb()("workshops").where({ id: ws.id }).update({ build_stages: JSON.stringify([{ key: "carving", label: "Carving" }]) });
    const r = await (await signIn(ws.client)).json<{ stages: Array<{ key: string; label: string }> }>(path(ws));
    expect(r.body.stages).toEqual([
      { key: "spec", label: "Spec" },
      { key: "deposit", label: "Deposit" },
      { key: "carving", label: "Carving" },
      { key: "final_setup", label: "Final setup" },
      { key: "delivered", label: "Delivered" },
    ]);
  });

  it("answers another workshop's member 404 and a signed-out caller 401", async () => {
    const outsider = await signIn(b.owner);
    const r = await outsider.fetch(path(a));
    expect(r.status).toBe(404);
    expect(await r.json()).toEqual({ error: { code: "not_found", message: "No such workshop." } });
    expect((await anonymous().fetch(path(a))).status).toBe(401);
  });
});
