"use client";

// The buttons and note forms of a month's reconciliation. Each posts to the books routes and then
// refreshes the page (a server component) so every part shows the new state.
import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { booksPaths } from "@/components/books/api-paths";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Field, describedBy } from "@/components/ui/field";
import { Textarea } from "@/components/ui/input";
import { apiFetch, ApiError, errorMessage } from "@/lib/http/api-client";

function useApiAction() {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<{ message: string; field?: string } | null>(null);
  const run = async (path: string, json: unknown) => {
    setBusy(true);
    setError(null);
    try {
      await apiFetch(path, { method: "POST", json });
      router.refresh();
      return true;
    } catch (err) {
      const field = err instanceof ApiError ? err.issues.find((i) => i.path)?.message : undefined;
      setError({ message: errorMessage(err), field });
      return false;
    } finally {
      setBusy(false);
    }
  };
  return { busy, error, run };
}

export function RunButton({ slug, month, again }: { slug: string; month: string; again: boolean }) {
  const { busy, error, run } = useApiAction();
  return (
    <div className="space-y-2">
      <Button onClick={() => run(booksPaths(slug).run(month), {})} busy={busy}>
        {again ? "Compare again with the processor" : "Compare with the processor"}
      </Button>
      {error ? <Alert tone="error">{error.message}</Alert> : null}
    </div>
  );
}

/** A note form: resolve an exception, review a change after locking, or lock the month. */
export function NoteForm({ id, path, label, action, required, hint }: { id: string; path: string; label: string; action: string; required: boolean; hint?: string }) {
  const { busy, error, run } = useApiAction();
  const [note, setNote] = useState("");
  const submit = async (e: FormEvent) => {
    e.preventDefault();
    if (await run(path, required || note.trim() ? { note } : {})) setNote("");
  };
  return (
    <form onSubmit={submit} className="space-y-2" aria-label={action}>
      <Field id={id} label={label} hint={hint} error={error?.field}>
        <Textarea id={id} value={note} onChange={(e) => setNote(e.target.value)} maxLength={1000} required={required} className="min-h-16" {...describedBy(id, error?.field)} />
      </Field>
      <Button type="submit" size="sm" busy={busy}>
        {action}
      </Button>
      {error && !error.field ? <Alert tone="error">{error.message}</Alert> : null}
    </form>
  );
}
