"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { lazySchema } from "@/components/forms/lazy-schema";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Input } from "@/components/ui/input";
import { stageKeyFromLabel } from "@/lib/workflow/stage-template";
import { updateSettingsAction } from "./actions";

type Stage = { key: string; label: string };

const buildStages = lazySchema(() => import("@/lib/schemas/workshop-settings").then((m) => m.buildStagesSchema));

/**
 * The ordered build stages between the deposit and the final setup: add, rename, reorder, remove.
 * A stage keeps its key when renamed; removing one that commissions are in is refused by the server.
 */
export function StageTemplateForm({ slug, stages: saved }: { slug: string; stages: Stage[] }) {
  const router = useRouter();
  const [stages, setStages] = useState<Stage[]>(saved);
  const [newLabel, setNewLabel] = useState("");
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [notice, setNotice] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const [pending, startTransition] = useTransition();

  const set = (next: Stage[]) => {
    setStages(next);
    setErrors({});
    setNotice(null);
  };
  const move = (i: number, by: -1 | 1) => {
    const next = [...stages];
    [next[i], next[i + by]] = [next[i + by]!, next[i]!];
    set(next);
  };
  const add = () => {
    const label = newLabel.trim();
    if (!label) return setErrors({ new: "Name the new stage first." });
    const key = stageKeyFromLabel(label, [...stages, ...saved].map((s) => s.key));
    set([...stages, { key, label }]);
    setNewLabel("");
  };
  const save = () =>
    startTransition(async () => {
      const checked = await buildStages.safeParse(stages);
      if (!checked.success) {
        setErrors(Object.fromEntries(checked.error.issues.map((i) => [`buildStages.${i.path.join(".")}`.replace(/\.$/, ""), i.message])));
        return setNotice({ tone: "error", text: "Some stages need another look." });
      }
      const r = await updateSettingsAction(slug, { buildStages: checked.data });
      if (r.ok) {
        setStages(r.data.buildStages);
        setNotice({ tone: "success", text: "Build stages saved." });
        router.refresh();
      } else {
        setErrors(r.fieldErrors);
        setNotice({ tone: "error", text: r.message });
      }
    });

  return (
    <div className="space-y-4">
      {notice ? <Alert tone={notice.tone}>{notice.text}</Alert> : null}
      <p className="text-xs text-graphite-500">Every commission goes Spec → Deposit → these stages, in this order → Final setup → Delivered.</p>
      <ol className="space-y-2" aria-label="Build stages">
        {stages.map((s, i) => {
          const error = errors[`buildStages.${i}.label`] ?? errors[`buildStages.${i}.key`];
          return (
            <li key={s.key} aria-label={s.label || `Stage ${i + 1}`} className="rounded-chip border border-spruce-200 p-2">
              <div className="flex flex-wrap items-center gap-2">
                <span className="w-6 text-right font-mono text-xs text-graphite-500">{i + 1}.</span>
                <Input
                  aria-label={`Name of stage ${i + 1}`}
                  value={s.label}
                  onChange={(e) => set(stages.map((x, j) => (j === i ? { ...x, label: e.target.value } : x)))}
                  aria-invalid={error ? true : undefined}
                  className="min-w-48 flex-1"
                />
                <Button size="sm" variant="secondary" disabled={i === 0} onClick={() => move(i, -1)} aria-label={`Move ${s.label} up`}>
                  ↑
                </Button>
                <Button size="sm" variant="secondary" disabled={i === stages.length - 1} onClick={() => move(i, 1)} aria-label={`Move ${s.label} down`}>
                  ↓
                </Button>
                <Button size="sm" variant="ghost" onClick={() => set(stages.filter((_, j) => j !== i))} aria-label={`Remove ${s.label}`}>
                  Remove
                </Button>
              </div>
              <p className="ml-8 mt-1 font-mono text-2xs text-graphite-400">{s.key}</p>
              {error ? (
                <p role="alert" className="ml-8 text-xs font-medium text-ember-600">
                  {error}
                </p>
              ) : null}
            </li>
          );
        })}
      </ol>
      {errors.buildStages ? (
        <p role="alert" className="text-xs font-medium text-ember-600">
          {errors.buildStages}
        </p>
      ) : null}
      <div className="flex flex-wrap items-start gap-2">
        <div className="min-w-48 flex-1">
          <Input
            aria-label="New stage name"
            placeholder="e.g. Binding and purfling"
            value={newLabel}
            onChange={(e) => setNewLabel(e.target.value)}
            onKeyDown={(e) => {
              if (e.key === "Enter") {
                e.preventDefault();
                add();
              }
            }}
            aria-invalid={errors.new ? true : undefined}
          />
          {errors.new ? (
            <p role="alert" className="mt-1 text-xs font-medium text-ember-600">
              {errors.new}
            </p>
          ) : null}
        </div>
        <Button variant="secondary" onClick={add}>
          Add stage
        </Button>
      </div>
      <div className="flex gap-2">
        <Button onClick={save} busy={pending}>
          Save build stages
        </Button>
        <Button variant="ghost" onClick={() => set(saved)} disabled={pending}>
          Undo changes
        </Button>
      </div>
    </div>
  );
}
