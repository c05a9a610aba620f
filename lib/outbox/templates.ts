// The e-mails the product sends: each template's props (validated when it is enqueued) and its
// subject line. The React component of each lives in emails/ (emails/render.tsx maps the names).
// To add an e-mail: a schema + subject here, a component in emails/, one line in emails/render.tsx.
import { z } from "zod";
import { ROLE_LABELS, ROLES } from "@/lib/auth/permissions";

const url = z.url({ protocol: /^https?$/ });
const isoTime = z.iso.datetime();

/** What every commission e-mail to a client carries. */
const commissionUpdate = z.object({
  workshopName: z.string(),
  clientName: z.string(),
  commissionNumber: z.string(),
  commissionTitle: z.string(),
  stageLabel: z.string(),
  note: z.string().optional(),
  commissionUrl: url,
});
type CommissionUpdate = z.infer<typeof commissionUpdate>;
const about = (p: CommissionUpdate) => `${p.commissionNumber} ${p.commissionTitle}`;

export const EMAIL_TEMPLATES = {
  "spec-ready": { props: commissionUpdate, subject: (p: CommissionUpdate) => `Your spec is ready to approve: ${about(p)}` },
  "deposit-requested": { props: commissionUpdate, subject: (p: CommissionUpdate) => `Spec approved, deposit due: ${about(p)}` },
  "build-started": { props: commissionUpdate, subject: (p: CommissionUpdate) => `Your build has started: ${about(p)}` },
  "stage-progress": { props: commissionUpdate, subject: (p: CommissionUpdate) => `${p.stageLabel}: ${about(p)}` },
  "final-setup": { props: commissionUpdate, subject: (p: CommissionUpdate) => `Final setup under way: ${about(p)}` },
  delivered: { props: commissionUpdate.extend({ setupSummary: z.array(z.string()).default([]) }), subject: (p: CommissionUpdate) => `Delivered: ${about(p)}` },
  "on-hold": { props: commissionUpdate, subject: (p: CommissionUpdate) => `On hold: ${about(p)}` },
  resumed: { props: commissionUpdate, subject: (p: CommissionUpdate) => `Work resumed: ${about(p)}` },
  cancelled: { props: commissionUpdate, subject: (p: CommissionUpdate) => `Cancelled: ${about(p)}` },
  "payment-receipt": {
    props: z.object({
      workshopName: z.string(),
      clientName: z.string(),
      commissionNumber: z.string(),
      commissionTitle: z.string(),
      /** "deposit" or "balance". */
      invoiceLabel: z.string(),
      /** Already formatted in the payment's currency ("€900.00"). */
      amount: z.string(),
      paidAt: isoTime,
      method: z.string(),
      /** The processor's reference for the payment. */
      reference: z.string(),
      paymentsUrl: url,
    }),
    subject: (p: { invoiceLabel: string; amount: string; commissionNumber: string; commissionTitle: string }) =>
      `Receipt: ${p.invoiceLabel} of ${p.amount} for ${p.commissionNumber} ${p.commissionTitle}`,
  },
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
