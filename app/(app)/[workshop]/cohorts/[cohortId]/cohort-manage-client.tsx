"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import { Field } from "@/components/ui/field";
import { Select } from "@/components/ui/select";
import { useToast } from "@/components/ui/toast";
import { assignCohortAction, deleteCohortAction } from "../actions";

/** The owner puts an open commission into this cohort (one that is in another cohort moves here). */
export function AddCommission({ slug, cohortId, options }: { slug: string; cohortId: number; options: Array<{ id: number; number: string; title: string; cohortName: string | null }> }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [chosen, setChosen] = useState("");
  const [error, setError] = useState<string | null>(null);
  if (options.length === 0) return <p className="px-2 text-sm text-graphite-500">Every open commission is in this cohort already.</p>;
  const add = () =>
    startTransition(async () => {
      setError(null);
      if (!chosen) return setError("Choose a commission first.");
      const r = await assignCohortAction(slug, { commissionId: Number(chosen), cohortId });
      if (r.ok) setChosen("");
      else setError(r.message);
      router.refresh();
    });
  return (
    <div className="flex flex-wrap items-end gap-2 px-2">
      <Field id="cohort-add-commission" label="Add a commission" error={error ?? undefined} className="min-w-64 flex-1">
        <Select id="cohort-add-commission" value={chosen} onChange={(e) => setChosen(e.target.value)} aria-invalid={error ? true : undefined}>
          <option value="">Choose an open commission…</option>
          {options.map((o) => (
            <option key={o.id} value={o.id}>
              {o.number} · {o.title}
              {o.cohortName ? ` (now in ${o.cohortName})` : ""}
            </option>
          ))}
        </Select>
      </Field>
      <Button onClick={add} busy={pending} className="mb-5">
        Add to the cohort
      </Button>
    </div>
  );
}

export function RemoveCommission({ slug, commission }: { slug: string; commission: { id: number; number: string } }) {
  const router = useRouter();
  const toast = useToast();
  const [pending, startTransition] = useTransition();
  const remove = () =>
    startTransition(async () => {
      const r = await assignCohortAction(slug, { commissionId: commission.id, cohortId: null });
      toast.show(r.ok ? `${commission.number} is no longer in this cohort.` : r.message, r.ok ? "success" : "error");
      router.refresh();
    });
  return (
    <Button variant="ghost" size="sm" busy={pending} onClick={remove} aria-label={`Take ${commission.number} out of the cohort`}>
      Take out
    </Button>
  );
}

export function DeleteCohort({ slug, cohort }: { slug: string; cohort: { id: number; name: string; commissions: number } }) {
  const router = useRouter();
  const [open, setOpen] = useState(false);
  const [pending, startTransition] = useTransition();
  const [error, setError] = useState<string | null>(null);
  const remove = () =>
    startTransition(async () => {
      const r = await deleteCohortAction(slug, { cohortId: cohort.id });
      if (r.ok) router.push(`/${slug}/cohorts`);
      else {
        setOpen(false);
        setError(r.message);
      }
    });
  return (
    <div className="space-y-3">
      {error ? <Alert tone="error">{error}</Alert> : null}
      <Button variant="danger" onClick={() => setOpen(true)}>
        Remove {cohort.name}
      </Button>
      <Dialog
        open={open}
        onClose={() => setOpen(false)}
        title="Remove this cohort?"
        footer={
          <>
            <Button variant="secondary" onClick={() => setOpen(false)}>
              Keep it
            </Button>
            <Button variant="danger" busy={pending} onClick={remove}>
              Remove the cohort
            </Button>
          </>
        }
      >
        <p>
          {cohort.name} is removed. {cohort.commissions ? `Its ${cohort.commissions} commission${cohort.commissions === 1 ? "" : "s"} stay, without a cohort.` : ""}
        </p>
      </Dialog>
    </div>
  );
}
