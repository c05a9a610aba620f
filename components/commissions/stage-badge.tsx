// A commission's stage as a badge; side states and the ends of the line get their own tone.
import { Badge, type BadgeTone } from "@/components/ui/badge";

const TONES: Record<string, BadgeTone> = { spec: "accent", deposit: "accent", delivered: "success", on_hold: "warning", cancelled: "danger" };

export function StageBadge({ stage, label }: { stage: string; label: string }) {
  return (
    <Badge tone={TONES[stage] ?? "primary"} data-stage={stage}>
      {label}
    </Badge>
  );
}
