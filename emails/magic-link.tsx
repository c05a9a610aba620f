import { Text } from "@react-email/components";
import type { TemplateProps } from "@/lib/outbox/templates";
import { ActionLink, EmailLayout, styles } from "./layout";

export function MagicLinkEmail(p: TemplateProps<"magic-link">) {
  return (
    <EmailLayout workshopName={p.workshopName} preview="Your sign-in link">
      <Text style={styles.text}>Use this button to sign in. No password needed.</Text>
      <ActionLink href={p.signInUrl} label="Sign in to Scalewright" expiresAt={p.expiresAt} />
    </EmailLayout>
  );
}
