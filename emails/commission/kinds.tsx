// One e-mail per kind of change a client hears about; each says what happened and what, if
// anything, the client needs to do.
import { Text } from "@react-email/components";
import type { TemplateProps } from "@/lib/outbox/templates";
import { styles } from "../layout";
import { CommissionUpdate } from "./commission-update";

export function SpecReadyEmail(p: TemplateProps<"spec-ready">) {
  return (
    <CommissionUpdate p={p} preview={`Your spec for ${p.commissionTitle} is ready`} action="Review and approve the spec">
      <Text style={styles.text}>
        The workshop has drafted the spec of your instrument. Please check it — scale, strings, woods, finish — and approve it, or leave a
        comment with what should change. Approval locks this version; the build waits for it.
      </Text>
    </CommissionUpdate>
  );
}

export function DepositRequestedEmail(p: TemplateProps<"deposit-requested">) {
  return (
    <CommissionUpdate p={p} preview="Spec approved: the deposit is next" action="Pay the deposit">
      <Text style={styles.text}>Thank you for approving the spec. The next step is the deposit; the build starts once it is paid.</Text>
    </CommissionUpdate>
  );
}

export function BuildStartedEmail(p: TemplateProps<"build-started">) {
  return (
    <CommissionUpdate p={p} preview="Your build has started">
      <Text style={styles.text}>
        Your deposit is in and the build has started with <strong>{p.stageLabel}</strong>. You will hear from us at every stage, with photos on
        the commission page.
      </Text>
    </CommissionUpdate>
  );
}

export function StageProgressEmail(p: TemplateProps<"stage-progress">) {
  return (
    <CommissionUpdate p={p} preview={`Now at: ${p.stageLabel}`} action="See the progress photos">
      <Text style={styles.text}>
        Your instrument has moved to <strong>{p.stageLabel}</strong>.
      </Text>
    </CommissionUpdate>
  );
}

export function FinalSetupEmail(p: TemplateProps<"final-setup">) {
  return (
    <CommissionUpdate p={p} preview="Final setup under way">
      <Text style={styles.text}>
        The build is done and your instrument is in final setup: strings to pitch, action, relief, nut and intonation. The balance falls due
        before delivery.
      </Text>
    </CommissionUpdate>
  );
}

export function DeliveredEmail(p: TemplateProps<"delivered">) {
  return (
    <CommissionUpdate p={p} preview="Your instrument is delivered">
      <Text style={styles.text}>Your instrument is finished and delivered. Thank you for commissioning it.</Text>
      {p.setupSummary.length ? (
        <>
          <Text style={{ ...styles.text, fontWeight: 700 }}>Setup as delivered</Text>
          {p.setupSummary.map((line) => (
            <Text key={line} style={styles.muted}>
              {line}
            </Text>
          ))}
        </>
      ) : null}
      <Text style={styles.muted}>
        New strings can snap while being brought to pitch: wear eye protection and tune up gradually. Use a properly earthed amplifier and
        have mains-powered equipment serviced only by qualified people.
      </Text>
    </CommissionUpdate>
  );
}

export function OnHoldEmail(p: TemplateProps<"on-hold">) {
  return (
    <CommissionUpdate p={p} preview="Your commission is on hold">
      <Text style={styles.text}>Work on your commission is paused for now. We will write again as soon as it resumes.</Text>
    </CommissionUpdate>
  );
}

export function ResumedEmail(p: TemplateProps<"resumed">) {
  return (
    <CommissionUpdate p={p} preview="Work has resumed">
      <Text style={styles.text}>
        Work on your commission has resumed at <strong>{p.stageLabel}</strong>.
      </Text>
    </CommissionUpdate>
  );
}

export function CancelledEmail(p: TemplateProps<"cancelled">) {
  return (
    <CommissionUpdate p={p} preview="Your commission is cancelled">
      <Text style={styles.text}>Your commission has been cancelled. If a deposit was paid, the workshop will contact you about its refund.</Text>
    </CommissionUpdate>
  );
}
