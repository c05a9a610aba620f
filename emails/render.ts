// Renders an outbox message to HTML and plain text. Used by the outbox worker (plain Node, outside
// Next's bundle) and by tests; the app itself never renders e-mail.
import { render, toPlainText } from "@react-email/render";
import { createElement, type FunctionComponent, type ReactElement } from "react";
import { parseTemplateProps, type TemplateName, type TemplateProps } from "@/lib/outbox/templates";
import {
  BuildStartedEmail,
  CancelledEmail,
  DeliveredEmail,
  DepositRequestedEmail,
  FinalSetupEmail,
  OnHoldEmail,
  ResumedEmail,
  SpecReadyEmail,
  StageProgressEmail,
} from "./commission/kinds";
import { InvitationEmail } from "./invitation";
import { MagicLinkEmail } from "./magic-link";
import { PasswordResetEmail } from "./password-reset";
import { PaymentReceiptEmail } from "./payment-receipt";

const COMPONENTS: { [T in TemplateName]: (props: TemplateProps<T>) => ReactElement } = {
  invitation: InvitationEmail,
  "magic-link": MagicLinkEmail,
  "password-reset": PasswordResetEmail,
  "spec-ready": SpecReadyEmail,
  "deposit-requested": DepositRequestedEmail,
  "build-started": BuildStartedEmail,
  "stage-progress": StageProgressEmail,
  "final-setup": FinalSetupEmail,
  delivered: DeliveredEmail,
  "on-hold": OnHoldEmail,
  resumed: ResumedEmail,
  cancelled: CancelledEmail,
  "payment-receipt": PaymentReceiptEmail,
};

export async function renderEmail<T extends TemplateName>(template: T, rawProps: unknown): Promise<{ html: string; text: string }> {
  const Component = COMPONENTS[template] as FunctionComponent<object> | undefined;
  if (!Component) throw new Error(`unknown e-mail template ${template}`);
  const props = parseTemplateProps(template, rawProps) as object;
  const html = await render(createElement(Component, props));
  return { html, text: toPlainText(html) };
}
