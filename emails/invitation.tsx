import { Text } from "@react-email/components";
import { roleLabel, type TemplateProps } from "@/lib/outbox/templates";
import { ActionLink, EmailLayout, styles } from "./layout";

export function InvitationEmail(p: TemplateProps<"invitation">) {
  return (
    <EmailLayout workshopName={p.workshopName} preview={`${p.inviterName} invited you to ${p.workshopName}`}>
      <Text style={styles.text}>
        {p.inviterName} invited you to join <strong>{p.workshopName}</strong> as <strong>{roleLabel(p.role).toLowerCase()}</strong>.
      </Text>
      <ActionLink href={p.acceptUrl} label="Accept the invitation" expiresAt={p.expiresAt} />
    </EmailLayout>
  );
}
