// Members and invitations: inputs and the shapes every answer goes through (no password hash can
// reach a response: outputs are parsed with these schemas, which keep only the listed keys).
import { z } from "zod";
import { ROLES } from "@/lib/auth/permissions";
import { emailSchema, newPasswordSchema, personNameSchema } from "./auth";

export const roleSchema = z.enum(ROLES, { error: "Choose owner, builder, bookkeeper or client." });

export { idParamSchema } from "./ids";

export const invitationCreateSchema = z.object({ email: emailSchema, role: roleSchema });
export type InvitationCreateInput = z.input<typeof invitationCreateSchema>;

export const roleChangeSchema = z.object({ role: roleSchema });

export const invitationAcceptSchema = z.object({ token: z.string().min(20).max(200) });

/** Accepting without an account: a name, and a password only if the person wants one. */
export const invitationSignUpSchema = z.object({
  token: z.string().min(20).max(200),
  name: personNameSchema,
  password: z
    .union([z.literal(""), newPasswordSchema])
    .optional()
    .transform((v) => v || undefined),
});

export const memberOutSchema = z.object({
  id: z.number(),
  userId: z.number(),
  name: z.string(),
  email: z.string(),
  role: roleSchema,
  joinedAt: z.string(),
});
export type MemberOut = z.infer<typeof memberOutSchema>;

export const memberNameOutSchema = z.object({ name: z.string() });

export const INVITATION_STATES = ["pending", "accepted", "revoked", "expired"] as const;

export const invitationOutSchema = z.object({
  id: z.number(),
  email: z.string(),
  role: roleSchema,
  state: z.enum(INVITATION_STATES),
  invitedBy: z.string().nullable(),
  expiresAt: z.string(),
  createdAt: z.string(),
});
export type InvitationOut = z.infer<typeof invitationOutSchema>;

export const meOutSchema = z.object({
  user: z.object({ id: z.number(), email: z.string(), name: z.string() }),
  memberships: z.array(z.object({ workshop: z.object({ slug: z.string(), name: z.string() }), role: roleSchema })),
});
export type MeOut = z.infer<typeof meOutSchema>;
