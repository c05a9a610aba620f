"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import type { RemovePhotoAction } from "./stage-photos";

/** Remove one photo after a confirmation; the server records who removed it. */
export function RemovePhotoButton({ slug, commissionId, photoId, caption, action }: { slug: string; commissionId: number; photoId: number; caption: string; action: RemovePhotoAction }) {
  const router = useRouter();
  const [open, setOpen] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [pending, startTransition] = useTransition();

  const remove = () =>
    startTransition(async () => {
      setError(null);
      const r = await action(slug, { commissionId, photoId });
      if (r.ok) {
        setOpen(false);
        router.refresh();
      } else setError(r.message);
    });

  return (
    <>
      <Button variant="ghost" size="sm" onClick={() => setOpen(true)} aria-label={`Remove photo: ${caption}`}>
        Remove
      </Button>
      <Dialog
        open={open}
        onClose={() => setOpen(false)}
        title="Remove this photo?"
        footer={
          <>
            <Button variant="secondary" onClick={() => setOpen(false)}>
              Keep it
            </Button>
            <Button variant="danger" onClick={remove} busy={pending}>
              Remove photo
            </Button>
          </>
        }
      >
        <p>“{caption}” disappears from the gallery for everyone, the client included, and its files are deleted. The removal is recorded.</p>
        {error ? <Alert tone="error" className="mt-3">{error}</Alert> : null}
      </Dialog>
    </>
  );
}
