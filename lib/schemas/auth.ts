// One schema per form and API body of sign-in, sign-up, reset and account changes; shared by the
// client forms (zodResolver), the server actions and the Auth.js credentials provider.
import { z } from "zod";
import { PASSWORD_MAX, PASSWORD_MIN } from "./auth-values";

export { PASSWORD_MAX, PASSWORD_MIN } from "./auth-values";

/** An e-mail address, trimmed and lower-cased so lookups and rate limits match however it was typed. */
export const emailSchema = z
  .string({ error: "Enter your e-mail address." })
  .trim()
  .min(1, "Enter your e-mail address.")
  .max(254, "That address is too long.")
  .pipe(z.email({ error: "Enter a valid e-mail address, like name@example.com." }))
  .transform((e) => e.toLowerCase());

export const newPasswordSchema = z
  .string({ error: "Choose a password." })
  .min(PASSWORD_MIN, `Use at least ${PASSWORD_MIN} characters.`)
  .max(PASSWORD_MAX, `Use at most ${PASSWORD_MAX} characters.`);

export const personNameSchema = z
  .string({ error: "Enter your name." })
  .trim()
  .min(1, "Enter your name.")
  .max(120, "Use at most 120 characters.");

export const passwordSignInSchema = z.object({
  email: emailSchema,
  password: z.string({ error: "Enter your password." }).min(1, "Enter your password.").max(PASSWORD_MAX),
});
export type PasswordSignInInput = z.input<typeof passwordSignInSchema>;

export const magicLinkSchema = z.object({ email: emailSchema });

export const signUpSchema = z.object({ name: personNameSchema, email: emailSchema, password: newPasswordSchema });
export type SignUpInput = z.input<typeof signUpSchema>;

export const resetRequestSchema = z.object({ email: emailSchema });

export const resetPasswordSchema = z
  .object({ token: z.string().min(20).max(200), password: newPasswordSchema, confirm: z.string() })
  .refine((v) => v.password === v.confirm, { path: ["confirm"], message: "The two passwords differ." });

export const accountNameSchema = z.object({ name: personNameSchema });

export const changePasswordSchema = z
  .object({
    // Empty when the account has no password yet (magic-link only).
    current: z.string().max(PASSWORD_MAX).default(""),
    password: newPasswordSchema,
    confirm: z.string(),
  })
  .refine((v) => v.password === v.confirm, { path: ["confirm"], message: "The two passwords differ." });

/** A same-site path to return to after signing in; anything else falls back to the workshop list. */
export const callbackPathSchema = z
  .string()
  .optional()
  .transform((v) => (v && v.startsWith("/") && !v.startsWith("//") && !v.startsWith("/\\") ? v : "/workshops"));
