"use client";

// A write to one commission (move, sign-off, edit, comment, spec) and the refresh after it: every
// cached view of this workshop's commissions is marked stale, so lists, board and header follow.
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiFetch } from "@/lib/http/api-client";
import { commissionKeys } from "./api-paths";

export function useCommissionChange<TInput, TResult = unknown>(slug: string, request: (input: TInput) => { path: string; method?: string; json?: unknown }) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: TInput) => {
      const r = request(input);
      return apiFetch<TResult>(r.path, { method: r.method ?? "POST", json: r.json ?? {} });
    },
    onSettled: () => qc.invalidateQueries({ queryKey: commissionKeys.all(slug) }),
  });
}
