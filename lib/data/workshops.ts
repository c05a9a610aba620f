import { AppError } from "@/lib/http/errors";
import type { WorkshopCreateInput } from "@/lib/schemas/workshop";
import { writeAudit } from "./audit";
import { inTransaction, isDuplicateKey } from "./transaction";

/** Creates a workshop and makes its creator the owner, in one transaction. */
export async function createWorkshop(
  creatorUserId: number,
  input: { name: string; slug: string; unitPreference: WorkshopCreateInput["unitPreference"]; currency: string },
): Promise<{ slug: string; name: string }> {
  try {
    return await inTransaction(async (trx) => {
      const [id] = await trx("workshops").insert({
        slug: input.slug,
        name: input.name,
        unit_preference: input.unitPreference,
        currency: input.currency,
      });
      const workshopId = Number(id);
      await trx("memberships").insert({ workshop_id: workshopId, user_id: creatorUserId, role: "owner" });
      await writeAudit(trx, { workshopId, actorUserId: creatorUserId, action: "workshop.created", entityType: "workshop", entityId: workshopId });
      return { slug: input.slug, name: input.name };
    });
  } catch (err) {
    if (isDuplicateKey(err)) {
      throw new AppError("conflict", "That address is taken.", [{ path: "slug", message: "Another workshop uses this address; choose another." }]);
    }
    throw err;
  }
}
