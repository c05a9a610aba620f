import { Button, Link, Text } from "@react-email/components";
import type { ReactNode } from "react";
import { EmailLayout, styles } from "../layout";

export interface CommissionUpdateProps {
  workshopName: string;
  clientName: string;
  commissionNumber: string;
  commissionTitle: string;
  stageLabel: string;
  note?: string;
  commissionUrl: string;
}

/** The shared body of the e-mails that tell a client where their commission stands. */
export function CommissionUpdate({ p, preview, children, action = "Open your commission" }: { p: CommissionUpdateProps; preview: string; children: ReactNode; action?: string }) {
  return (
    <EmailLayout workshopName={p.workshopName} preview={preview}>
      <Text style={styles.text}>Hello {p.clientName},</Text>
      {children}
      {p.note ? (
        <Text style={{ ...styles.text, borderLeft: "3px solid #ebe0c4", paddingLeft: "12px", fontStyle: "italic" }}>{p.note}</Text>
      ) : null}
      <Text style={styles.muted}>
        {p.commissionNumber} · {p.commissionTitle} · now: {p.stageLabel}
      </Text>
      <Text style={styles.text}>
        <Button href={p.commissionUrl} style={styles.button}>
          {action}
        </Button>
      </Text>
      <Text style={styles.muted}>
        Or open <span style={styles.link}>{p.commissionUrl}</span>
      </Text>
      <Text style={styles.muted}>
        Photos of each stage:{" "}
        <Link href={`${p.commissionUrl}/photos`} style={styles.link}>
          {`${p.commissionUrl}/photos`}
        </Link>
      </Text>
    </EmailLayout>
  );
}
