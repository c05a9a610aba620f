// GET/POST /api/auth/* – Auth.js: csrf, session, sign-in callbacks (credentials, e-mail link), sign-out.
import { handlers } from "@/lib/auth/auth";

export const { GET, POST } = handlers;
