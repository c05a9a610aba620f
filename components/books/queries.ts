"use client";

// Read hooks of the books screens, on TanStack Query over the books routes.
import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { apiFetch } from "@/lib/http/api-client";
import type { LedgerPage } from "@/lib/schemas/books";

export const booksPaths = (slug: string) => {
  const root = `/api/workshops/${encodeURIComponent(slug)}/books`;
  return {
    ledger: (query: string) => `${root}/ledger${query ? `?${query}` : ""}`,
    ledgerExport: (query: string) => `${root}/ledger/export${query ? `?${query}` : ""}`,
    ledgerOptions: `${root}/ledger/options`,
    period: (month: string) => `${root}/reconciliation/${month}`,
    run: (month: string) => `${root}/reconciliation/${month}/run`,
    lock: (month: string) => `${root}/reconciliation/${month}/lock`,
    resolve: (month: string, id: number) => `${root}/reconciliation/${month}/exceptions/${id}/resolve`,
    review: (month: string, id: number) => `${root}/reconciliation/${month}/changes/${id}/review`,
    periodExport: (month: string) => `${root}/reconciliation/${month}/export`,
  };
};

export interface LedgerOptions {
  firstMonth: string | null;
  lastMonth: string | null;
  clients: Array<{ id: number; name: string }>;
  commissions: Array<{ id: number; number: string; title: string }>;
}

export function useLedger(slug: string, query: string) {
  return useQuery({
    queryKey: ["books", slug, "ledger", query],
    queryFn: ({ signal }) => apiFetch<LedgerPage>(booksPaths(slug).ledger(query), { signal }),
    placeholderData: keepPreviousData,
  });
}

export function useLedgerOptions(slug: string) {
  return useQuery({
    queryKey: ["books", slug, "ledger-options"],
    queryFn: ({ signal }) => apiFetch<LedgerOptions>(booksPaths(slug).ledgerOptions, { signal }),
    staleTime: 60_000,
  });
}
