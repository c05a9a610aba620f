import type { Role } from "./permissions";

declare const scopeBrand: unique symbol;

/**
 * Proof that the caller is a member of one workshop, with the role they hold there. Every data
 * function that reads or writes workshop rows takes it as its first argument and puts
 * `workshopId` in the WHERE clause of the same statement. Only the authorization helper
 * (lib/auth/workshop-access.ts) mints one, from the membership row: never from a request.
 */
export interface WorkshopScope {
  readonly workshopId: number;
  readonly membershipId: number;
  readonly userId: number;
  readonly role: Role;
  readonly [scopeBrand]: true;
}

/** Internal to lib/auth (tests/unit/architecture.test.ts checks who imports it). */
export function mintWorkshopScope(s: { workshopId: number; membershipId: number; userId: number; role: Role }): WorkshopScope {
  return Object.freeze({ ...s }) as WorkshopScope;
}
