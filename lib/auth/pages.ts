// Guards for server components and layouts: the same check as the API, answered the way pages
// answer — a redirect to sign-in, the 404 page, or the 403 page.
import { forbidden, notFound, redirect } from "next/navigation";
import { AppError } from "@/lib/http/errors";
import type { PermissionRequirement } from "./permissions";
import { currentUser, type SignedInUser } from "./session";
import { resolveWorkshopAccess, type WorkshopContext } from "./workshop-access";

export function signInPath(callbackPath: string): string {
  return `/sign-in?${new URLSearchParams({ callbackUrl: callbackPath })}`;
}

/**
 * For app/(app)/[workshop]/…: `const ctx = await requireWorkshopPage(slug, "member.names")`.
 * The layout calls it without a permission (membership only); each page calls it with its own.
 */
export async function requireWorkshopPage(slug: string, permission?: PermissionRequirement, callbackPath = `/${slug}`): Promise<WorkshopContext> {
  try {
    return await resolveWorkshopAccess(slug, permission);
  } catch (err) {
    if (err instanceof AppError) {
      if (err.code === "unauthenticated") redirect(signInPath(callbackPath));
      if (err.code === "not_found") notFound();
      if (err.code === "forbidden") forbidden();
    }
    throw err;
  }
}

/** For signed-in pages outside a workshop (account, workshop list). */
export async function requireUserPage(callbackPath: string): Promise<SignedInUser> {
  const user = await currentUser();
  if (!user) redirect(signInPath(callbackPath));
  return user;
}
