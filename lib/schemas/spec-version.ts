import { z } from "zod";
import type { FieldChange } from "../workflow/spec-diff";
import { buildOptionsSchema, type BuildOptions } from "./build-options";
import { instrumentSpecSchema, type ComputeResult, type InstrumentSpec } from "./instrument-spec";
import type { PersonRef } from "./commission-out";

/** A spec version as drafted: the instrument spec the build math computes, and the build options. */
export const specVersionInputSchema = z.object({
  spec: instrumentSpecSchema,
  options: buildOptionsSchema.default(buildOptionsSchema.parse({})),
});
export type SpecVersionInput = z.infer<typeof specVersionInputSchema>;

export const specSubmitSchema = z.object({ note: z.string().trim().max(1000).optional() });

export interface SpecVersionSummary {
  id: number;
  version: number;
  createdAt: string;
  createdBy: PersonRef;
  submittedAt: string | null;
  approvedAt: string | null;
  hasErrors: boolean;
  warningCount: number;
  errorCount: number;
  totalTensionN: number;
}

export interface SpecVersionDetail extends SpecVersionSummary {
  spec: InstrumentSpec;
  options: BuildOptions;
  result: ComputeResult;
  /** Against the version the client last approved before this one (null for the first). */
  change: { againstVersion: number; changes: FieldChange[]; tensionDeltaN: number; tremoloNote: string | null } | null;
}
