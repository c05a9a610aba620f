// A cohort's commissions as one bar split by stage, delivered last, with the share delivered.
import type { CohortOut } from "@/lib/schemas/cohort";
import { stageColor } from "./stage-colors";

/** `stageKeys`: the workshop's open stages in order, so a stage has the same colour in every chart. */
export function CohortProgressBar({ progress, stageKeys }: { progress: CohortOut["progress"]; stageKeys: readonly string[] }) {
  const counted = progress.total - progress.cancelled;
  const pct = progress.shareDelivered === null ? null : Math.round(progress.shareDelivered * 100);
  const parts = progress.byStage.filter((s) => s.stage !== "cancelled");
  return (
    <div className="space-y-1">
      <div
        className="flex h-3 overflow-hidden rounded-chip bg-spruce-100"
        role="img"
        aria-label={counted === 0 ? "No commissions yet" : `${parts.map((s) => `${s.label} ${s.n}`).join(", ")}; ${pct} % delivered`}
      >
        {parts.map((s) => (
          <span key={s.stage} style={{ width: `${(100 * s.n) / counted}%`, background: stageColor(stageKeys.indexOf(s.stage), s.stage) }} title={`${s.label}: ${s.n}`} />
        ))}
      </div>
      <p className="text-xs text-graphite-600">
        {counted === 0 ? "No commissions yet" : `${progress.delivered} of ${counted} delivered (${pct} %)`}
        {progress.overdue ? <span className="ml-2 font-semibold text-ember-600">{progress.overdue} overdue</span> : null}
        {progress.cancelled ? <span className="ml-2 text-graphite-500">{progress.cancelled} cancelled</span> : null}
      </p>
    </div>
  );
}
