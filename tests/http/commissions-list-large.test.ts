// The commission list on a workshop of 20,000 commissions: every sort and the main filters give
// exactly the rows a plain in-memory sort of the same data gives, page after page (ties included),
// for each role's view; and EXPLAIN shows each main list query reading an index, never the whole
// table. Real app over HTTP, real MariaDB.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createBulkCommissionWorkshop, type BulkWorkshop } from "@/db/fixtures/bulk-commissions";
import { hashPassword } from "@/lib/auth/password";
import type { WorkshopScope } from "@/lib/auth/scope";
import { visibleCommissions } from "@/lib/data/commission-access";
import { commissionListQueries, stageSortLine } from "@/lib/data/commissions";
import { COMMISSION_SORTS, commissionListQuerySchema } from "@/lib/schemas/commission";
import type { CommissionPage } from "@/lib/schemas/commission-out";
import { CANCELLED, DEFAULT_BUILD_STAGES, DELIVERED } from "@/lib/workflow/stages";
import { closeTestDb, testDb } from "../setup/test-db";
import { TEST_PASSWORD, uid } from "./fixtures";
import { signIn, type HttpSession } from "./session";

const COUNT = 20_000;
let ws: BulkWorkshop;
let owner: HttpSession, builder: HttpSession, client: HttpSession;

interface Row {
  id: number;
  number: string;
  title: string;
  target_date: string | null;
  updated_at: number;
  stage: string;
  client_stage: string;
  builder_user_id: number | null;
  client_user_id: number;
}
let all: Row[];

beforeAll(async () => {
  ws = await createBulkCommissionWorkshop(testDb(), { slug: `bulk-${uid()}`, count: COUNT, passwordHash: await hashPassword(TEST_PASSWORD) });
  const as = (p: { email: string }) => signIn({ email: p.email, password: TEST_PASSWORD });
  [owner, builder, client] = await Promise.all([as(ws.owner), as(ws.builders[0]!), as(ws.clients[0]!)]);
  const rows = await testDb()("commissions")
    .where({ workshop_id: ws.id })
    .select("id", "number", "title", testDb().raw("DATE_FORMAT(target_date, '%Y-%m-%d') AS target_date"), "updated_at", "stage", "client_stage", "builder_user_id", "client_user_id");
  all = rows.map((r: Row & { updated_at: Date }) => ({ ...r, updated_at: r.updated_at.getTime() }));
}, 180_000);
afterAll(closeTestDb);

// The expected order, computed here from the rows themselves: plain comparisons in JavaScript,
// written from the API's documented sorts (ties by number for titles, else by id; dates with
// no value first, as SQL sorts NULL). Titles are ASCII words in one letter case, so code-point
// order is the collation's order.
const line = stageSortLine(DEFAULT_BUILD_STAGES);
const cmp = (a: string | number | null, b: string | number | null) => (a === b ? 0 : a === null ? -1 : b === null ? 1 : a < b ? -1 : 1);
function sorter(sort: string, stageOf: (r: Row) => string) {
  const key = sort.replace(/^-/, "");
  const asc = (a: Row, b: Row) => {
    switch (key) {
      case "number":
        return cmp(a.number, b.number);
      case "title":
        return cmp(a.title.toLowerCase(), b.title.toLowerCase()) || cmp(a.number, b.number);
      case "targetDate":
        return cmp(a.target_date, b.target_date) || a.id - b.id;
      case "updated":
        return a.updated_at - b.updated_at || a.id - b.id;
      default:
        return line.indexOf(stageOf(a)) - line.indexOf(stageOf(b)) || a.id - b.id;
    }
  };
  return sort.startsWith("-") ? (a: Row, b: Row) => asc(b, a) : asc;
}

const today = new Date().toISOString().slice(0, 10);
const isOverdue = (r: Row) => r.target_date !== null && r.target_date < today && r.stage !== DELIVERED && r.stage !== CANCELLED;

async function page(s: HttpSession, qs: string): Promise<CommissionPage> {
  const r = await s.json<CommissionPage>(`/api/workshops/${ws.slug}/commissions?${qs}`);
  expect(r.status, qs).toBe(200);
  return r.body;
}

function expectPage(got: CommissionPage, rows: Row[], pageNo: number, size: number) {
  expect(got.total).toBe(rows.length);
  expect(got.items.map((i) => i.id)).toEqual(rows.slice((pageNo - 1) * size, pageNo * size).map((r) => r.id));
}

