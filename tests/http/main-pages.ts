// The main pages of the product, each as the person who sees the most of it, with the data that
// makes it show its forms (a spec being drafted, a commission in final setup with its deposit
// paid). Built through the real routes of whichever app TEST_APP_URL points at: the build
// `npm test` serves (tests/http/first-load-js.test.ts) or the bench's (`npm run bench`).
import { openCommission, signInRoles } from "./commission-helpers";
import { addMember, createWorkshopWithMembers, type TestWorkshop } from "./fixtures";
import type { HttpSession } from "./session";
import { commissionInFinalSetup } from "./setup-helpers";

export type Viewer = "anonymous" | "owner" | "builder" | "bookkeeper" | "client";

export interface MainPage {
  label: string;
  path: string;
  as: Viewer;
}

export interface MainPagesFixture {
  ws: TestWorkshop;
  sessions: Record<Exclude<Viewer, "anonymous">, HttpSession>;
  pages: MainPage[];
  /** The Cookie header of a viewer ("" when signed out). */
  cookieOf(v: Viewer): string;
}

/** A fresh workshop (its owner also owns a second one), its four people signed in, two commissions, and the pages to load. */
export async function prepareMainPages(): Promise<MainPagesFixture> {
  const ws = await createWorkshopWithMembers();
  // Someone in a single workshop goes straight into it: the list shows for people in several.
  await addMember((await createWorkshopWithMembers()).id, ws.owner, "owner");
  const sessions = await signInRoles(ws);
  const drafting = await openCommission(sessions.owner, ws, { title: "Spec being drafted" });
  const inSetup = await commissionInFinalSetup(sessions, ws);
  const thisMonth = new Date().toISOString().slice(0, 7); // YYYY-MM, UTC
  const c = (id: number, tab = "") => `/${ws.slug}/commissions/${id}${tab}`;
  const pages: MainPage[] = [
    { label: "landing", path: "/", as: "anonymous" },
    { label: "calculator", path: "/calculator", as: "anonymous" },
    { label: "sign-in", path: "/sign-in", as: "anonymous" },
    { label: "sign-up", path: "/sign-up", as: "anonymous" },
    { label: "workshops list", path: "/workshops", as: "owner" },
    { label: "account", path: "/account", as: "owner" },
    { label: "workshop home", path: `/${ws.slug}`, as: "owner" },
    { label: "members", path: `/${ws.slug}/members`, as: "owner" },
    { label: "commissions table", path: `/${ws.slug}/commissions`, as: "owner" },
    { label: "commission overview", path: c(drafting.id), as: "owner" },
    { label: "spec tab (builder drafting)", path: c(drafting.id, "/spec"), as: "builder" },
    { label: "payments (owner: record, refund)", path: c(inSetup.id, "/payments"), as: "owner" },
    { label: "photos (builder: upload)", path: c(inSetup.id, "/photos"), as: "builder" },
    { label: "setup (builder: the sheet)", path: c(inSetup.id, "/setup"), as: "builder" },
    { label: "new commission", path: `/${ws.slug}/commissions/new`, as: "owner" },
    { label: "overview", path: `/${ws.slug}/overview`, as: "owner" },
    { label: "cohorts", path: `/${ws.slug}/cohorts`, as: "owner" },
    { label: "settings", path: `/${ws.slug}/settings`, as: "owner" },
    { label: "setup ranges", path: `/${ws.slug}/setup`, as: "owner" },
    { label: "books: ledger", path: `/${ws.slug}/books`, as: "bookkeeper" },
    { label: "books: reconciliation", path: `/${ws.slug}/books/reconciliation`, as: "bookkeeper" },
    { label: "books: a month", path: `/${ws.slug}/books/reconciliation/${thisMonth}`, as: "bookkeeper" },
    { label: "books: summary", path: `/${ws.slug}/books/summary`, as: "bookkeeper" },
  ];
  const cookieOf = (v: Viewer) => (v === "anonymous" ? "" : [...sessions[v].cookies].map(([k, val]) => `${k}=${val}`).join("; "));
  return { ws, sessions, pages, cookieOf };
}
