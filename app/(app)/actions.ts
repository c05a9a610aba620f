"use server";

import { signOut } from "@/lib/auth/auth";

/** Ends the session and returns to the landing page. */
export async function signOutAction(): Promise<void> {
  await signOut({ redirectTo: "/" });
}
