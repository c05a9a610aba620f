import type { Trx } from "./transaction";

/**
 * Whether the commission's final setup sheet is signed off. Until the setup-sheet feature stores
 * sheets there is none, so the delivery guard reports it as missing.
 */
export async function isSetupSheetSigned(trx: Trx, workshopId: number, commissionId: number): Promise<boolean> {
  const exists = await trx.schema.hasTable("setup_sheets");
  if (!exists) return false;
  const row = await trx("setup_sheets").where({ workshop_id: workshopId, commission_id: commissionId }).whereNotNull("signed_at").first("id");
  return !!row;
}
