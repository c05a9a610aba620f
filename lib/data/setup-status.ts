import type { Trx } from "./transaction";

/**
 * Whether the commission's final setup sheet is signed off: its CURRENT revision (the highest)
 * carries every sign-off the workshop asks for (`signed_at`). A sheet reopened after signing is a
 * new, unsigned revision, so delivery waits for it to be signed again.
 */
export async function isSetupSheetSigned(trx: Trx, workshopId: number, commissionId: number): Promise<boolean> {
  const row = await trx("setup_sheets").where({ workshop_id: workshopId, commission_id: commissionId }).orderBy("revision", "desc").first("signed_at");
  return !!row?.signed_at;
}
