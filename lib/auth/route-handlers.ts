// Wrappers for route handlers: they resolve the session (and for workshop routes the membership
// and permission), validate route params, and map every error to the one JSON error shape.
import type { NextRequest } from "next/server";
import type { z, ZodType } from "zod";
import { notFound } from "@/lib/http/errors";
import { errorResponse } from "@/lib/http/respond";
import type { PermissionRequirement } from "./permissions";
import { requireUser, type SignedInUser } from "./session";
import { resolveWorkshopAccess, type WorkshopContext } from "./workshop-access";

type RawParams = Record<string, string | string[] | undefined>;
type NextRouteContext = { params: Promise<RawParams> };

export type WorkshopRouteContext<P> = WorkshopContext & { params: P };

function privateAnswer(res: Response): Response {
  // Answers that depend on who asks must never be cached by a shared cache.
  if (!res.headers.has("Cache-Control")) res.headers.set("Cache-Control", "private, no-store");
  return res;
}

/**
 * A route handler under /api/workshops/[workshop]/…:
 *
 *   export const GET = withWorkshop({ permission: "member.names" }, async (req, ctx) => …);
 *   export const PATCH = withWorkshop({ permission: "member.manage", params: z.object({ memberId: idParamSchema }) },
 *     async (req, { scope, params }) => …);
 *
 * `params` (optional) validates the other route segments; a segment that does not parse is a 404.
 */
export function withWorkshop<S extends ZodType = ZodType<Record<string, never>>>(
  opts: { permission: PermissionRequirement; params?: S },
  handler: (req: NextRequest, ctx: WorkshopRouteContext<z.output<S>>) => Promise<Response> | Response,
) {
  return async (req: NextRequest, route: NextRouteContext): Promise<Response> => {
    try {
      const raw = await route.params;
      const access = await resolveWorkshopAccess(String(raw.workshop ?? ""), opts.permission);
      let params = {} as z.output<S>;
      if (opts.params) {
        const parsed = opts.params.safeParse(raw);
        if (!parsed.success) throw notFound();
        params = parsed.data as z.output<S>;
      }
      return privateAnswer(await handler(req, { ...access, params }));
    } catch (err) {
      return privateAnswer(errorResponse(err));
    }
  };
}

/** A route handler for the signed-in user's own things (/api/me, accepting an invitation, …). */
export function withUser(handler: (req: NextRequest, ctx: { user: SignedInUser; params: RawParams }) => Promise<Response> | Response) {
  return async (req: NextRequest, route: NextRouteContext): Promise<Response> => {
    try {
      const user = await requireUser();
      return privateAnswer(await handler(req, { user, params: await route.params }));
    } catch (err) {
      return privateAnswer(errorResponse(err));
    }
  };
}
