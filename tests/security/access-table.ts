// THE access table: every route handler and server action of the app, by the id the matrix finds
// in the source (tests/security/inventory.ts), with how to call it and what each caller gets back.
// `authorization-matrix.test.ts` fails for a route or action that has no row here, and for a row
// whose route or action is gone. DEVELOPERS.md ("Authorization matrix") says how to add a row.
//
// Callers (tests/security/world.ts): anonymous; outsider = the owner of ANOTHER workshop; the
// workshop's owner, builder, bookkeeper and client (the builder and client of the commissions the
// rows make); otherBuilder / otherClient = a builder and a client of the same workshop who are not
// on that commission. Each row calls them in that order, the owner last, so a permitted change
// happens after every refusal has shown that nothing was changed first.
//
// Expected values are HTTP statuses. For a server action, which always answers HTTP 200, the
// value is the status of what it returned: 200 for { ok: true }, the status of the error code for
// { ok: false, code } (401 unauthenticated, 403 forbidden, 404 not_found, 409 conflict, 422
// validation_failed), 303 for a redirect.
import { ROLES, type Role } from "@/lib/auth/permissions";
import { presetById } from "@/lib/lutherie/presets";
import { uniqueEmail, uid } from "../http/fixtures";
import { goodSheet } from "../http/setup-helpers";
import type { RouteRequest } from "./send";
import { CALLERS, type Caller, type World } from "./world";

export type Expect = Record<Caller, number>;

interface RowBase<T> {
  /** Makes what this row's calls are about (its own objects, so rows never disturb each other). */
  prepare?: (w: World) => Promise<T>;
  expect: Expect;
  /**
   * Callers whose 401 or 403 comes from a rule of the product with its own message, not from the
   * session or permission check. Every other 401 and 403 must be the generic refusal, word for word.
   */
  ruleRefusals?: Caller[];
  /** Calls the uploads fake, which other tests switch into short outages: a 503 is tried again. */
  usesUploads?: boolean;
}

export interface RouteRow<T = any> extends RowBase<T> {
  kind: "route";
  request: (w: World, t: T, who: Caller) => RouteRequest;
}

export interface ActionRow<T = any> extends RowBase<T> {
  kind: "action";
  /** The arguments as the page's client code passes them. */
  args: (w: World, t: T, who: Caller) => unknown[];
  /** Values of the page's dynamic segments beyond [workshop] (e.g. the commission's [id]). */
  segments?: (w: World, t: T) => Record<string, string | number>;
}

export type Row = RouteRow | ActionRow;

const route = <T = undefined>(r: Omit<RouteRow<T>, "kind">): RouteRow<T> => ({ kind: "route", ...r });
const action = <T = undefined>(r: Omit<ActionRow<T>, "kind">): ActionRow<T> => ({ kind: "action", ...r });

/** The same answer for everyone. */
export const everyone = (status: number): Expect => Object.fromEntries(CALLERS.map((c) => [c, status])) as Expect;

/** 401 signed out, `status` for anyone signed in (their own account's things). */
export const signedIn = (status: number): Expect => ({ ...everyone(status), anonymous: 401 });

/**
 * A workshop route or action: 401 signed out, 404 for the other workshop's owner (the same answer
 * as for a workshop that does not exist), `ok` for the roles holding the permission, 403 for the
 * others. `commission`: the row is about one commission, which the workshop's second builder and
 * client may not see, so they get 404 when their role holds the permission (a role without it is
 * refused before the commission is looked at). `except` sets single callers.
 */
export function members(ok: number, allowed: readonly Role[], opts: { commission?: boolean; except?: Partial<Expect> } = {}): Expect {
  const forRole = (r: Role) => (allowed.includes(r) ? ok : 403);
  const hidden = (r: Role) => (allowed.includes(r) ? (opts.commission ? 404 : ok) : 403);
  return {
    anonymous: 401,
    outsider: 404,
    owner: forRole("owner"),
    builder: forRole("builder"),
    bookkeeper: forRole("bookkeeper"),
    client: forRole("client"),
    otherBuilder: hidden("builder"),
    otherClient: hidden("client"),
    ...opts.except,
  };
}

const ALL: readonly Role[] = ROLES;
/** Who keeps the books (ledger.read, reconciliation.manage). */
const BOOKS: readonly Role[] = ["owner", "bookkeeper"];
const isClient = (who: Caller) => who === "client" || who === "otherClient";
const ws = (w: World, rest = "") => `/api/workshops/${w.slug}${rest}`;
const com = (w: World, id: number, rest = "") => ws(w, `/commissions/${id}${rest}`);
const spec = () => structuredClone(presetById("six").spec);
const dates = { startsOn: "2027-01-01", endsOn: "2027-06-30" };
const fakeToken = "matrix-token-that-was-never-issued-0000";

