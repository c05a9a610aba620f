"use client";

// The three states every fetched panel has besides its content: loading, empty and failed.
import type { ReactNode } from "react";
import { Button } from "@/components/ui/button";
import { errorMessage } from "@/lib/http/api-client";

export function Loading({ label = "Loading…", rows = 3 }: { label?: string; rows?: number }) {
  return (
    <div role="status" aria-live="polite" className="space-y-2">
      <span className="sr-only">{label}</span>
      {Array.from({ length: rows }, (_, i) => (
        <div key={i} aria-hidden className="h-6 animate-pulse rounded-chip bg-spruce-100" />
      ))}
    </div>
  );
}

export function Empty({ children }: { children: ReactNode }) {
  return <p className="rounded-panel border border-dashed border-spruce-300 px-4 py-6 text-center text-sm text-graphite-600">{children}</p>;
}

export function Failed({ error, retry, what = "This" }: { error: unknown; retry?: () => void; what?: string }) {
  return (
    <div role="alert" className="flex flex-wrap items-center justify-between gap-3 rounded-panel border border-ember-100 bg-ember-50 px-4 py-3 text-sm text-ember-700">
      <span>
        {what} could not be loaded: {errorMessage(error)}
      </span>
      {retry ? (
        <Button variant="secondary" size="sm" onClick={retry}>
          Try again
        </Button>
      ) : null}
    </div>
  );
}

/** A page number past the last page (an old link, or rows removed since): offer the first page. */
export function NoSuchPage({ page, backToFirst }: { page: number; backToFirst: () => void }) {
  return (
    <Empty>
      There is no page {page}.{" "}
      <button type="button" className="font-semibold text-rosewood-700 underline" onClick={backToFirst}>
        Back to the first page
      </button>
    </Empty>
  );
}
