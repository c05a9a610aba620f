// What the setup-sheet routes and pages answer: one revision, and the sheet's view with the
// approved spec's strings, the workshop's ranges, the checks and the derived figures.
import { z } from "zod";
import type { SetupIssue } from "../setup/checks";
import type { SpecString, StringFigures } from "../setup/figures";
import type { SetupRanges } from "../setup/ranges";
import type { PersonRef } from "./commission-out";
import type { SetupSheet } from "./setup-sheet";

/** draft: open for edits; awaiting_owner: locked, the owner's sign-off missing; signed: complete. */
export type SetupSheetStatus = "draft" | "awaiting_owner" | "signed";

export interface SetupSheetRevision {
  id: number;
  revision: number;
  status: SetupSheetStatus;
  values: SetupSheet;
  specVersion: number | null;
  reopenNote: string | null;
  createdAt: string;
  updatedAt: string;
  updatedBy: PersonRef;
  builderSignedAt: string | null;
  builderSignedBy: PersonRef | null;
  ownerSignedAt: string | null;
  ownerSignedBy: PersonRef | null;
  signedAt: string | null;
}

export interface SetupSheetView {
  commission: { id: number; number: string; title: string; stage: string; stageLabel: string };
  unit: "mm" | "in";
  family: "guitar" | "bass";
  /** The approved spec version the sheet is measured against (null before approval). */
  spec: { versionId: number; version: number; strings: SpecString[]; pickups: string[] } | null;
  ranges: SetupRanges;
  /** False while the workshop works to the default common-practice ranges. */
  rangesCustomised: boolean;
  requireOwnerSignoff: boolean;
  /** The revision shown: the current one (a client: the latest signed one), or the one asked for. */
  sheet: SetupSheetRevision | null;
  isCurrent: boolean;
  revisions: Array<{ revision: number; status: SetupSheetStatus; signedAt: string | null }>;
  figures: StringFigures[];
  issues: SetupIssue[];
  summary: string[];
  /** What the caller may do now, and why not when they may not edit. */
  can: { edit: boolean; sign: boolean; reopen: boolean };
  lockedReason: string | null;
}

export const setupSheetQuerySchema = z.object({ revision: z.coerce.number().int().min(1).max(65535).optional() });
export const setupSignSchema = z.object({
  /** The revision the signer has looked at: a sign-off never lands on a sheet changed since. */
  revision: z.int().min(1).max(65535),
});
export const setupReopenSchema = z.object({ note: z.string().trim().min(3, "Say why the sheet is reopened (at least 3 characters).").max(1000) });
