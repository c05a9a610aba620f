"use client";

// Signing a locked revision off (the owner, when the workshop asks for it) and reopening a signed
// sheet as a new revision, with the reason.
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Field, describedBy } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import type { SetupSheetView } from "@/lib/schemas/setup-sheet-out";
import { reopenSetupSheetAction, signSetupSheetAction } from "./actions";

export function SignOffForm({ slug, view }: { slug: string; view: SetupSheetView }) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [note, setNote] = useState("");
  const [noteError, setNoteError] = useState<string | undefined>();
  const [notice, setNotice] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const revision = view.sheet?.revision;
  const commissionId = view.commission.id;

  async function sign() {
    if (!revision) return;
    setBusy(true);
    const r = await signSetupSheetAction(slug, { commissionId, revision });
    setBusy(false);
    setNotice(r.ok ? { tone: "success", text: `Revision ${revision} is signed off.` } : { tone: "error", text: r.message });
    if (r.ok) router.refresh();
  }

  async function reopen(e: React.FormEvent) {
    e.preventDefault();
    setBusy(true);
    const r = await reopenSetupSheetAction(slug, { commissionId, note });
    setBusy(false);
    if (r.ok) {
      setNotice({ tone: "success", text: `Revision ${r.data.sheet?.revision} is open for changes.` });
      setNote("");
      setNoteError(undefined);
      router.refresh();
    } else {
      setNoteError(r.fieldErrors.note);
      if (!r.fieldErrors.note) setNotice({ tone: "error", text: r.message });
    }
  }

  return (
    <div className="space-y-4">
      {notice ? <Alert tone={notice.tone}>{notice.text}</Alert> : null}
      {view.can.sign && view.sheet?.status === "awaiting_owner" ? (
        <div className="space-y-2">
          <p className="text-sm">The builder has signed revision {revision}. The workshop asks for the owner&apos;s sign-off before delivery.</p>
          <Button onClick={sign} busy={busy}>
            Sign off revision {revision}
          </Button>
        </div>
      ) : null}
      {view.can.reopen ? (
        <form onSubmit={reopen} noValidate className="flex flex-wrap items-end gap-3" aria-label="Reopen the setup sheet">
          <Field id="reopen-note" label="Reason to reopen" error={noteError} className="min-w-64 flex-1">
            <Input id="reopen-note" value={note} onChange={(e) => setNote(e.target.value)} {...describedBy("reopen-note", noteError)} placeholder="e.g. relief moved after the neck settled" />
          </Field>
          <Button type="submit" variant="secondary" busy={busy}>
            Reopen as revision {(revision ?? 0) + 1}
          </Button>
        </form>
      ) : null}
    </div>
  );
}
