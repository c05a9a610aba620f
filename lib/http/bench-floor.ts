// The benchmark floors' route wrapper: a floor answers only in the bench's own server, to requests
// carrying its token (x-bench-token); anywhere else it is a 404 like any unknown path. A floor runs
// what a real route or page runs underneath (its SQL or its data functions) with nothing around it,
// so `npm run bench` can print how much the real one costs on top.
import type { WorkshopScope } from "@/lib/auth/scope";
import { resolveBenchFloorScope } from "@/lib/auth/workshop-access";
import { benchFloorTokenMatches } from "./bench-floor-token";
import { notFound } from "./errors";
import { errorResponse } from "./respond";

/** Wraps a floor handler: 404 unless the token matches, errors through the one mapper. */
export function benchFloorRoute(handler: (req: Request) => Promise<Response>): (req: Request) => Promise<Response> {
  return async (req) => {
    try {
      if (!benchFloorTokenMatches(req.headers.get("x-bench-token"))) throw notFound();
      return await handler(req);
    } catch (err) {
      return errorResponse(err);
    }
  };
}

// Read once per workshop: the floor leaves the membership lookup out on purpose.
const scopes = new Map<number, Promise<WorkshopScope | null>>();

/** The owner's scope of `workshopId` for a floor (404 when the workshop has no owner). */
export async function benchOwnerScope(workshopId: number): Promise<WorkshopScope> {
  let pending = scopes.get(workshopId);
  if (!pending) {
    pending = resolveBenchFloorScope(workshopId);
    scopes.set(workshopId, pending);
  }
  const scope = await pending;
  if (!scope) {
    scopes.delete(workshopId);
    throw notFound("No such workshop.");
  }
  return scope;
}
