"use client";

// The spec tab's heavy parts (the editor, a version's figures, the client's approval), loaded
// beside the tab's data instead of with the page: each shows only once the versions have arrived
// from the API, so the page's first load (README, "First-load JavaScript") leaves out the spec
// form, the build math and the fret table. `preloadSpecParts` starts the download as soon as the
// tab mounts, in parallel with the data requests.
import dynamic from "next/dynamic";
import { Loading } from "@/components/commissions/query-states";

const loadEditor = () => import("./spec-editor");
const loadApproval = () => import("./client-approval");

export const SpecEditor = dynamic(() => loadEditor().then((m) => m.SpecEditor), { loading: () => <Loading label="Loading the spec editor…" rows={6} /> });

export const SpecVersionView = dynamic(() => import("@/components/commissions/spec-version-view").then((m) => m.SpecVersionView), { loading: () => <Loading label="Loading the version…" rows={4} /> });

export const ClientApproval = dynamic(() => loadApproval().then((m) => m.ClientApproval), { loading: () => <Loading label="Loading the approval…" rows={2} /> });

/** Starts loading what this viewer will see (a failed load is retried when the part renders). */
export function preloadSpecParts(opts: { canDraft: boolean; canApprove: boolean }): void {
  if (opts.canDraft) loadEditor().catch(() => undefined);
  if (opts.canApprove) loadApproval().catch(() => undefined);
}
