// Accounts. Only findUserForPasswordCheck returns the password hash, and only to the sign-in check.
import { db } from "@/db/knex";
import { AppError } from "@/lib/http/errors";
import { isDuplicateKey, type Trx } from "./transaction";

export interface UserRecord {
  id: number;
  email: string;
  name: string;
  hasPassword: boolean;
  emailVerifiedAt: Date | null;
  sessionsValidAfter: Date | null;
}

const PUBLIC_COLUMNS = ["id", "email", "name", "email_verified_at", "sessions_valid_after", db.raw("password_hash IS NOT NULL AS has_password")];

interface UserRow {
  id: number;
  email: string;
  name: string;
  email_verified_at: Date | null;
  sessions_valid_after: Date | null;
  has_password: number;
}

function toUser(r: UserRow): UserRecord {
  return {
    id: r.id,
    email: r.email,
    name: r.name,
    hasPassword: !!r.has_password,
    emailVerifiedAt: r.email_verified_at,
    sessionsValidAfter: r.sessions_valid_after,
  };
}

export async function findUserById(id: number): Promise<UserRecord | null> {
  const row = (await db("users").where({ id }).first(PUBLIC_COLUMNS)) as UserRow | undefined;
  return row ? toUser(row) : null;
}

export async function findUserByEmail(email: string, trx?: Trx): Promise<UserRecord | null> {
  const row = (await (trx ?? db)("users").where({ email: email.toLowerCase() }).first(PUBLIC_COLUMNS)) as UserRow | undefined;
  return row ? toUser(row) : null;
}

/** For the password check alone: the user and their hash (null when they sign in by link only). */
export async function findUserForPasswordCheck(email: string): Promise<{ id: number; email: string; name: string; passwordHash: string | null } | null> {
  const row = await db("users").where({ email: email.toLowerCase() }).first("id", "email", "name", "password_hash");
  return row ? { id: row.id, email: row.email, name: row.name, passwordHash: row.password_hash } : null;
}

/** Creates an account; a taken address is a 409 on the `email` field. */
export async function createUser(
  input: { email: string; name: string; passwordHash: string | null; emailVerified?: boolean },
  trx?: Trx,
): Promise<number> {
  try {
    const [id] = await (trx ?? db)("users").insert({
      email: input.email.toLowerCase(),
      name: input.name,
      password_hash: input.passwordHash,
      email_verified_at: input.emailVerified ? new Date() : null,
    });
    return Number(id);
  } catch (err) {
    if (isDuplicateKey(err)) {
      throw new AppError("conflict", "An account with this e-mail address already exists.", [
        { path: "email", message: "An account with this address already exists. Sign in instead." },
      ]);
    }
    throw err;
  }
}

export async function updateUserName(userId: number, name: string): Promise<void> {
  await db("users").where({ id: userId }).update({ name });
}

export async function markEmailVerified(userId: number): Promise<void> {
  await db("users").where({ id: userId }).whereNull("email_verified_at").update({ email_verified_at: new Date() });
}

/**
 * Sets a new password hash and ends every session issued before now (the caller signs the
 * person in again if they should stay signed in).
 */
export async function setUserPassword(userId: number, passwordHash: string, trx?: Trx): Promise<void> {
  await (trx ?? db)("users").where({ id: userId }).update({ password_hash: passwordHash, sessions_valid_after: new Date() });
}
