// Wrappers for server actions. Every server action is a public POST endpoint, so each one
// authorises itself here, validates its input with the domain's zod schema, and answers
// { ok: true, data } | { ok: false, code, message, fieldErrors } — never a thrown error.
import { unstable_rethrow } from "next/navigation";
import type { z, ZodType } from "zod";
import { toErrorBody, type ErrorCode } from "@/lib/http/errors";
import type { PermissionRequirement } from "./permissions";
import { requireUser, type SignedInUser } from "./session";
import { resolveWorkshopAccess, type WorkshopContext } from "./workshop-access";

export type ActionResult<T> =
  | { ok: true; data: T }
  | { ok: false; code: ErrorCode; message: string; fieldErrors: Record<string, string> };

/** Turns anything thrown into a failure result (redirects and notFound() pass through to Next). */
export function actionFailure(err: unknown): ActionResult<never> {
  unstable_rethrow(err);
  const { body } = toErrorBody(err);
  if (body.error.code === "internal") console.error("[action]", err);
  const fieldErrors: Record<string, string> = {};
  for (const issue of body.error.issues ?? []) if (issue.path && !(issue.path in fieldErrors)) fieldErrors[issue.path] = issue.message;
  return { ok: false, code: body.error.code, message: body.error.message, fieldErrors };
}

function parse<S extends ZodType>(schema: S, input: unknown): z.output<S> {
  const parsed = schema.safeParse(input);
  if (!parsed.success) throw parsed.error;
  return parsed.data;
}

/**
 * A server action on one workshop's data. The client passes the slug from the URL it is on; the
 * workshop id comes from the caller's membership.
 *
 *   export const inviteMemberAction = workshopAction({ permission: "member.manage", schema: invitationCreateSchema },
 *     async (input, ctx) => inviteMember(ctx.scope, input));
 *   // client: const r = await inviteMemberAction(slug, values)
 */
export function workshopAction<S extends ZodType, T>(
  opts: { permission: PermissionRequirement; schema: S },
  fn: (input: z.output<S>, ctx: WorkshopContext) => Promise<T>,
): (slug: string, input: z.input<S>) => Promise<ActionResult<T>> {
  return async (slug, input) => {
    try {
      const ctx = await resolveWorkshopAccess(slug, opts.permission);
      return { ok: true, data: await fn(parse(opts.schema, input), ctx) };
    } catch (err) {
      return actionFailure(err);
    }
  };
}

/** A server action on the signed-in user's own account. */
export function userAction<S extends ZodType, T>(
  schema: S,
  fn: (input: z.output<S>, user: SignedInUser) => Promise<T>,
): (input: z.input<S>) => Promise<ActionResult<T>> {
  return async (input) => {
    try {
      const user = await requireUser();
      return { ok: true, data: await fn(parse(schema, input), user) };
    } catch (err) {
      return actionFailure(err);
    }
  };
}

/** A server action anyone may call (sign-in, sign-up, password reset): input validation only. */
export function publicAction<S extends ZodType, T>(schema: S, fn: (input: z.output<S>) => Promise<T>): (input: z.input<S>) => Promise<ActionResult<T>> {
  return async (input) => {
    try {
      return { ok: true, data: await fn(parse(schema, input)) };
    } catch (err) {
      return actionFailure(err);
    }
  };
}
