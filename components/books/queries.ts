"use client";

// Read hooks of the books screens, on TanStack Query over the books routes.
import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { apiFetch } from "@/lib/http/api-client";
import type { LedgerPage } from "@/lib/schemas/books";
import { booksPaths } from "./api-paths";

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
