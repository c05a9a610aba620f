// A small Auth.js adapter on our own tables, just what e-mail sign-in with JWT sessions needs:
// verification tokens, and reading/updating users. Sign-up by e-mail link is closed: links go to
// existing accounts only (new people sign up or accept an invitation), so createUser refuses.
import type { Adapter, AdapterUser } from "@auth/core/adapters";
import { consumeVerificationToken, insertVerificationToken } from "@/lib/data/verification-tokens";
import { findUserByEmail, findUserById, markEmailVerified, type UserRecord } from "@/lib/data/users";

function toAdapterUser(u: UserRecord): AdapterUser {
  return { id: String(u.id), email: u.email, name: u.name, emailVerified: u.emailVerifiedAt };
}

export function knexAdapter(): Adapter {
  return {
    async createUser() {
      throw new Error("Accounts are created by signing up or accepting an invitation, not by a sign-in link.");
    },
    async getUser(id) {
      const n = Number(id);
      if (!Number.isInteger(n) || n <= 0) return null;
      const u = await findUserById(n);
      return u ? toAdapterUser(u) : null;
    },
    async getUserByEmail(email) {
      const u = await findUserByEmail(email);
      return u ? toAdapterUser(u) : null;
    },
    async getUserByAccount() {
      return null; // no OAuth accounts
    },
    async updateUser(user) {
      // Auth.js calls this only to record that the address is verified (a link was used).
      const id = Number(user.id);
      if (user.emailVerified) await markEmailVerified(id);
      const u = await findUserById(id);
      if (!u) throw new Error("user vanished");
      return toAdapterUser(u);
    },
    async createVerificationToken(t) {
      await insertVerificationToken(t);
      return t;
    },
    async useVerificationToken(params) {
      return consumeVerificationToken(params);
    },
  };
}
