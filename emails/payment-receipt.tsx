import { Button, Text } from "@react-email/components";
import type { TemplateProps } from "@/lib/outbox/templates";
import { EmailLayout, styles } from "./layout";

/** Sent once when the processor confirms a card payment of a deposit or a balance. */
export function PaymentReceiptEmail(p: TemplateProps<"payment-receipt">) {
  const row = (label: string, value: string) => (
    <Text style={{ ...styles.text, margin: "0 0 6px" }}>
      <span style={{ color: "#626b70", display: "inline-block", minWidth: "120px" }}>{label}</span> {value}
    </Text>
  );
  return (
    <EmailLayout workshopName={p.workshopName} preview={`Receipt for your ${p.invoiceLabel}: ${p.amount}`}>
      <Text style={styles.text}>Hello {p.clientName},</Text>
      <Text style={styles.text}>
        Thank you: we have received your {p.invoiceLabel} of <strong>{p.amount}</strong> for commission {p.commissionNumber}, {p.commissionTitle}.
      </Text>
      {row("Amount", p.amount)}
      {row("For", `${p.invoiceLabel[0]!.toUpperCase()}${p.invoiceLabel.slice(1)}, commission ${p.commissionNumber}`)}
      {row("Paid", `${new Date(p.paidAt).toUTCString()}`)}
      {row("Method", p.method)}
      {row("Reference", p.reference)}
      <Text style={{ ...styles.text, marginTop: "16px" }}>
        <Button href={p.paymentsUrl} style={styles.button}>
          See your payments
        </Button>
      </Text>
      <Text style={styles.muted}>
        Keep this e-mail as your receipt. Or open <span style={styles.link}>{p.paymentsUrl}</span>
      </Text>
    </EmailLayout>
  );
}
