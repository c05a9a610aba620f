import { Text } from "@react-email/components";
import type { TemplateProps } from "@/lib/outbox/templates";
import { ActionLink, EmailLayout, styles } from "./layout";

export function PasswordResetEmail(p: TemplateProps<"password-reset">) {
  return (
    <EmailLayout preview="Reset your password">
      <Text style={styles.text}>Hello {p.name},</Text>
      <Text style={styles.text}>Someone asked to reset the password of your Scalewright account. Choose a new one here:</Text>
      <ActionLink href={p.resetUrl} label="Choose a new password" expiresAt={p.expiresAt} note="Choosing a new password signs you out everywhere else." />
    </EmailLayout>
  );
}
