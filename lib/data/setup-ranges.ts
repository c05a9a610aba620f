// A workshop's common-practice setup ranges (workshops.setup_ranges): its own values laid over the
// defaults, and the owner's edits of them.
import { db } from "@/db/knex";
import type { WorkshopScope } from "@/lib/auth/scope";
import { forbidden } from "@/lib/http/errors";
import { setupRangesSchema, type WorkshopSetupRanges } from "@/lib/schemas/setup-ranges";
import { DEFAULT_SETUP_RANGES, effectiveRanges } from "@/lib/setup/ranges";
import { writeAudit } from "./audit";
import { inTransaction, type Trx } from "./transaction";

export interface WorkshopRanges {
  ranges: WorkshopSetupRanges;
  /** False while the workshop works to the defaults. */
  customised: boolean;
}

/** The stored column as ranges: anything unreadable counts as "not customised" (the defaults). */
export function rangesFromColumn(raw: unknown): WorkshopRanges {
  const value = typeof raw === "string" ? safeJson(raw) : raw;
  if (value === null || value === undefined) return { ranges: structuredClone(DEFAULT_SETUP_RANGES), customised: false };
  const overrides = typeof value === "object" ? (value as Parameters<typeof effectiveRanges>[1]) : null;
  const ranges = { guitar: effectiveRanges("guitar", overrides), bass: effectiveRanges("bass", overrides) };
  const parsed = setupRangesSchema.safeParse(ranges);
  return parsed.success ? { ranges: parsed.data, customised: true } : { ranges: structuredClone(DEFAULT_SETUP_RANGES), customised: false };
}

function safeJson(s: string): unknown {
  try {
    return JSON.parse(s);
  } catch {
    return null;
  }
}

export async function getWorkshopSetupRanges(scope: WorkshopScope, trx?: Trx): Promise<WorkshopRanges> {
  const row = await (trx ?? db)("workshops").where({ id: scope.workshopId }).first("setup_ranges");
  return rangesFromColumn(row?.setup_ranges ?? null);
}

/** The owner saves the workshop's ranges (null: back to the defaults). */
export async function saveWorkshopSetupRanges(scope: WorkshopScope, ranges: WorkshopSetupRanges | null): Promise<WorkshopRanges> {
  if (scope.role !== "owner") throw forbidden("Only the owner sets the workshop's setup ranges.");
  return inTransaction(async (trx) => {
    await trx("workshops")
      .where({ id: scope.workshopId })
      .update({ setup_ranges: ranges === null ? null : JSON.stringify(ranges) });
    await writeAudit(trx, { workshopId: scope.workshopId, actorUserId: scope.userId, action: "setup.ranges_changed", entityType: "workshop", entityId: scope.workshopId, data: { reset: ranges === null } });
    return getWorkshopSetupRanges(scope, trx);
  });
}
