// The people and things the authorization matrix calls routes and actions about, made through the
// real routes (commission-helpers, setup-helpers, photo-helpers) on a fresh pair of workshops:
// workshop A with an owner, a builder, a bookkeeper and a client (who own commission work), a second
// builder and client of A who are NOT on those commissions, spare clients to remove, and the owner of
// workshop B as the outsider. Rows ask for their own objects (`w.inBuild()`, `w.cohort()`…) so a row
// that changes something never changes what another row sees.
import type { Role } from "@/lib/auth/permissions";
import { testDb } from "../setup/test-db";
import { approveSpec, base, draftSpec, move, openCommission } from "../http/commission-helpers";
import { addMember, createTestUser, createWorkshopWithMembers, uid, uniqueEmail, type TestMember, type TestWorkshop } from "../http/fixtures";
import { comparedMonth, flaggedChange, openException } from "../http/books-helpers";
import { addPhoto, fileOf, installXhr, uploadLogo } from "../http/photo-helpers";
import { anonymous, signIn, type HttpSession } from "../http/session";
import { commissionInFinalSetup, goodSheet, putSheet, signSheet } from "../http/setup-helpers";
import { jpegWithGps, plainPng } from "../support/photos";

/** Everyone the matrix calls as, in the order each row calls them: refusals first, the owner last. */
export const CALLERS = ["anonymous", "outsider", "otherClient", "otherBuilder", "client", "bookkeeper", "builder", "owner"] as const;
export type Caller = (typeof CALLERS)[number];

export interface World {
  a: TestWorkshop;
  b: TestWorkshop;
  slug: string;
  as: Record<Caller, HttpSession>;
  /** The account behind each signed-in caller. */
  person: Record<Exclude<Caller, "anonymous">, TestMember>;
  /** A spec-stage commission of A's client, built by A's builder. */
  open(title?: string): Promise<{ id: number }>;
  /** … with a drafted spec version. */
  withDraft(): Promise<{ id: number; versionId: number }>;
  /** … with the version sent to the client. */
  withSentVersion(): Promise<{ id: number; versionId: number }>;
  /** Spec approved and the deposit recorded offline (no processor call): in the first build stage. */
  inBuild(): Promise<{ id: number; paymentId: number }>;
  /** Walked to final setup; `sheet` saved as a draft, or signed by the builder. */
  inFinalSetup(sheet?: "none" | "draft" | "signed"): Promise<{ id: number }>;
  /** A builder's move waiting for the owner's sign-off. */
  pendingSignoff(): Promise<{ id: number; historyId: number }>;
  /** A stage photo uploaded by A's builder through the real upload flow. */
  photo(): Promise<{ id: number; photoId: number }>;
  /** A cohort of A with A's (first) builder in it. */
  cohort(): Promise<number>;
  invitation(): Promise<number>;
  /** An e-mail of A that failed for good (for the retry routes). */
  failedEmail(): Promise<number>;
  /** A new client member of A (to remove or change). */
  spareMember(role?: Role): Promise<TestMember>;
  /** A's logo, uploaded by the owner through the real upload flow (replacing any before). */
  logo(): Promise<void>;
  /** A month of A's books no other row uses, compared (as a run would leave it) or not. */
  month(compared?: boolean): Promise<{ month: string; periodId: number | null }>;
  /** An open exception in a compared month of A. */
  openException(): Promise<{ month: string; id: number }>;
  /** A processor change flagged in a month of A, waiting for the owner's review. */
  flaggedChange(): Promise<{ month: string; id: number }>;
}

/** Runs an upload, waiting out the short outages other tests switch on in the shared uploads fake. */
async function withUploadRetries<T>(upload: () => Promise<T>): Promise<T> {
  for (let attempt = 1; ; attempt++) {
    try {
      return await upload();
    } catch (err) {
      if (attempt >= 10) throw err;
      await new Promise((r) => setTimeout(r, 1_000));
    }
  }
}

