"use client";

// Loads one of the starting specs (lib/lutherie/presets.ts).
import { useId } from "react";
import { Select } from "@/components/ui/select";
import { PRESETS, type Preset } from "@/lib/lutherie/presets";

export function PresetPicker({ onPick }: { onPick: (p: Preset) => void }) {
  const id = useId();
  return (
    <div className="flex items-center gap-2">
      <label htmlFor={id} className="text-xs font-semibold uppercase tracking-wider text-graphite-700">
        Start from
      </label>
      <Select
        id={id}
        className="w-auto"
        value=""
        onChange={(e) => {
          const p = PRESETS.find((x) => x.id === e.target.value);
          if (p) onPick(p);
        }}
      >
        <option value="">a preset…</option>
        {PRESETS.map((p) => (
          <option key={p.id} value={p.id}>
            {p.label}
          </option>
        ))}
      </Select>
    </div>
  );
}
