"use client";

// Read hooks for the commission screens, all on TanStack Query over our API routes.
import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { apiFetch } from "@/lib/http/api-client";
import type { CommentOut, CommissionDetail, CommissionPage, StageHistoryEntry } from "@/lib/schemas/commission-out";
import type { SpecVersionDetail, SpecVersionSummary } from "@/lib/schemas/spec-version";
import { commissionKeys, commissionPaths } from "./api-paths";

export interface StageOption {
  key: string;
  label: string;
}

export interface PersonOption {
  id: number;
  name: string;
}

/** A page of commissions for a query string built by list-view.ts; the previous page stays while the next loads. */
export function useCommissionList(slug: string, query: string, opts: { keepPrevious?: boolean } = {}) {
  return useQuery({
    queryKey: commissionKeys.list(slug, query),
    queryFn: ({ signal }) => apiFetch<CommissionPage>(commissionPaths(slug).list(query), { signal }),
    placeholderData: opts.keepPrevious === false ? undefined : keepPreviousData,
  });
}

export function useStageLine(slug: string) {
  return useQuery({
    queryKey: commissionKeys.stages(slug),
    queryFn: ({ signal }) => apiFetch<{ stages: StageOption[]; sideStages: StageOption[] }>(commissionPaths(slug).stages, { signal }),
    staleTime: 5 * 60_000,
  });
}

/** Clients and builders to choose from; `source` says which route the caller's role may read. */
export function useCommissionPeople(slug: string, source: "commission-people" | "members" | null) {
  return useQuery({
    queryKey: [...commissionKeys.people(slug), source],
    enabled: source !== null,
    staleTime: 5 * 60_000,
    queryFn: async ({ signal }): Promise<{ clients: PersonOption[]; builders: PersonOption[] }> => {
      const paths = commissionPaths(slug);
      if (source === "commission-people") return apiFetch(paths.people, { signal });
      const { members } = await apiFetch<{ members: Array<{ userId: number; name: string; role: string }> }>(paths.members, { signal });
      const pick = (roles: string[]) => members.filter((m) => roles.includes(m.role)).map((m) => ({ id: m.userId, name: m.name }));
      return { clients: pick(["client"]), builders: pick(["builder", "owner"]) };
    },
  });
}

export function useCommission(slug: string, id: number) {
  return useQuery({
    queryKey: commissionKeys.one(slug, id),
    queryFn: ({ signal }) => apiFetch<{ commission: CommissionDetail }>(commissionPaths(slug).one(id), { signal }).then((r) => r.commission),
  });
}

export function useStageHistory(slug: string, id: number) {
  return useQuery({
    queryKey: commissionKeys.history(slug, id),
    queryFn: ({ signal }) => apiFetch<{ history: StageHistoryEntry[] }>(commissionPaths(slug).history(id), { signal }).then((r) => r.history),
  });
}

export function useComments(slug: string, id: number) {
  return useQuery({
    queryKey: commissionKeys.comments(slug, id),
    queryFn: ({ signal }) => apiFetch<{ comments: CommentOut[] }>(commissionPaths(slug).comments(id), { signal }).then((r) => r.comments),
    refetchInterval: 30_000,
  });
}

export function useSpecVersions(slug: string, id: number) {
  return useQuery({
    queryKey: commissionKeys.versions(slug, id),
    queryFn: ({ signal }) => apiFetch<{ versions: SpecVersionSummary[] }>(commissionPaths(slug).versions(id), { signal }).then((r) => r.versions),
  });
}

export function useSpecVersion(slug: string, id: number, versionId: number | null) {
  return useQuery({
    queryKey: commissionKeys.version(slug, id, versionId ?? 0),
    enabled: versionId !== null,
    // A stored version never changes; only its sent/approved marks do, and those are refetched on invalidation.
    queryFn: ({ signal }) => apiFetch<{ version: SpecVersionDetail }>(commissionPaths(slug).version(id, versionId!), { signal }).then((r) => r.version),
  });
}
