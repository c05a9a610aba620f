"use client";

// The moves open to the caller, as the detail response lists them: allowed ones as buttons, refused
// ones disabled with the reason and what is missing. A note travels with the move (timeline and
// the client's e-mail). Hold, resume, back and cancel ask for confirmation first. A move that waits
// for something (the approval, the deposit, the setup sheet) links to the tab that settles it.
import Link from "next/link";
import { useId, useState } from "react";
import { Alert } from "@/components/ui/alert";
import { Button, type ButtonVariant } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import { Textarea } from "@/components/ui/input";
import { errorMessage } from "@/lib/http/api-client";
import type { CommissionDetail, TransitionOption } from "@/lib/schemas/commission-out";
import type { MissingGuard } from "@/lib/workflow/machine";
import { commissionPaths } from "./api-paths";
import { useCommissionChange } from "./use-commission-change";

type Action = TransitionOption["action"];

/** Where each missing thing is settled, for the tabs this person may open. */
export type FixLinks = Partial<Record<MissingGuard, { href: string; label: string }>>;

const VARIANT: Record<Action, ButtonVariant> = { advance: "primary", back: "secondary", hold: "secondary", resume: "primary", cancel: "secondary" };

function nextLabel(c: CommissionDetail): string | null {
  const i = c.stages.findIndex((s) => s.key === c.stage);
  return i >= 0 ? (c.stages[i + 1]?.label ?? null) : null;
}

export function moveLabel(t: TransitionOption, c: CommissionDetail): string {
  switch (t.action) {
    case "advance":
      return `Move to ${t.toLabel ?? nextLabel(c) ?? "the next stage"}`;
    case "back":
      return `Back to ${t.toLabel ?? "the previous stage"}`;
    case "hold":
      return "Put on hold";
    case "resume":
      return t.toLabel ? `Resume at ${t.toLabel}` : "Resume";
    case "cancel":
      return "Cancel the commission";
  }
}

function confirmText(t: TransitionOption): string | null {
  switch (t.action) {
    case "advance":
      return null;
    case "back":
      return `Move the commission back to ${t.toLabel}? The move is recorded in the timeline.`;
    case "hold":
      return "Put the commission on hold? Work stops until someone resumes it, and the client is told.";
    case "resume":
      return `Resume work at ${t.toLabel}? The client is told.`;
    case "cancel":
      return "Cancel the commission? This cannot be undone: a cancelled commission never changes stage again. Money already paid is settled under Payments.";
  }
}

export function StageMoves({ slug, commission, fixLinks = {} }: { slug: string; commission: CommissionDetail; fixLinks?: FixLinks }) {
  const noteId = useId();
  const [note, setNote] = useState("");
  const [confirming, setConfirming] = useState<TransitionOption | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const move = useCommissionChange<{ action: Action; note: string }, { to: string; needsOwnerSignoff: boolean }>(slug, ({ action, note }) => ({
    path: commissionPaths(slug).history(commission.id),
    json: { action, ...(note.trim() ? { note: note.trim() } : {}) },
  }));

  const run = (t: TransitionOption) => {
    setDone(null);
    move.mutate(
      { action: t.action, note },
      {
        onSuccess: (r) => {
          setNote("");
          setConfirming(null);
          setDone(r.needsOwnerSignoff ? `${moveLabel(t, commission)}: done. The client is told once the owner signs it off.` : `${moveLabel(t, commission)}: done.`);
        },
        onError: () => setConfirming(null),
      },
    );
  };

  // A move this person may never make is noise; a move forward that waits for something (the
  // approval, the deposit) stays, disabled, with what it is waiting for.
  const moves = commission.transitions.filter((t) => t.allowed || (t.action === "advance" && t.missing.length > 0));
  if (moves.length === 0) return <p className="text-sm text-graphite-600">No stage moves are open to you here.</p>;
  const anyAllowed = moves.some((t) => t.allowed);

  return (
    <div className="space-y-4">
      {anyAllowed ? (
        <div>
          <label htmlFor={noteId} className="mb-1 block text-xs font-semibold uppercase tracking-wider text-graphite-700">
            Note with the move (optional)
          </label>
          <Textarea id={noteId} value={note} maxLength={1000} onChange={(e) => setNote(e.target.value)} placeholder="What was done, what comes next" className="min-h-16" />
          <p className="mt-1 text-xs text-graphite-500">Shown in the timeline and in the client&apos;s e-mail about the move.</p>
        </div>
      ) : null}
      <ul className="flex flex-wrap items-start gap-3">
        {moves.map((t) => (
          <li key={t.action} className={t.action === "advance" ? "basis-full space-y-1" : undefined}>
            <Button
              variant={VARIANT[t.action]}
              size={t.action === "advance" || t.action === "resume" ? "md" : "sm"}
              disabled={!t.allowed}
              busy={move.isPending && move.variables?.action === t.action}
              onClick={() => (confirmText(t) ? setConfirming(t) : run(t))}
            >
              {moveLabel(t, commission)}
            </Button>
            {!t.allowed && t.reason ? (
              <div className="text-xs text-graphite-600">
                {/* The reason lists what is missing after its colon; the list below says it line by line. */}
                <p>{t.missing.length ? `${t.reason.split(":")[0]}.` : t.reason}</p>
                {t.missing.length ? (
                  <ul className="ml-4 list-disc" aria-label="Missing">
                    {t.missing.map((m, i) => {
                      const guard = t.missingGuards[i];
                      const fix = guard ? fixLinks[guard] : undefined;
                      return (
                        <li key={m}>
                          {m}
                          {fix ? (
                            <>
                              {" "}
                              <Link href={fix.href} className="font-semibold text-rosewood-700 underline">
                                {fix.label}
                              </Link>
                            </>
                          ) : null}
                        </li>
                      );
                    })}
                  </ul>
                ) : null}
              </div>
            ) : null}
          </li>
        ))}
      </ul>
      {move.isError ? <Alert tone="error">{errorMessage(move.error)}</Alert> : null}
      {done ? <Alert tone="success">{done}</Alert> : null}
      <Dialog
        open={confirming !== null}
        onClose={() => setConfirming(null)}
        title={confirming ? moveLabel(confirming, commission) : ""}
        footer={
          confirming ? (
            <>
              <Button variant="secondary" onClick={() => setConfirming(null)}>
                Keep it as it is
              </Button>
              <Button variant={confirming.action === "cancel" ? "danger" : "primary"} busy={move.isPending} onClick={() => run(confirming)}>
                {confirming.action === "cancel" ? "Yes, cancel it" : "Yes, go ahead"}
              </Button>
            </>
          ) : null
        }
      >
        <p>{confirming ? confirmText(confirming) : null}</p>
        {note.trim() ? <p className="mt-2 text-graphite-600">With the note: “{note.trim()}”</p> : null}
      </Dialog>
    </div>
  );
}
