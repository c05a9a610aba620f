// THE authorization check for workshop data. Every route handler, server action and server
// component that touches a workshop's rows goes through resolveWorkshopAccess (directly or via
// withWorkshop / workshopAction / requireWorkshopPage), and gets back the scope its data
// functions need. The workshop id comes from the membership row, never from the request.
import { cache } from "react";
import { findBenchFloorOwner } from "@/lib/data/bench-floor";
import { findMembershipBySlug, type WorkshopRecord } from "@/lib/data/memberships";
import { findProcessorEventActor } from "@/lib/data/processor-actor";
import { benchFloorToken } from "@/lib/http/bench-floor-token";
import { forbidden, notFound } from "@/lib/http/errors";
import { can, type Permission, type PermissionRequirement, type Role } from "./permissions";
import { mintWorkshopScope, type WorkshopScope } from "./scope";
import { requireUser, type SignedInUser } from "./session";

export interface WorkshopContext {
  user: SignedInUser;
  membership: { id: number; role: Role };
  workshop: WorkshopRecord;
  /** Pass to every lib/data function that reads or writes this workshop's rows. */
  scope: WorkshopScope;
  /** Whether the caller's role holds a permission (for role-dependent answers, e.g. names only). */
  can: (permission: Permission | readonly Permission[]) => boolean;
}

const NO_SUCH_WORKSHOP = "No such workshop.";

/** The membership of `userId` in workshop `slug`, as a context (without the user). */
async function membershipContext(userId: number, slug: string): Promise<Omit<WorkshopContext, "user">> {
  if (typeof slug !== "string" || slug.length === 0 || slug.length > 64) throw notFound(NO_SUCH_WORKSHOP);
  const m = await findMembershipBySlug(userId, slug);
  // Not a member and no such workshop look the same: both 404.
  if (!m) throw notFound(NO_SUCH_WORKSHOP);
  const scope = mintWorkshopScope({ workshopId: m.workshop.id, membershipId: m.membershipId, userId, role: m.role });
  return {
    membership: { id: m.membershipId, role: m.role },
    workshop: m.workshop,
    scope,
    can: (p) => can(m.role, p),
  };
}

// One membership lookup per request, however many layouts and pages ask.
const loadWorkshopContext = cache(async (slug: string): Promise<WorkshopContext> => {
  const user = await requireUser();
  return { user, ...(await membershipContext(user.id, slug)) };
});

/**
 * Resolves the signed-in user's membership of the workshop `slug` and checks the permission.
 * Throws AppError: "unauthenticated" (not signed in), "not_found" (no such workshop, or not a
 * member of it), "forbidden" (a member whose role lacks the permission).
 */
export async function resolveWorkshopAccess(slug: string, required?: PermissionRequirement): Promise<WorkshopContext> {
  const ctx = await loadWorkshopContext(slug);
  if (required && !ctx.can(required)) throw forbidden();
  return ctx;
}

/**
 * The scope a payment processor's event acts under, for the webhook route only and only after it
 * has verified the event's signature: the commission's client (the payer) while a member of the
 * workshop, else an owner. Null when the workshop has no such commission.
 */
export async function resolveProcessorEventScope(workshopId: number, commissionId: number): Promise<WorkshopScope | null> {
  const actor = await findProcessorEventActor(workshopId, commissionId);
  return actor ? mintWorkshopScope({ workshopId, membershipId: actor.membershipId, userId: actor.userId, role: actor.role }) : null;
}

/**
 * The same check for work done on a member's behalf after their request has ended: the upload
 * service's signed callback (lib/photos), whose metadata the upload route's middleware wrote
 * after resolving that member's session with resolveWorkshopAccess. The membership is read again
 * here, so someone removed from the workshop (or given another role) meanwhile is judged as they
 * are now. Never call it with ids from a request body or query.
 */
export async function resolveMemberAccess(userId: number, slug: string, required?: PermissionRequirement): Promise<Omit<WorkshopContext, "user">> {
  const ctx = await membershipContext(userId, slug);
  if (required && !ctx.can(required)) throw forbidden();
  return ctx;
}

/**
 * Benchmark floors only (app/api/bench/**, which answer 404 unless the server runs with
 * BENCH_FLOOR_TOKEN and the request carries it): the workshop's first owner as a scope, so a floor
 * runs a page's own data functions with no session or membership check around them. Null while
 * the floors are off, whoever calls.
 */
export async function resolveBenchFloorScope(workshopId: number): Promise<WorkshopScope | null> {
  if (!benchFloorToken()) return null;
  const owner = await findBenchFloorOwner(workshopId);
  return owner ? mintWorkshopScope({ workshopId, ...owner }) : null;
}
