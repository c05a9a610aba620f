import { Body, Button, Container, Head, Hr, Html, Link, Preview, Section, Text } from "@react-email/components";
import type { ReactNode } from "react";

// Inline styles only: mail clients ignore style sheets. Colours are the app's palette
// (rosewood for the masthead, graphite ink on spruce paper).
const colours = { rosewood: "#712e28", paper: "#fbf8f1", ink: "#1c1f21", muted: "#626b70", rule: "#ebe0c4" };

export const styles = {
  text: { color: colours.ink, fontSize: "15px", lineHeight: "23px", margin: "0 0 14px" },
  muted: { color: colours.muted, fontSize: "13px", lineHeight: "19px", margin: "0 0 10px" },
  button: {
    backgroundColor: colours.rosewood,
    borderRadius: "5px",
    color: "#ffffff",
    display: "inline-block",
    fontSize: "15px",
    fontWeight: 600,
    padding: "12px 20px",
    textDecoration: "none",
  },
  link: { color: colours.rosewood, wordBreak: "break-all" as const },
};

/** The frame of every e-mail: the workshop's name on the masthead (or the product's), then the body. */
export function EmailLayout({ workshopName, preview, children }: { workshopName?: string; preview: string; children: ReactNode }) {
  return (
    <Html lang="en">
      <Head />
      <Preview>{preview}</Preview>
      <Body style={{ backgroundColor: colours.paper, fontFamily: "Helvetica, Arial, sans-serif", margin: 0, padding: "24px 0" }}>
        <Container style={{ backgroundColor: "#ffffff", border: `1px solid ${colours.rule}`, borderRadius: "8px", maxWidth: "560px" }}>
          <Section style={{ backgroundColor: colours.rosewood, borderRadius: "8px 8px 0 0", padding: "18px 24px" }}>
            <Text style={{ color: "#ffffff", fontSize: "18px", fontWeight: 700, margin: 0 }}>{workshopName ?? "Scalewright"}</Text>
            {workshopName ? <Text style={{ color: "#f5e2dd", fontSize: "12px", margin: "2px 0 0" }}>on Scalewright</Text> : null}
          </Section>
          <Section style={{ padding: "24px" }}>{children}</Section>
          <Hr style={{ borderColor: colours.rule, margin: 0 }} />
          <Section style={{ padding: "14px 24px" }}>
            <Text style={styles.muted}>
              You receive this because someone used this address on Scalewright. If it was not you, ignore this e-mail: nothing
              happens until the link is used.
            </Text>
          </Section>
        </Container>
      </Body>
    </Html>
  );
}

/** The call to action: a button, then when the link stops working and the address in full. */
export function ActionLink({ href, label, expiresAt, note }: { href: string; label: string; expiresAt: string; note?: string }) {
  return (
    <>
      <Text style={styles.text}>
        <Button href={href} style={styles.button}>
          {label}
        </Button>
      </Text>
      <Text style={styles.muted}>
        The link works once and until {new Date(expiresAt).toUTCString()}.{note ? ` ${note}` : ""} If the button does not work, open this
        address:{" "}
        <Link href={href} style={styles.link}>
          {href}
        </Link>
      </Text>
    </>
  );
}