describe("the list on 20,000 commissions", () => {
  it("holds the whole fixture", () => {
    expect(all).toHaveLength(COUNT);
    // Ties exist on purpose (repeated titles, updates on whole minutes): only the tie-breaker orders them.
    expect(new Set(all.map((r) => r.updated_at)).size).toBeLessThan(COUNT);
    expect(new Set(all.map((r) => r.title)).size).toBeLessThan(100);
  });

  it("sorts every way as the in-memory reference does, on the first, middle and last pages", async () => {
    for (const sort of COMMISSION_SORTS) {
      const expected = [...all].sort(sorter(sort, (r) => r.stage));
      for (const p of [1, 2, 173, 400, 401]) expectPage(await page(owner, `sort=${sort}&page=${p}&pageSize=50`), expected, p, 50);
    }
  }, 180_000);

  it("walks every page of the newest-first list without losing or repeating a row", async () => {
    const seen: number[] = [];
    for (let p = 1; p <= COUNT / 200; p++) seen.push(...(await page(owner, `sort=-updated&page=${p}&pageSize=200`)).items.map((i) => i.id));
    expect(seen).toEqual([...all].sort(sorter("-updated", (r) => r.stage)).map((r) => r.id));
  }, 300_000);

  it("filters by stage, builder, client, overdue and search text, each with its own total", async () => {
    const b0 = ws.builders[0]!.userId;
    const c3 = ws.clients[3]!.userId;
    const cases: Array<[string, (r: Row) => boolean]> = [
      ["stage=finish", (r) => r.stage === "finish"],
      ["stage=finish,final_setup", (r) => r.stage === "finish" || r.stage === "final_setup"],
      [`builder=${b0}`, (r) => r.builder_user_id === b0],
      ["builder=none", (r) => r.builder_user_id === null],
      [`client=${c3}`, (r) => r.client_user_id === c3],
      ["overdue=true", isOverdue],
      ["overdue=false", (r) => !isOverdue(r)],
      ["q=walnut", (r) => r.title.toLowerCase().includes("walnut")],
      ["q=2024-01", (r) => r.number.includes("2024-01")],
      [`stage=timber&builder=${b0}&overdue=true`, (r) => r.stage === "timber" && r.builder_user_id === b0 && isOverdue(r)],
    ];
    for (const [filter, keep] of cases) {
      for (const sort of ["-updated", "title", "targetDate"]) {
        const expected = all.filter(keep).sort(sorter(sort, (r) => r.stage));
        expect(expected.length, filter).toBeGreaterThan(0);
        for (const p of [1, 3]) expectPage(await page(owner, `${filter}&sort=${sort}&page=${p}&pageSize=25`), expected, p, 25);
      }
    }
  }, 240_000);

  it("gives a builder only their commissions and a client only theirs, sorted and paged the same way", async () => {
    const mine = all.filter((r) => r.builder_user_id === ws.builders[0]!.userId);
    for (const sort of ["-updated", "number", "stage"]) {
      const expected = [...mine].sort(sorter(sort, (r) => r.stage));
      for (const p of [1, 10]) expectPage(await page(builder, `sort=${sort}&page=${p}&pageSize=50`), expected, p, 50);
    }
    // A client sees the stage they have been told of, and sorts and filters by it.
    const theirs = all.filter((r) => r.client_user_id === ws.clients[0]!.userId);
    const told = (r: Row) => r.client_stage;
    for (const sort of ["-updated", "stage", "-stage"]) {
      const expected = [...theirs].sort(sorter(sort, told));
      const got = await page(client, `sort=${sort}&pageSize=200`);
      expectPage(got, expected, 1, 200);
      expect(got.items.map((i) => i.stage)).toEqual(expected.slice(0, 200).map(told));
    }
    const shaping = theirs.filter((r) => r.client_stage === "body_neck_shaping");
    expectPage(await page(client, "stage=body_neck_shaping&pageSize=200"), [...shaping].sort(sorter("-updated", told)), 1, 200);
  }, 120_000);
});

