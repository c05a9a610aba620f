"use client";

// mm / in toggle: two pressed-state buttons in a labelled group.
import type { LengthUnit } from "@/lib/lutherie/units";
import { cx } from "@/lib/ui/cx";

export function UnitSwitch({ value, onChange }: { value: LengthUnit; onChange: (u: LengthUnit) => void }) {
  return (
    <div role="group" aria-label="Length unit" className="inline-flex rounded-chip border border-spruce-300 bg-white p-0.5">
      {(["mm", "in"] as const).map((u) => (
        <button
          key={u}
          type="button"
          aria-pressed={value === u}
          onClick={() => value !== u && onChange(u)}
          className={cx("rounded-chip px-3 py-1 text-sm font-semibold", value === u ? "bg-rosewood-700 text-white" : "text-graphite-700 hover:bg-spruce-100")}
        >
          {u === "mm" ? "Millimetres" : "Inches"}
        </button>
      ))}
    </div>
  );
}
