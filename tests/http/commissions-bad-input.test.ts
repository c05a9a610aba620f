// Bad input on the commission routes: a query string or body the schema refuses is a 422 naming
// the fields, a body that is not JSON a 400, an id that does not parse a 404 — never a 500, and
// nothing already stored changes. Real app over HTTP, real MariaDB.
import fc from "fast-check";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestDb, testDb } from "../setup/test-db";
import { base, draftSpec, openCommission, sixStringSpec } from "./commission-helpers";
import { createWorkshopWithMembers, type TestWorkshop } from "./fixtures";
import { signIn, type HttpSession } from "./session";

let ws: TestWorkshop;
let owner: HttpSession, builder: HttpSession, client: HttpSession;
let id = 0;
let versionId = 0;

beforeAll(async () => {
  ws = await createWorkshopWithMembers();
  [owner, builder, client] = await Promise.all([signIn(ws.owner), signIn(ws.builder), signIn(ws.client)]);
  id = (await openCommission(owner, ws)).id;
  versionId = (await draftSpec(builder, ws, id)).id;
});
afterAll(closeTestDb);

type Issues = { error: { code: string; message: string; issues?: Array<{ path: string; message: string }> } };
const paths = (b: Issues) => (b.error.issues ?? []).map((i) => i.path);

/** Everything a bad request could have touched, to show it stayed as it was. */
async function stored() {
  const count = async (table: string) => Number((await testDb()(table).where({ workshop_id: ws.id }).count({ n: "*" }).first())?.n);
  return {
    row: await testDb()("commissions").where({ id }).first("title", "price_minor", "deposit_minor", "target_date", "builder_user_id", "stage"),
    commissions: await count("commissions"),
    versions: await count("spec_versions"),
    comments: await count("commission_comments"),
    payments: await count("payments"),
    history: await count("stage_history"),
  };
}

describe("bad query strings on the list", () => {
  const cases: Array<[string, string[]]> = [
    ["sort=price", ["sort"]],
    ["page=0", ["page"]],
    ["page=two", ["page"]],
    ["pageSize=500", ["pageSize"]],
    ["pageSize=2.5", ["pageSize"]],
    ["builder=someone", ["builder"]],
    ["client=-4", ["client"]],
    ["overdue=maybe", ["overdue"]],
    ["stage=Final%20setup", ["stage"]],
    [`q=${"x".repeat(81)}`, ["q"]],
    ["sort=nope&page=0&overdue=2", ["overdue", "sort", "page"]],
  ];
  for (const [query, want] of cases) {
    it(`answers ?${query.slice(0, 40)} with 422 and the paths ${want.join(", ")}`, async () => {
      const r = await owner.json<Issues>(`${base(ws)}?${query}`);
      expect(r.status).toBe(422);
      expect(r.body.error.code).toBe("validation_failed");
      expect(paths(r.body).sort()).toEqual([...want].sort());
      for (const i of r.body.error.issues!) expect(i.message.length).toBeGreaterThan(3);
    });
  }

  it("takes search text literally, wildcards included", async () => {
    for (const q of ["%", "_", "\\", "' OR 1=1 --"]) {
      const r = await owner.json<{ total: number }>(`${base(ws)}?q=${encodeURIComponent(q)}`);
      expect(r).toEqual({ status: 200, body: expect.objectContaining({ total: 0 }) });
    }
  });

  it("never answers any query string with a 500 (property, 60 runs)", async () => {
    const key = fc.constantFrom("stage", "builder", "client", "overdue", "q", "sort", "page", "pageSize", "cohort", "other");
    const value = fc.oneof(fc.string({ maxLength: 50 }), fc.integer().map(String), fc.constantFrom("none", "-updated", "stage", "true", "1e9", "", "NaN"));
    await fc.assert(
      fc.asyncProperty(fc.array(fc.tuple(key, value), { maxLength: 5 }), async (pairs) => {
        const qs = new URLSearchParams(pairs).toString();
        const res = await owner.fetch(`${base(ws)}?${qs}`);
        expect([200, 422], qs).toContain(res.status);
        const body = (await res.json()) as Record<string, unknown>;
        if (res.status === 200) expect(Object.keys(body).sort()).toEqual(["items", "page", "pageSize", "total"]);
      }),
      { numRuns: 60 },
    );
  });
});