describe("stage labels in the list", () => {
  it("names each stage by the workshop's own template once the owner has stored one", async () => {
    const renamed = DEFAULT_BUILD_STAGES.map((st) => ({ key: st.key, label: `Our ${st.label.toLowerCase()}` }));
    await testDb()("workshops").where({ id: ws.id }).update({ build_stages: JSON.stringify(renamed) });
    try {
      for (const sort of ["-updated", "stage"]) {
        const got = await page(owner, `stage=finish&sort=${sort}&pageSize=5`);
        expect(got.items.map((i) => i.stageLabel)).toEqual(Array(5).fill("Our finishing"));
      }
    } finally {
      await testDb()("workshops").where({ id: ws.id }).update({ build_stages: null });
    }
    expect((await page(owner, "stage=finish&pageSize=1")).items[0]!.stageLabel).toBe("Finishing");
  });
});

describe("EXPLAIN of the list queries on 20,000 commissions", () => {
  type Plan = { table: string; type: string; key: string | null; Extra: string | null };
  async function explain(role: "owner" | "builder" | "client", userId: number, qs: string) {
    // A scope as the authorization helper would mint it for this member (tests only).
    const scope = { workshopId: ws.id, membershipId: 0, userId, role } as unknown as WorkshopScope;
    const query = commissionListQuerySchema.parse(Object.fromEntries(new URLSearchParams(qs)));
    const q = commissionListQueries(testDb(), visibleCommissions(scope), query, { workshopId: ws.id, stageColumn: role === "client" ? "c.client_stage" : "c.stage", line });
    const out: Record<"count" | "rows", Plan[]> = { count: [], rows: [] };
    for (const what of ["count", "rows"] as const) {
      const { sql, bindings } = q[what].toSQL();
      out[what] = (await testDb().raw(`EXPLAIN ${sql}`, bindings))[0] as Plan[];
    }
    return out;
  }

  // The main sorts and filters of each role's list. The stage sort orders by the workshop's own
  // line (computed, so it sorts), but on an index of the workshop's rows, never the whole table.
  // Query strings are functions: the people exist only once beforeAll has run.
  const cases: Array<[string, "owner" | "builder" | "client", () => number, () => string, { sorted: boolean }]> = [
    ["owner, newest first", "owner", () => ws.owner.userId, () => "sort=-updated", { sorted: true }],
    ["owner, one stage, newest first, page 2", "owner", () => ws.owner.userId, () => "stage=finish&sort=-updated&page=2&pageSize=50", { sorted: true }],
    ["owner, by number", "owner", () => ws.owner.userId, () => "sort=number", { sorted: true }],
    ["owner, by title", "owner", () => ws.owner.userId, () => "sort=-title", { sorted: true }],
    ["owner, by target date", "owner", () => ws.owner.userId, () => "sort=targetDate", { sorted: true }],
    ["owner, by stage", "owner", () => ws.owner.userId, () => "sort=stage", { sorted: false }],
    ["owner, one builder's", "owner", () => ws.owner.userId, () => `builder=${ws.builders[1]!.userId}`, { sorted: true }],
    ["owner, one client's", "owner", () => ws.owner.userId, () => `client=${ws.clients[1]!.userId}`, { sorted: true }],
    ["owner, overdue", "owner", () => ws.owner.userId, () => "overdue=true&sort=targetDate", { sorted: true }],
    ["builder, own, newest first", "builder", () => ws.builders[0]!.userId, () => "sort=-updated", { sorted: true }],
    ["builder, own, one stage", "builder", () => ws.builders[0]!.userId, () => "stage=finish&sort=-updated", { sorted: true }],
    ["client, own, newest first", "client", () => ws.clients[0]!.userId, () => "sort=-updated", { sorted: true }],
  ];
  for (const [name, role, userId, qs, { sorted }] of cases) {
    it(`reads an index for ${name}`, async () => {
      const plans = await explain(role, userId(), qs());
      for (const [what, plan] of Object.entries(plans)) {
        const commissions = plan.filter((p) => p.table === "c");
        expect(commissions.length, what).toBeGreaterThan(0);
        for (const p of commissions) {
          // The page query's own read of the commissions table (the join back by id is eq_ref).
          expect(p.type, `${what}: ${JSON.stringify(p)}`).not.toBe("ALL");
          expect(p.key, `${what}: ${JSON.stringify(p)}`).not.toBeNull();
          if (what === "rows" && sorted && p.type !== "eq_ref") expect(p.Extra ?? "", `${what}: ${JSON.stringify(p)}`).not.toMatch(/filesort/);
        }
        // The people are joined by their primary key, for the page's rows only.
        for (const p of plan.filter((x) => x.table === "cu" || x.table === "bu")) expect([p.type, p.key], what).toEqual([expect.stringMatching(/eq_ref|const/), "PRIMARY"]);
      }
    });
  }
});
