// The e-mails the product sends: each template's props (validated when it is enqueued) and its
// subject line. The React component of each lives in emails/ (emails/render.tsx maps the names).
// To add an e-mail: a schema + subject here, a component in emails/, one line in emails/render.tsx.
import { z } from "zod";
import { ROLE_LABELS, ROLES } from "@/lib/auth/permissions";

const url = z.url({ protocol: /^https?$/ });
const isoTime = z.iso.datetime();

export const EMAIL_TEMPLATES = {
  invitation: {
    props: z.object({
      workshopName: z.string(),
      inviterName: z.string(),
      role: z.enum(ROLES),
      acceptUrl: url,
      expiresAt: isoTime,
    }),
    subject: (p: { workshopName: string; inviterName: string }) => `${p.inviterName} invited you to ${p.workshopName} on Scalewright`,
  },
  "magic-link": {
    props: z.object({ signInUrl: url, expiresAt: isoTime, workshopName: z.string().optional() }),
    subject: () => "Your Scalewright sign-in link",
  },
  "password-reset": {
    props: z.object({ resetUrl: url, expiresAt: isoTime, name: z.string() }),
    subject: () => "Reset your Scalewright password",
  },
} as const;

export type TemplateName = keyof typeof EMAIL_TEMPLATES;
export type TemplateProps<T extends TemplateName> = z.infer<(typeof EMAIL_TEMPLATES)[T]["props"]>;

export const TEMPLATE_NAMES = Object.keys(EMAIL_TEMPLATES) as TemplateName[];

/** Validates props for a template (throws a ZodError when a caller passes the wrong shape). */
export function parseTemplateProps<T extends TemplateName>(template: T, props: unknown): TemplateProps<T> {
  return EMAIL_TEMPLATES[template].props.parse(props) as TemplateProps<T>;
}

export function subjectFor<T extends TemplateName>(template: T, props: TemplateProps<T>): string {
  return (EMAIL_TEMPLATES[template].subject as (p: TemplateProps<T>) => string)(props);
}

export function roleLabel(role: (typeof ROLES)[number]): string {
  return ROLE_LABELS[role];
}
