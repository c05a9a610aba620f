// Who is signed in, read once per request: the session cookie names a user id, and the database
// must still agree (the account exists and no password change has ended the session since).
import { cache } from "react";
import { findUserById } from "@/lib/data/users";
import { unauthenticated } from "@/lib/http/errors";
import { auth } from "./auth";

export interface SignedInUser {
  id: number;
  email: string;
  name: string;
  hasPassword: boolean;
}

export const currentUser = cache(async (): Promise<SignedInUser | null> => {
  const session = await auth();
  const id = Number(session?.user?.id);
  if (!Number.isInteger(id) || id <= 0) return null;
  const user = await findUserById(id);
  if (!user) return null;
  if (user.sessionsValidAfter && (session?.authTime ?? 0) < user.sessionsValidAfter.getTime()) return null;
  return { id: user.id, email: user.email, name: user.name, hasPassword: user.hasPassword };
});

/** The signed-in user, or an AppError "unauthenticated" (401 for the API). */
export async function requireUser(): Promise<SignedInUser> {
  const user = await currentUser();
  if (!user) throw unauthenticated();
  return user;
}
