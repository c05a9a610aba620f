import { Resend } from "resend";

/**
 * The Resend SDK client. RESEND_BASE_URL points it at fakes/resend locally (the SDK reads it
 * itself; it is passed explicitly so the value in use is obvious).
 */
export function resendClient(env: Record<string, string | undefined> = process.env): Resend {
  return new Resend(env.RESEND_API_KEY, env.RESEND_BASE_URL ? { baseUrl: env.RESEND_BASE_URL } : undefined);
}

export function mailFrom(env: Record<string, string | undefined> = process.env): string {
  return env.MAIL_FROM ?? "Scalewright <no-reply@scalewright.example.com>";
}
