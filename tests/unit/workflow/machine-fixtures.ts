// The guard facts and actors the stage machine's tests share.
import type { Actor, GuardFacts } from "@/lib/workflow/machine";
import { DEFAULT_BUILD_STAGES } from "@/lib/workflow/stages";

/** Every guard met, on the default template, no owner's sign-off. */
export const ALL_MET: GuardFacts = {
  template: DEFAULT_BUILD_STAGES,
  approvedSpec: { id: 1, hasErrors: false },
  newerUnapprovedSpec: false,
  depositPaid: true,
  balancePaid: true,
  setupSheetSigned: true,
  requireOwnerSignoff: false,
};

export const ACTORS = {
  owner: { role: "owner", isAssignedBuilder: false, isCommissionClient: false },
  assignedBuilder: { role: "builder", isAssignedBuilder: true, isCommissionClient: false },
  otherBuilder: { role: "builder", isAssignedBuilder: false, isCommissionClient: false },
  bookkeeper: { role: "bookkeeper", isAssignedBuilder: false, isCommissionClient: false },
  ownClient: { role: "client", isAssignedBuilder: false, isCommissionClient: true },
  otherClient: { role: "client", isAssignedBuilder: false, isCommissionClient: false },
} satisfies Record<string, Actor>;
