"use client";

import { useState } from "react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import type { InvoiceKind } from "@/lib/money/invoices";
import { payInvoiceAction } from "./actions";

/** Opens the processor's hosted payment page for one invoice; a processor outage is said plainly, with a retry. */
export function PayButton({ slug, commissionId, kind, label }: { slug: string; commissionId: number; kind: InvoiceKind; label: string }) {
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<{ message: string; retry: boolean } | null>(null);

  async function pay() {
    setBusy(true);
    setError(null);
    const r = await payInvoiceAction(slug, { commissionId, kind });
    if (r.ok) {
      window.location.assign(r.data.url);
      return;
    }
    setBusy(false);
    setError({ message: r.message, retry: r.code === "unavailable" });
  }

  return (
    <div className="flex flex-col items-start gap-2">
      <Button onClick={pay} busy={busy}>
        {label}
      </Button>
      {error ? (
        <Alert tone="error" className="max-w-xs text-left">
          <p>{error.message}</p>
          {error.retry ? (
            <Button variant="secondary" size="sm" className="mt-2" onClick={pay} disabled={busy}>
              Try again
            </Button>
          ) : null}
        </Alert>
      ) : null}
    </div>
  );
}