describe("bad bodies", () => {
  const at = (rest = "") => `${base(ws)}/${id}${rest}`;
  // Bodies are functions: the people and ids exist only once beforeAll has run.
  const cases: Array<{ name: string; who: () => HttpSession; method: string; path: () => string; json: () => unknown; want: string[] }> = [
    { name: "open without a title", who: () => owner, method: "POST", path: () => base(ws), json: () => ({}), want: ["title"] },
    { name: "open with a short title and a negative price", who: () => owner, method: "POST", path: () => base(ws), json: () => ({ title: "ab", priceMinor: -5 }), want: ["title", "priceMinor"] },
    { name: "open with a price in text and a date the wrong way round", who: () => owner, method: "POST", path: () => base(ws), json: () => ({ title: "Valid title", priceMinor: "100", targetDate: "31/12/2027" }), want: ["priceMinor", "targetDate"] },
    { name: "open for someone who is not a client here", who: () => owner, method: "POST", path: () => base(ws), json: () => ({ title: "For the builder", clientId: ws.builder.userId }), want: ["clientId"] },
    { name: "open with a client as the builder", who: () => owner, method: "POST", path: () => base(ws), json: () => ({ title: "Odd builder", clientId: ws.client.userId, builderId: ws.client.userId }), want: ["builderId"] },
    { name: "change nothing", who: () => owner, method: "PATCH", path: () => at(), json: () => ({}), want: [""] },
    { name: "change the date to words", who: () => owner, method: "PATCH", path: () => at(), json: () => ({ targetDate: "next spring" }), want: ["targetDate"] },
    { name: "a deposit above the price", who: () => owner, method: "PATCH", path: () => at(), json: () => ({ depositMinor: 300_001 }), want: ["depositMinor"] },
    {
      name: "a spec with a gauge in words",
      who: () => builder,
      method: "POST",
      path: () => at("/spec-versions"),
      json: () => ({ spec: { ...sixStringSpec(), strings: [{ note: "E4", gaugeIn: "thin", construction: "plain-steel" }] } }),
      want: ["spec.strings.0.gaugeIn"],
    },
    { name: "no spec at all", who: () => builder, method: "POST", path: () => at("/spec-versions"), json: () => ({ options: {} }), want: ["spec"] },
    { name: "an unknown bridge", who: () => builder, method: "POST", path: () => at("/spec-versions"), json: () => ({ spec: sixStringSpec(), options: { bridge: "wobbly" } }), want: ["options.bridge"] },
    { name: "a note that is not text", who: () => builder, method: "POST", path: () => at(`/spec-versions/${versionId}/submit`), json: () => ({ note: 5 }), want: ["note"] },
    { name: "an empty comment", who: () => client, method: "POST", path: () => at("/comments"), json: () => ({ body: "  " }), want: ["body"] },
    { name: "a comment too long", who: () => client, method: "POST", path: () => at("/comments"), json: () => ({ body: "x".repeat(4001) }), want: ["body"] },
    { name: "a payment of an unknown kind", who: () => owner, method: "POST", path: () => at("/payments"), json: () => ({ kind: "tip", amountMinor: 100, reference: "cash" }), want: ["kind"] },
    { name: "a payment of nothing with no reference", who: () => owner, method: "POST", path: () => at("/payments"), json: () => ({ kind: "deposit", amountMinor: 0, reference: "" }), want: ["amountMinor", "reference"] },
    { name: "a payment dated in words", who: () => owner, method: "POST", path: () => at("/payments"), json: () => ({ kind: "deposit", amountMinor: 100, reference: "cash", paidOn: "yesterday" }), want: ["paidOn"] },
    { name: "a payment above what is owed", who: () => owner, method: "POST", path: () => at("/payments"), json: () => ({ kind: "balance", amountMinor: 300_001, reference: "Too much" }), want: ["amountMinor"] },
    { name: "a move note too long", who: () => owner, method: "POST", path: () => at("/transitions"), json: () => ({ action: "hold", note: "x".repeat(1001) }), want: ["note"] },
  ];

  for (const c of cases) {
    it(`refuses ${c.name} with 422 and its field paths, changing nothing`, async () => {
      const before = await stored();
      const r = await c.who().json<Issues>(c.path(), { method: c.method, json: c.json() });
      expect(r.status, JSON.stringify(r.body)).toBe(422);
      expect(r.body.error.code).toBe("validation_failed");
      expect(paths(r.body).sort()).toEqual([...c.want].sort());
      expect(await stored()).toEqual(before);
    });
  }

  it("answers a body that is not JSON, or none, with 400", async () => {
    const before = await stored();
    for (const path of [base(ws), `${base(ws)}/${id}/comments`, `${base(ws)}/${id}/transitions`, `${base(ws)}/${id}/spec-versions`, `${base(ws)}/${id}/payments`]) {
      const broken = await owner.fetch(path, { method: "POST", body: "{title:", headers: { "content-type": "application/json" } });
      expect(broken.status, path).toBe(400);
      expect(await broken.json()).toEqual({ error: { code: "bad_request", message: "The request body is not valid JSON.", issues: [{ path: "", message: "Invalid JSON" }] } });
      const empty = await owner.fetch(path, { method: "POST" });
      expect(empty.status, path).toBe(400);
    }
    expect(await stored()).toEqual(before);
  });

  it("treats an id that does not parse as not found", async () => {
    for (const path of [`${base(ws)}/abc`, `${base(ws)}/0`, `${base(ws)}/-1`, `${base(ws)}/1.5`, `${base(ws)}/${id}/spec-versions/xyz`, `${base(ws)}/${id}/transitions/nope/signoff`, `${base(ws)}/99999999999`]) {
      const res = await owner.fetch(path, { method: path.endsWith("signoff") ? "POST" : "GET" });
      expect(res.status, path).toBe(404);
    }
  });

  it("never answers any JSON body to the open route with a 500 (property, 40 runs)", async () => {
    await fc.assert(
      fc.asyncProperty(fc.oneof(fc.jsonValue(), fc.record({ title: fc.string(), priceMinor: fc.jsonValue(), clientId: fc.jsonValue(), targetDate: fc.string() }, { requiredKeys: [] })), async (body) => {
        const res = await owner.fetch(base(ws), { method: "POST", json: body });
        expect([201, 400, 422], JSON.stringify(body)).toContain(res.status);
      }),
      { numRuns: 40 },
    );
  });
});
