// The Auth.js instance: e-mail + password (argon2id), and sign-in links by e-mail through the outbox.
import NextAuth from "next-auth";
import Credentials from "next-auth/providers/credentials";
import { findUserByEmail, findUserForPasswordCheck } from "@/lib/data/users";
import { passwordSignInSchema } from "@/lib/schemas/auth";
import { knexAdapter } from "./adapter";
import { clientIp } from "@/lib/http/client-ip";
import { authBaseConfig } from "./config";
import { InvalidCredentials, SignInRateLimited } from "./errors";
import { EMAIL_PROVIDER_ID, queueSignInLinkEmail, SIGN_IN_LINK_MAX_AGE_S } from "./magic-link";
import { hashPassword, verifyPassword } from "./password";
import { checkSignInAllowed, clearFailedSignIns, recordFailedSignIn } from "./rate-limit";

// Verifying against a throwaway hash when the address is unknown keeps the answer time the same,
// so timing does not reveal which addresses have accounts.
let dummyHash: Promise<string> | undefined;

export const { handlers, auth, signIn, signOut } = NextAuth({
  ...authBaseConfig,
  adapter: knexAdapter(),
  providers: [
    Credentials({
      id: "credentials",
      name: "E-mail and password",
      credentials: { email: { type: "email" }, password: { type: "password" } },
      async authorize(raw, request) {
        const parsed = passwordSignInSchema.safeParse(raw);
        if (!parsed.success) throw new InvalidCredentials();
        const { email, password } = parsed.data;
        const ip = clientIp(request.headers);
        const gate = await checkSignInAllowed(email, ip);
        if (!gate.allowed) throw new SignInRateLimited(gate.retryAfterSeconds);

        const user = await findUserForPasswordCheck(email);
        const ok = user?.passwordHash
          ? await verifyPassword(user.passwordHash, password)
          : (await verifyPassword(await (dummyHash ??= hashPassword("no-such-account-padding")), password), false);
        if (!user || !ok) {
          await recordFailedSignIn(email, ip);
          throw new InvalidCredentials();
        }
        await clearFailedSignIns(email);
        return { id: String(user.id), email: user.email, name: user.name };
      },
    }),
    {
      id: EMAIL_PROVIDER_ID,
      type: "email",
      name: "E-mail link",
      maxAge: SIGN_IN_LINK_MAX_AGE_S,
      sendVerificationRequest: queueSignInLinkEmail,
      options: {},
    },
  ],
  callbacks: {
    ...authBaseConfig.callbacks,
    async signIn({ user, account, email }) {
      if (account?.type !== "email") return true;
      // Asking for a link always looks the same (queueSignInLinkEmail skips unknown addresses);
      // using one works for existing accounts only (the adapter refuses to create one anyway).
      if (email?.verificationRequest) return true;
      return !!(user.email && (await findUserByEmail(user.email)));
    },
  },
});
