// The books pages answer the same way as pages do: owner and bookkeeper see them, builders and
// clients get the 403 page, another workshop's owner the 404 page, and the workshop's navigation
// shows Books to those who may open it. Product rules (issue 7). Who may call each books route
// (and every other route and action) is the authorization matrix: tests/security/access-table.ts.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestDb } from "../setup/test-db";
import { signInRoles } from "./commission-helpers";
import { approvedCommission, comparedMonth, recordPayment } from "./books-helpers";
import { createWorkshopWithMembers, type TestWorkshop } from "./fixtures";
import { signIn, type HttpSession } from "./session";

type Who = "owner" | "builder" | "bookkeeper" | "client" | "outsider";
let a: TestWorkshop;
const as: Partial<Record<Who, HttpSession>> = {};

beforeAll(async () => {
  const [mine, theirs] = await Promise.all([createWorkshopWithMembers(), createWorkshopWithMembers()]);
  a = mine;
  const s = await signInRoles(a);
  Object.assign(as, { owner: s.owner, builder: s.builder, bookkeeper: s.bookkeeper, client: s.client, outsider: await signIn(theirs.owner) });
  const c = await approvedCommission(s, a);
  await recordPayment(s.bookkeeper, a, c.id, { kind: "deposit", amountMinor: 50_000, paidOn: "2026-05-14" });
  await comparedMonth(a, "2026-05");
});
afterAll(closeTestDb);

describe("books pages, role by role", () => {
  const pages = ["", "/reconciliation", "/reconciliation/2026-05", "/held", "/summary"];
  const page = (p: string) => `/${a.slug}/books${p}`;
  const status = async (who: Who, path: string) => (await as[who]!.fetch(path)).status;

  it("open for the owner and the bookkeeper, with their headings", async () => {
    const headings: Record<string, string> = {
      "": "Payments ledger",
      "/reconciliation": "Reconciliation with the processor",
      "/reconciliation/2026-05": "Reconciliation: May 2026",
      "/held": "Held and earned",
      "/summary": "Monthly summary",
    };
    for (const p of pages) {
      for (const who of ["owner", "bookkeeper"] as const) {
        const res = await as[who]!.fetch(page(p));
        expect(res.status, `${who} ${p}`).toBe(200);
        expect(await res.text(), p).toContain(headings[p]!);
      }
    }
  });

  it("answer 403 to builders and clients and 404 to another workshop's owner", async () => {
    for (const p of pages) {
      for (const who of ["builder", "client"] as const) expect(await status(who, page(p)), `${who} ${p}`).toBe(403);
      const theirs = await as.outsider!.fetch(page(p));
      expect(theirs.status, p).toBe(404);
      expect(await theirs.text()).not.toContain(a.name);
    }
    expect(await status("owner", page("/reconciliation/2026-13"))).toBe(404);
    expect(await status("owner", page("/reconciliation/may"))).toBe(404);
  });

  it("show Books in the workshop's navigation to the owner and the bookkeeper only", async () => {
    const nav = async (who: Who) => (await (await as[who]!.fetch(`/${a.slug}`)).text()).includes(`href="/${a.slug}/books"`);
    expect([await nav("owner"), await nav("bookkeeper"), await nav("builder"), await nav("client")]).toEqual([true, true, false, false]);
  });
});
