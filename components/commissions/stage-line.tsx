// The workshop's stage line with where this commission stands: done, current, to come. On hold
// and cancelled are side states: the line shows where it was held or stopped.
import type { CommissionDetail } from "@/lib/schemas/commission-out";
import { cx } from "@/lib/ui/cx";

export function StageLine({ commission }: { commission: Pick<CommissionDetail, "stage" | "stageLabel" | "heldFrom" | "stages"> }) {
  const { stages, stage, heldFrom } = commission;
  const side = stage === "on_hold" || stage === "cancelled";
  const at = stages.findIndex((s) => s.key === (side ? heldFrom : stage));
  return (
    <div className="space-y-2">
      {side ? (
        <p className={cx("text-sm font-semibold", stage === "cancelled" ? "text-ember-700" : "text-amber-700")}>
          {commission.stageLabel}
          {heldFrom ? ` (from ${stages.find((s) => s.key === heldFrom)?.label ?? heldFrom})` : ""}
        </p>
      ) : null}
      <ol aria-label="Stage line" className="flex flex-wrap gap-1.5">
        {stages.map((s, i) => {
          const state = at < 0 ? "todo" : i < at ? "done" : i === at ? "current" : "todo";
          return (
            <li
              key={s.key}
              aria-current={state === "current" && !side ? "step" : undefined}
              data-state={state}
              className={cx(
                "rounded-chip border px-2 py-1 text-xs font-semibold",
                state === "done" && "border-moss-100 bg-moss-50 text-moss-700",
                state === "current" && !side && "border-rosewood-700 bg-rosewood-700 text-white",
                state === "current" && side && "border-amber-500 bg-amber-50 text-amber-700",
                state === "todo" && "border-spruce-200 bg-white text-graphite-600",
              )}
            >
              <span className="sr-only">{state === "done" ? "Done: " : state === "current" ? "Now: " : "To come: "}</span>
              {s.label}
            </li>
          );
        })}
      </ol>
    </div>
  );
}