async function currentRanges(w: World): Promise<unknown> {
  const r = await w.as.owner.json<{ ranges: unknown }>(ws(w, "/setup-ranges"));
  return r.body.ranges;
}

export const ACCESS_TABLE: Record<string, Row> = {
  // ── Public and account routes ──────────────────────────────────────────────────────────────
  "GET /api/auth/[...nextauth]": route({ request: () => ({ path: "/api/auth/session" }), expect: everyone(200) }),
  // Auth.js refuses a sign-in form without its CSRF token, whoever sends it (redirect with the error).
  "POST /api/auth/[...nextauth]": route({
    request: () => ({ path: "/api/auth/callback/credentials", method: "POST", body: new URLSearchParams({ email: uniqueEmail("matrix-nobody"), password: "not-the-password" }).toString(), headers: { "content-type": "application/x-www-form-urlencoded" } }),
    expect: everyone(302),
  }),
  // The benchmark floors: only in the benchmark's own server (with its token); everywhere else a 404.
  "GET /api/bench/commission-list": route({ request: (w) => ({ path: `/api/bench/commission-list?workshopId=${w.a.id}` }), expect: everyone(404) }),
  "GET /api/bench/commission-summary": route({ request: (w) => ({ path: `/api/bench/commission-summary?workshopId=${w.a.id}` }), expect: everyone(404) }),
  "GET /api/bench/overview": route({ request: (w) => ({ path: `/api/bench/overview?workshopId=${w.a.id}` }), expect: everyone(404) }),
  "POST /api/bench/stripe-signature": route({ request: () => ({ path: "/api/bench/stripe-signature", method: "POST", json: { id: "evt_matrix" } }), expect: everyone(404) }),
  "POST /api/compute": route({ request: () => ({ path: "/api/compute", method: "POST", json: spec() }), expect: everyone(200) }),
  "GET /api/health": route({ request: () => ({ path: "/api/health" }), expect: everyone(200) }),
  "POST /api/invitations/accept": route({ request: () => ({ path: "/api/invitations/accept", method: "POST", json: { token: fakeToken } }), expect: signedIn(404) }),
  "GET /api/me": route({ request: () => ({ path: "/api/me" }), expect: signedIn(200) }),
  // UploadThing's route: its configuration is public; an upload request runs our middleware.
  "GET /api/uploadthing": route({ request: () => ({ path: "/api/uploadthing" }), expect: everyone(200) }),
  "POST /api/uploadthing": route({
    prepare: (w) => w.inBuild(),
    request: (w, c) => ({
      path: "/api/uploadthing?actionType=upload&slug=stagePhoto",
      method: "POST",
      json: { input: { workshop: w.slug, commissionId: c.id, caption: "Matrix upload" }, files: [{ name: "m.jpg", size: 100, type: "image/jpeg", lastModified: 0 }] },
      headers: { "x-uploadthing-version": "7.7.4" },
    }),
    // The SDK has no 401: signed out is its 403 with our code "unauthenticated". A client may add
    // reference pictures only in the spec stage, a bookkeeper never (both: the rule's own message).
    expect: members(200, ["owner", "builder"], { commission: true, except: { anonymous: 403, client: 403, otherClient: 404 } }),
    ruleRefusals: ["anonymous", "client", "bookkeeper"],
    usesUploads: true,
  }),
  // Server to server: the signature is checked before anything else (none here → 400 for all).
  "POST /api/webhooks/stripe": route({ request: () => ({ path: "/api/webhooks/stripe", method: "POST", json: { id: "evt_matrix", type: "checkout.session.completed" } }), expect: everyone(400) }),
  "POST /api/workshops": route({
    request: () => ({ path: "/api/workshops", method: "POST", json: { name: "Matrix Workshop", slug: `matrix-${uid()}`, unitPreference: "mm", currency: "EUR" } }),
    expect: signedIn(201),
  }),

  // ── Cohorts, people, stages ────────────────────────────────────────────────────────────────
  "GET /api/workshops/[workshop]/cohorts/[cohortId]": route({
    prepare: (w) => w.cohort(),
    request: (w, id) => ({ path: ws(w, `/cohorts/${id}`) }),
    // A builder sees the cohorts they are in: the second builder is not in this one.
    expect: members(200, ["owner", "builder", "bookkeeper"], { except: { otherBuilder: 404 } }),
  }),
  "PATCH /api/workshops/[workshop]/cohorts/[cohortId]": route({ prepare: (w) => w.cohort(), request: (w, id) => ({ path: ws(w, `/cohorts/${id}`), method: "PATCH", json: { name: "Matrix course renamed" } }), expect: members(200, ["owner"]) }),
  "DELETE /api/workshops/[workshop]/cohorts/[cohortId]": route({ prepare: (w) => w.cohort(), request: (w, id) => ({ path: ws(w, `/cohorts/${id}`), method: "DELETE" }), expect: members(200, ["owner"]) }),
  "GET /api/workshops/[workshop]/cohorts": route({ request: (w) => ({ path: ws(w, "/cohorts") }), expect: members(200, ["owner", "builder", "bookkeeper"]) }),
  "POST /api/workshops/[workshop]/cohorts": route({ request: (w) => ({ path: ws(w, "/cohorts"), method: "POST", json: { name: `Matrix course ${uid()}`, ...dates } }), expect: members(201, ["owner"]) }),
  "GET /api/workshops/[workshop]/commission-people": route({ request: (w) => ({ path: ws(w, "/commission-people") }), expect: members(200, ["owner", "builder"]) }),
  "GET /api/workshops/[workshop]/commission-stages": route({ request: (w) => ({ path: ws(w, "/commission-stages") }), expect: members(200, ALL) }),

  // ── One commission ─────────────────────────────────────────────────────────────────────────
  "GET /api/workshops/[workshop]/commissions": route({ request: (w) => ({ path: ws(w, "/commissions") }), expect: members(200, ALL) }),
  "POST /api/workshops/[workshop]/commissions": route({
    // Owner and builder open one for a client; a client asks for one for themselves.
    request: (w, _t, who) => ({ path: ws(w, "/commissions"), method: "POST", json: { title: "Matrix commission", ...(isClient(who) ? {} : { clientId: w.a.client.userId }), priceMinor: 100_000 } }),
    expect: members(201, ["owner", "builder", "client"]),
  }),
  "GET /api/workshops/[workshop]/commissions/[id]": route({ prepare: (w) => w.open(), request: (w, c) => ({ path: com(w, c.id) }), expect: members(200, ALL, { commission: true }) }),
  "PATCH /api/workshops/[workshop]/commissions/[id]": route({
    prepare: (w) => w.open(),
    request: (w, c) => ({ path: com(w, c.id), method: "PATCH", json: { title: "Renamed in the matrix" } }),
    expect: members(200, ["owner", "builder"], { commission: true }),
  }),
  "GET /api/workshops/[workshop]/commissions/[id]/transitions": route({ prepare: (w) => w.open(), request: (w, c) => ({ path: com(w, c.id, "/transitions") }), expect: members(200, ALL, { commission: true }) }),
  "POST /api/workshops/[workshop]/commissions/[id]/transitions": route({
    prepare: (w) => w.open(),
    request: (w, c) => ({ path: com(w, c.id, "/transitions"), method: "POST", json: { action: "hold" } }),
    // Everyone who sees it holds the route's permission; the stage machine decides: the builder
    // holds it, the owner then finds it on hold already; bookkeeper and client may not move it.
    expect: members(200, ALL, { commission: true, except: { owner: 409, bookkeeper: 403, client: 403 } }),
    ruleRefusals: ["bookkeeper", "client"],
  }),
  "POST /api/workshops/[workshop]/commissions/[id]/transitions/[historyId]/signoff": route({
    prepare: (w) => w.pendingSignoff(),
    request: (w, c) => ({ path: com(w, c.id, `/transitions/${c.historyId}/signoff`), method: "POST" }),
    expect: members(200, ["owner"], { commission: true }),
  }),
  "GET /api/workshops/[workshop]/commissions/[id]/comments": route({ prepare: (w) => w.open(), request: (w, c) => ({ path: com(w, c.id, "/comments") }), expect: members(200, ALL, { commission: true }) }),
  "POST /api/workshops/[workshop]/commissions/[id]/comments": route({
    prepare: (w) => w.open(),
    request: (w, c) => ({ path: com(w, c.id, "/comments"), method: "POST", json: { body: "A word from the matrix." } }),
    expect: members(201, ALL, { commission: true }),
  }),

  // ── Spec versions ──────────────────────────────────────────────────────────────────────────
  "GET /api/workshops/[workshop]/commissions/[id]/spec-versions": route({ prepare: (w) => w.withSentVersion(), request: (w, c) => ({ path: com(w, c.id, "/spec-versions") }), expect: members(200, ALL, { commission: true }) }),
  "POST /api/workshops/[workshop]/commissions/[id]/spec-versions": route({
    prepare: (w) => w.open(),
    request: (w, c) => ({ path: com(w, c.id, "/spec-versions"), method: "POST", json: { spec: spec(), options: {} } }),
    expect: members(201, ["owner", "builder"], { commission: true }),
  }),
  // A version sent to the client (a client never sees drafts).
  "GET /api/workshops/[workshop]/commissions/[id]/spec-versions/[versionId]": route({
    prepare: (w) => w.withSentVersion(),
    request: (w, c) => ({ path: com(w, c.id, `/spec-versions/${c.versionId}`) }),
    expect: members(200, ALL, { commission: true }),
  }),
  "POST /api/workshops/[workshop]/commissions/[id]/spec-versions/[versionId]/submit": route({
    prepare: (w) => w.withDraft(),
    request: (w, c) => ({ path: com(w, c.id, `/spec-versions/${c.versionId}/submit`), method: "POST", json: {} }),
    // The builder sends it; the owner may send it again (a reminder to the client).
    expect: members(200, ["owner", "builder"], { commission: true }),
  }),
  "POST /api/workshops/[workshop]/commissions/[id]/spec-versions/[versionId]/approve": route({
    prepare: (w) => w.withSentVersion(),
    request: (w, c) => ({ path: com(w, c.id, `/spec-versions/${c.versionId}/approve`), method: "POST" }),
    expect: members(200, ["client"], { commission: true }),
  }),

  // ── Money ──────────────────────────────────────────────────────────────────────────────────
  "GET /api/workshops/[workshop]/commissions/[id]/payments": route({ prepare: (w) => w.inBuild(), request: (w, c) => ({ path: com(w, c.id, "/payments") }), expect: members(200, ["owner", "bookkeeper", "client"], { commission: true }) }),
  "POST /api/workshops/[workshop]/commissions/[id]/payments": route({
    prepare: (w) => w.open(),
    request: (w, c) => ({ path: com(w, c.id, "/payments"), method: "POST", json: { kind: "deposit", amountMinor: 1_000, reference: "Matrix transfer" } }),
    expect: members(201, ["owner", "bookkeeper"], { commission: true }),
  }),
  // The deposit is paid already, so the client's checkout is refused before any processor call.
  // The owner holds every permission but card payment is the commission's client's alone.
  "POST /api/workshops/[workshop]/commissions/[id]/checkout": route({
    prepare: (w) => w.inBuild(),
    request: (w, c) => ({ path: com(w, c.id, "/checkout"), method: "POST", json: { kind: "deposit" } }),
    expect: members(409, ["client"], { commission: true }),
    ruleRefusals: ["owner"],
  }),
  // An offline payment: its refund is recorded at once (no processor call).
  "POST /api/workshops/[workshop]/commissions/[id]/refunds": route({
    prepare: (w) => w.inBuild(),
    request: (w, c) => ({ path: com(w, c.id, "/refunds"), method: "POST", json: { paymentId: c.paymentId, amountMinor: 100, reason: "Matrix refund" } }),
    expect: members(201, ["owner", "bookkeeper"], { commission: true }),
  }),

  // ── Photos ─────────────────────────────────────────────────────────────────────────────────
  "GET /api/workshops/[workshop]/commissions/[id]/photos": route({ prepare: (w) => w.photo(), request: (w, p) => ({ path: com(w, p.id, "/photos") }), expect: members(200, ALL, { commission: true }) }),
  "GET /api/workshops/[workshop]/commissions/[id]/photos/[photoId]/[variant]": route({
    prepare: (w) => w.photo(),
    request: (w, p) => ({ path: com(w, p.id, `/photos/${p.photoId}/thumb`) }),
    expect: members(200, ALL, { commission: true }),
    usesUploads: true,
  }),
  "DELETE /api/workshops/[workshop]/commissions/[id]/photos/[photoId]": route({
    prepare: (w) => w.photo(),
    request: (w, p) => ({ path: com(w, p.id, `/photos/${p.photoId}`), method: "DELETE" }),
    expect: members(200, ["owner"], { commission: true }),
    usesUploads: true,
  }),

  // ── Final setup and printouts ──────────────────────────────────────────────────────────────
  "GET /api/workshops/[workshop]/commissions/[id]/setup-sheet": route({ prepare: (w) => w.inFinalSetup("signed"), request: (w, c) => ({ path: com(w, c.id, "/setup-sheet") }), expect: members(200, ALL, { commission: true }) }),
  "PUT /api/workshops/[workshop]/commissions/[id]/setup-sheet": route({
    prepare: (w) => w.inFinalSetup("draft"),
    request: (w, c) => ({ path: com(w, c.id, "/setup-sheet"), method: "PUT", json: goodSheet() }),
    expect: members(200, ["owner", "builder"], { commission: true }),
  }),
  "POST /api/workshops/[workshop]/commissions/[id]/setup-sheet/sign": route({
    prepare: (w) => w.inFinalSetup("draft"),
    request: (w, c) => ({ path: com(w, c.id, "/setup-sheet/sign"), method: "POST", json: { revision: 1 } }),
    // The builder's signature completes it (no owner sign-off required here); the owner then finds it signed.
    expect: members(200, ["owner", "builder"], { commission: true, except: { owner: 409 } }),
  }),
  "POST /api/workshops/[workshop]/commissions/[id]/setup-sheet/reopen": route({
    prepare: (w) => w.inFinalSetup("signed"),
    request: (w, c) => ({ path: com(w, c.id, "/setup-sheet/reopen"), method: "POST", json: { note: "Matrix reopen" } }),
    // The builder reopens it (a new revision); the owner then finds a draft, which has nothing to reopen.
    expect: members(201, ["owner", "builder"], { commission: true, except: { owner: 409 } }),
  }),
  "GET /api/workshops/[workshop]/commissions/[id]/printouts/fret-template": route({ prepare: (w) => w.inBuild(), request: (w, c) => ({ path: com(w, c.id, "/printouts/fret-template") }), expect: members(200, ALL, { commission: true }) }),
  "GET /api/workshops/[workshop]/commissions/[id]/printouts/build-sheet": route({ prepare: (w) => w.inBuild(), request: (w, c) => ({ path: com(w, c.id, "/printouts/build-sheet") }), expect: members(200, ALL, { commission: true }) }),
  "GET /api/workshops/[workshop]/setup-ranges": route({ request: (w) => ({ path: ws(w, "/setup-ranges") }), expect: members(200, ALL) }),
  "PUT /api/workshops/[workshop]/setup-ranges": route({ prepare: currentRanges, request: (w, ranges) => ({ path: ws(w, "/setup-ranges"), method: "PUT", json: ranges }), expect: members(200, ["owner"]) }),
  "DELETE /api/workshops/[workshop]/setup-ranges": route({ request: (w) => ({ path: ws(w, "/setup-ranges"), method: "DELETE" }), expect: members(200, ["owner"]) }),

  // ── Members, invitations, e-mail, overview, settings ───────────────────────────────────────
  "GET /api/workshops/[workshop]/members": route({ request: (w) => ({ path: ws(w, "/members") }), expect: members(200, ["owner", "builder", "bookkeeper"]) }),
  "PATCH /api/workshops/[workshop]/members/[memberId]": route({
    prepare: (w) => w.spareMember(),
    request: (w, m) => ({ path: ws(w, `/members/${m.membershipId}`), method: "PATCH", json: { role: "builder" } }),
    expect: members(200, ["owner"]),
  }),
  "DELETE /api/workshops/[workshop]/members/[memberId]": route({ prepare: (w) => w.spareMember(), request: (w, m) => ({ path: ws(w, `/members/${m.membershipId}`), method: "DELETE" }), expect: members(204, ["owner"]) }),
  "GET /api/workshops/[workshop]/invitations": route({ request: (w) => ({ path: ws(w, "/invitations") }), expect: members(200, ["owner"]) }),
  "POST /api/workshops/[workshop]/invitations": route({ request: (w) => ({ path: ws(w, "/invitations"), method: "POST", json: { email: uniqueEmail("matrix"), role: "builder" } }), expect: members(201, ["owner"]) }),
  "DELETE /api/workshops/[workshop]/invitations/[invitationId]": route({ prepare: (w) => w.invitation(), request: (w, id) => ({ path: ws(w, `/invitations/${id}`), method: "DELETE" }), expect: members(200, ["owner"]) }),
  "GET /api/workshops/[workshop]/outbox": route({ request: (w) => ({ path: ws(w, "/outbox?status=failed") }), expect: members(200, ["owner"]) }),
  "POST /api/workshops/[workshop]/outbox/[messageId]/retry": route({ prepare: (w) => w.failedEmail(), request: (w, id) => ({ path: ws(w, `/outbox/${id}/retry`), method: "POST" }), expect: members(200, ["owner"]) }),
  "GET /api/workshops/[workshop]/overview": route({ request: (w) => ({ path: ws(w, "/overview") }), expect: members(200, ["owner", "bookkeeper"]) }),
  "GET /api/workshops/[workshop]/settings": route({ request: (w) => ({ path: ws(w, "/settings") }), expect: members(200, ["owner"]) }),
  "PATCH /api/workshops/[workshop]/settings": route({ request: (w) => ({ path: ws(w, "/settings"), method: "PATCH", json: { depositPercent: 30 } }), expect: members(200, ["owner"]) }),

  // ── Logo and books ─────────────────────────────────────────────────────────────────────────
  "GET /api/workshops/[workshop]/logo": route({ prepare: (w) => w.logo(), request: (w) => ({ path: ws(w, "/logo") }), expect: members(200, ALL), usesUploads: true }),
  "GET /api/workshops/[workshop]/books/ledger": route({ request: (w) => ({ path: ws(w, "/books/ledger?status=all&sort=-amount") }), expect: members(200, BOOKS) }),
  "GET /api/workshops/[workshop]/books/ledger/export": route({ request: (w) => ({ path: ws(w, "/books/ledger/export?status=all") }), expect: members(200, BOOKS) }),
  "GET /api/workshops/[workshop]/books/ledger/options": route({ request: (w) => ({ path: ws(w, "/books/ledger/options") }), expect: members(200, BOOKS) }),
  "GET /api/workshops/[workshop]/books/holdings": route({ request: (w) => ({ path: ws(w, "/books/holdings") }), expect: members(200, BOOKS) }),
  "GET /api/workshops/[workshop]/books/summary": route({ request: (w) => ({ path: ws(w, "/books/summary") }), expect: members(200, BOOKS) }),
  "GET /api/workshops/[workshop]/books/reconciliation": route({ request: (w) => ({ path: ws(w, "/books/reconciliation") }), expect: members(200, BOOKS) }),
  "GET /api/workshops/[workshop]/books/reconciliation/[month]": route({ prepare: (w) => w.openException(), request: (w, t) => ({ path: ws(w, `/books/reconciliation/${t.month}`) }), expect: members(200, BOOKS) }),
  "GET /api/workshops/[workshop]/books/reconciliation/[month]/export": route({ prepare: (w) => w.openException(), request: (w, t) => ({ path: ws(w, `/books/reconciliation/${t.month}/export`) }), expect: members(200, BOOKS) }),
  // Compares a month with nothing in it with the payments fake (read only there).
  "POST /api/workshops/[workshop]/books/reconciliation/[month]/run": route({ prepare: (w) => w.month(false), request: (w, t) => ({ path: ws(w, `/books/reconciliation/${t.month}/run`), method: "POST", json: {} }), expect: members(200, BOOKS) }),
  // The bookkeeper resolves (or locks) it; the owner then finds it resolved (locked) already.
  "POST /api/workshops/[workshop]/books/reconciliation/[month]/exceptions/[exceptionId]/resolve": route({
    prepare: (w) => w.openException(),
    request: (w, t) => ({ path: ws(w, `/books/reconciliation/${t.month}/exceptions/${t.id}/resolve`), method: "POST", json: { note: "Matched by hand in the matrix" } }),
    expect: members(200, BOOKS, { except: { owner: 409 } }),
  }),
  "POST /api/workshops/[workshop]/books/reconciliation/[month]/lock": route({
    prepare: (w) => w.month(),
    request: (w, t) => ({ path: ws(w, `/books/reconciliation/${t.month}/lock`), method: "POST", json: { note: "Matrix lock" } }),
    expect: members(200, BOOKS, { except: { owner: 409 } }),
  }),
  // A change that reached a locked month: reviewed by the owner alone (reconciliation.override).
  "POST /api/workshops/[workshop]/books/reconciliation/[month]/changes/[changeId]/review": route({
    prepare: (w) => w.flaggedChange(),
    request: (w, t) => ({ path: ws(w, `/books/reconciliation/${t.month}/changes/${t.id}/review`), method: "POST", json: { note: "Seen in the matrix" } }),
    expect: members(200, ["owner"]),
  }),

  // ── Server actions of the workshop's pages ─────────────────────────────────────────────────
  "app/(app)/[workshop]/cohorts/actions.ts#createCohortAction": action({ args: (w) => [w.slug, { name: `Matrix course ${uid()}`, ...dates }], expect: members(200, ["owner"]) }),
  "app/(app)/[workshop]/cohorts/actions.ts#updateCohortAction": action({
    prepare: (w) => w.cohort(),
    args: (w, id) => [w.slug, { cohortId: id, name: "Matrix course edited", ...dates, builderIds: [w.a.builder.userId] }],
    expect: members(200, ["owner"]),
  }),
  // Both are used on the cohort's own page.
  "app/(app)/[workshop]/cohorts/actions.ts#deleteCohortAction": action({
    prepare: (w) => w.cohort(),
    args: (w, id) => [w.slug, { cohortId: id }],
    segments: (_w, id) => ({ cohortId: id }),
    expect: members(200, ["owner"]),
  }),
  "app/(app)/[workshop]/cohorts/actions.ts#assignCohortAction": action({
    prepare: async (w) => ({ cohortId: await w.cohort(), commissionId: (await w.open()).id }),
    args: (w, t) => [w.slug, t],
    segments: (_w, t) => ({ cohortId: t.cohortId }),
    expect: members(200, ["owner"]),
  }),
  "app/(app)/[workshop]/overview/actions.ts#reassignBuilderAction": action({
    prepare: (w) => w.open(),
    args: (w, c) => [w.slug, { commissionId: c.id, builderId: w.a.builder.userId }],
    expect: members(200, ["owner"]),
  }),
  "app/(app)/[workshop]/commissions/[id]/payments/actions.ts#payInvoiceAction": action({
    prepare: (w) => w.inBuild(),
    args: (w, c) => [w.slug, { commissionId: c.id, kind: "deposit" }],
    segments: (_w, c) => ({ id: c.id }),
    expect: members(409, ["client"], { commission: true }),
    ruleRefusals: ["owner"],
  }),
  "app/(app)/[workshop]/commissions/[id]/payments/actions.ts#recordPaymentAction": action({
    prepare: (w) => w.open(),
    args: (w, c) => [w.slug, { commissionId: c.id, kind: "deposit", amountMinor: 1_000, reference: "Matrix transfer" }],
    segments: (_w, c) => ({ id: c.id }),
    expect: members(200, ["owner", "bookkeeper"], { commission: true }),
  }),
  "app/(app)/[workshop]/commissions/[id]/payments/actions.ts#refundAction": action({
    prepare: (w) => w.inBuild(),
    args: (w, c) => [w.slug, { commissionId: c.id, paymentId: c.paymentId, amountMinor: 100 }],
    segments: (_w, c) => ({ id: c.id }),
    expect: members(200, ["owner", "bookkeeper"], { commission: true }),
  }),
  "app/(app)/[workshop]/commissions/[id]/photos/actions.ts#removePhotoAction": action({
    prepare: (w) => w.photo(),
    args: (w, p) => [w.slug, { commissionId: p.id, photoId: p.photoId }],
    segments: (_w, p) => ({ id: p.id }),
    expect: members(200, ["owner"], { commission: true }),
    usesUploads: true,
  }),
  "app/(app)/[workshop]/commissions/[id]/setup/actions.ts#saveSetupSheetAction": action({
    prepare: (w) => w.inFinalSetup("draft"),
    args: (w, c) => [w.slug, { commissionId: c.id, values: goodSheet() }],
    segments: (_w, c) => ({ id: c.id }),
    expect: members(200, ["owner", "builder"], { commission: true }),
  }),
  "app/(app)/[workshop]/commissions/[id]/setup/actions.ts#signSetupSheetAction": action({
    prepare: (w) => w.inFinalSetup("draft"),
    args: (w, c) => [w.slug, { commissionId: c.id, revision: 1 }],
    segments: (_w, c) => ({ id: c.id }),
    expect: members(200, ["owner", "builder"], { commission: true, except: { owner: 409 } }),
  }),
  "app/(app)/[workshop]/commissions/[id]/setup/actions.ts#reopenSetupSheetAction": action({
    prepare: (w) => w.inFinalSetup("signed"),
    args: (w, c) => [w.slug, { commissionId: c.id, note: "Matrix reopen" }],
    segments: (_w, c) => ({ id: c.id }),
    expect: members(200, ["owner", "builder"], { commission: true, except: { owner: 409 } }),
  }),
  "app/(app)/[workshop]/members/actions.ts#inviteMemberAction": action({ args: (w) => [w.slug, { email: uniqueEmail("matrix"), role: "client" }], expect: members(200, ["owner"]) }),
  "app/(app)/[workshop]/members/actions.ts#changeRoleAction": action({ prepare: (w) => w.spareMember(), args: (w, m) => [w.slug, { memberId: m.membershipId, role: "bookkeeper" }], expect: members(200, ["owner"]) }),
  "app/(app)/[workshop]/members/actions.ts#removeMemberAction": action({ prepare: (w) => w.spareMember(), args: (w, m) => [w.slug, { memberId: m.membershipId }], expect: members(200, ["owner"]) }),
  "app/(app)/[workshop]/members/actions.ts#revokeInvitationAction": action({ prepare: (w) => w.invitation(), args: (w, id) => [w.slug, { invitationId: id }], expect: members(200, ["owner"]) }),
  "app/(app)/[workshop]/members/actions.ts#retryEmailAction": action({ prepare: (w) => w.failedEmail(), args: (w, id) => [w.slug, { messageId: id }], expect: members(200, ["owner"]) }),
  "app/(app)/[workshop]/settings/actions.ts#updateSettingsAction": action({ args: (w) => [w.slug, { depositPercent: 30 }], expect: members(200, ["owner"]) }),
  "app/(app)/[workshop]/settings/actions.ts#removeLogoAction": action({ prepare: (w) => w.logo(), args: (w) => [w.slug, {}], expect: members(200, ["owner"]), usesUploads: true }),
  "app/(app)/[workshop]/setup/actions.ts#saveSetupRangesAction": action({ prepare: currentRanges, args: (w, ranges) => [w.slug, ranges], expect: members(200, ["owner"]) }),
  "app/(app)/[workshop]/setup/actions.ts#resetSetupRangesAction": action({ args: (w) => [w.slug, {}], expect: members(200, ["owner"]) }),

  // ── Account and signed-out actions ─────────────────────────────────────────────────────────
  "app/(app)/account/actions.ts#renameAction": action({ args: (w, _t, who) => [{ name: who === "anonymous" ? "Nobody" : w.person[who].name }], expect: signedIn(200) }),
  // A wrong current password: refused on that field, and nobody's password changes.
  "app/(app)/account/actions.ts#changePasswordAction": action({ args: () => [{ current: "not-the-current-one", password: "matrix-new-password", confirm: "matrix-new-password" }], expect: signedIn(422) }),
  "app/(app)/actions.ts#signOutAction": action({ args: () => [], expect: everyone(303) }),
  "app/(app)/workshops/new/actions.ts#createWorkshopAction": action({ args: () => [{ name: "Matrix Workshop", slug: `matrix-${uid()}`, unitPreference: "mm", currency: "EUR" }], expect: signedIn(200) }),
  "app/(auth)/invitations/[token]/actions.ts#acceptInvitationAction": action({ args: () => [{ token: fakeToken }], expect: signedIn(404) }),
  "app/(auth)/invitations/[token]/actions.ts#acceptWithNewAccountAction": action({ args: () => [{ token: fakeToken, name: "Matrix Newcomer", password: "" }], expect: everyone(404) }),
  "app/(auth)/reset/actions.ts#requestResetAction": action({ args: () => [{ email: uniqueEmail("matrix-reset") }], expect: everyone(200) }),
  // A link never issued reads as expired or used (409 on "token"), whoever asks.
  "app/(auth)/reset/actions.ts#resetPasswordAction": action({ args: () => [{ token: fakeToken, password: "matrix-new-password", confirm: "matrix-new-password" }], expect: everyone(409) }),
  // An address with no account: refused the same for everyone (and counted against that address only).
  "app/(auth)/sign-in/actions.ts#signInWithPasswordAction": action({
    args: () => [{ email: uniqueEmail("matrix-nobody"), password: "not-the-password", callbackUrl: "/workshops" }],
    expect: everyone(401),
    ruleRefusals: [...CALLERS],
  }),
  "app/(auth)/sign-in/actions.ts#sendSignInLinkAction": action({ args: () => [{ email: uniqueEmail("matrix-link"), callbackUrl: "/workshops" }], expect: everyone(200) }),
  "app/(auth)/sign-up/actions.ts#signUpAction": action({ args: () => [{ name: "Matrix Signup", email: uniqueEmail("matrix-signup"), password: "matrix-password-1", callbackUrl: "/workshops" }], expect: everyone(200) }),
};
