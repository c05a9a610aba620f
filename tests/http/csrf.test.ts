// Cross-site requests with a valid session cookie are refused by the proxy before any handler
// runs, and nothing is stored; the same request from the app's own origin goes through.
import { beforeAll, describe, expect, it } from "vitest";
import { testDb } from "../setup/test-db";
import { appUrl } from "./app-url";
import { createWorkshopWithMembers, type TestWorkshop } from "./fixtures";
import { signIn, type HttpSession } from "./session";

let ws: TestWorkshop;
let owner: HttpSession;

beforeAll(async () => {
  ws = await createWorkshopWithMembers();
  owner = await signIn(ws.owner);
});

const count = async () => Number((await testDb()("commissions").where({ workshop_id: ws.id }).count({ n: "*" }).first())?.n ?? 0);
const open = (headers: Record<string, string>) =>
  owner.fetch(`/api/workshops/${ws.slug}/commissions`, { method: "POST", json: { title: "Forged request", clientId: ws.client.userId }, headers });

describe("CSRF protection on the API", () => {
  it("refuses a POST from another site (Origin or Sec-Fetch-Site) and stores nothing", async () => {
    const before = await count();
    const a = await open({ origin: "https://evil.example.com" });
    expect(a.status).toBe(403);
    expect(((await a.json()) as { error: { message: string } }).error.message).toMatch(/another site/);
    expect((await open({ "sec-fetch-site": "cross-site" })).status).toBe(403);
    expect(await count()).toBe(before);
  });

  it("accepts the same POST from the app's own origin", async () => {
    const before = await count();
    const r = await open({ origin: new URL(appUrl()).origin, "sec-fetch-site": "same-origin" });
    expect(r.status).toBe(201);
    expect(await count()).toBe(before + 1);
  });
});