export async function makeWorld(): Promise<World> {
  installXhr();
  const [a, b] = await Promise.all([createWorkshopWithMembers({ extra: { builder: 1, client: 1 } }), createWorkshopWithMembers()]);
  const second = (role: Role) => a.members.filter((m) => m.role === role)[1]!;
  const person: World["person"] = { owner: a.owner, builder: a.builder, bookkeeper: a.bookkeeper, client: a.client, otherBuilder: second("builder"), otherClient: second("client"), outsider: b.owner };
  const signed = await Promise.all(Object.entries(person).map(async ([who, p]) => [who, await signIn(p)] as const));
  const as = { anonymous: anonymous(), ...Object.fromEntries(signed) } as Record<Caller, HttpSession>;
  const people = { owner: as.owner, builder: as.builder, bookkeeper: as.bookkeeper, client: as.client };
  let photoCommission: Promise<{ id: number; paymentId: number }> | undefined;
  // Months before any payment the rows record (these tests pay in the current month), one per call.
  let months = 0;

  const w: World = {
    a,
    b,
    slug: a.slug,
    as,
    person,
    open: (title = "Matrix commission") => openCommission(as.owner, a, { title }),
    async withDraft() {
      const c = await w.open();
      return { id: c.id, versionId: (await draftSpec(as.builder, a, c.id)).id };
    },
    async withSentVersion() {
      const d = await w.withDraft();
      const r = await as.builder.fetch(`${base(a)}/${d.id}/spec-versions/${d.versionId}/submit`, { method: "POST", json: {} });
      if (r.status !== 200) throw new Error(`submit ${r.status}`);
      return d;
    },
    async inBuild() {
      const c = await w.open();
      await approveSpec(as.builder, as.client, a, c.id);
      const paid = await as.bookkeeper.json<{ paymentId: number }>(`${base(a)}/${c.id}/payments`, { method: "POST", json: { kind: "deposit", amountMinor: 90_000, reference: "Matrix transfer" } });
      if (paid.status !== 201) throw new Error(`deposit ${paid.status}`);
      return { id: c.id, paymentId: paid.body.paymentId };
    },
    async inFinalSetup(sheet = "draft") {
      const c = await commissionInFinalSetup(people, a);
      if (sheet !== "none") await putSheet(as.builder, a, c.id, goodSheet());
      if (sheet === "signed") await signSheet(as.builder, a, c.id, 1);
      return { id: c.id };
    },
    async pendingSignoff() {
      const c = await w.open();
      await approveSpec(as.builder, as.client, a, c.id);
      await as.bookkeeper.fetch(`${base(a)}/${c.id}/payments`, { method: "POST", json: { kind: "deposit", amountMinor: 90_000, reference: "Matrix deposit" } });
      await testDb()("workshops").where({ id: a.id }).update({ require_stage_signoff: true });
      const moved = await move(as.builder, a, c.id, "advance");
      await testDb()("workshops").where({ id: a.id }).update({ require_stage_signoff: false });
      if (moved.status !== 200) throw new Error(`move for sign-off ${moved.status}`);
      const row = await testDb()("stage_history").where({ commission_id: c.id, needs_signoff: true }).first("id");
      return { id: c.id, historyId: Number(row.id) };
    },
    async photo() {
      photoCommission ??= w.inBuild();
      const { id } = await photoCommission;
      const bytes = await jpegWithGps(320, 240);
      return { id, photoId: await withUploadRetries(() => addPhoto(as.builder, a, id, fileOf(bytes, "matrix.jpg"), "Matrix photo")) };
    },
    async cohort() {
      const r = await as.owner.json<{ cohort: { id: number } }>(`/api/workshops/${a.slug}/cohorts`, {
        json: { name: `Matrix course ${uid()}`, startsOn: "2027-01-01", endsOn: "2027-06-30", builderIds: [a.builder.userId] },
      });
      if (r.status !== 201) throw new Error(`cohort ${r.status}`);
      return r.body.cohort.id;
    },
    async invitation() {
      const r = await as.owner.json<{ invitation: { id: number } }>(`/api/workshops/${a.slug}/invitations`, { json: { email: uniqueEmail("matrix-invite"), role: "client" } });
      if (r.status !== 201) throw new Error(`invitation ${r.status}`);
      return r.body.invitation.id;
    },
    async failedEmail() {
      const [id] = await testDb()("email_outbox").insert({
        workshop_id: a.id,
        template: "invitation",
        to_address: uniqueEmail("matrix-failed"),
        subject: "A failed invitation",
        props: JSON.stringify({ workshopName: a.name, inviterName: a.owner.name, role: "client", acceptUrl: "http://localhost:3000/invitations/x", expiresAt: new Date().toISOString() }),
        idempotency_key: `matrix-${a.id}-${Math.random().toString(36).slice(2)}`,
        status: "failed",
        attempts: 1,
        last_error: "validation_error",
      });
      return Number(id);
    },
    async spareMember(role = "client") {
      return addMember(a.id, await createTestUser({ email: uniqueEmail(`matrix-spare-${role}`) }), role);
    },
    async logo() {
      const png = await plainPng(64, 64);
      const up = await withUploadRetries(() => uploadLogo(as.owner, a.slug, fileOf(png, "matrix-logo.png", "image/png")));
      if (!up.serverData.ok) throw new Error(`logo refused: ${JSON.stringify(up.serverData)}`);
    },
    async month(compared = true) {
      const n = months++;
      const month = `${2010 + Math.floor(n / 12)}-${String((n % 12) + 1).padStart(2, "0")}`;
      return { month, periodId: compared ? await comparedMonth(a, month) : null };
    },
    async openException() {
      const { month, periodId } = await w.month();
      return { month, id: await openException(a, periodId!, months) };
    },
    async flaggedChange() {
      const { month, periodId } = await w.month();
      return { month, id: await flaggedChange(a, periodId!, months) };
    },
  };
  return w;
}
