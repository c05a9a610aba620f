// Permissions by name and the ONE table of which role holds which. Pure: no React, no database.
// Route handlers, server actions and pages ask for a permission, never for a role, so changing
// what a role may do is an edit of this file alone.

export const ROLES = ["owner", "builder", "bookkeeper", "client"] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  owner: "Owner",
  builder: "Builder",
  bookkeeper: "Bookkeeper",
  client: "Client",
};

/**
 * Every permission the product knows, including those later features use. `.read` on client-owned
 * things (commissions, specs, payments, photos, setup) means "the rows the caller may see": the
 * data layer narrows a client to their own commissions using the scope's role and user id.
 */
export const PERMISSIONS = [
  "workshop.read", // see the workshop's home and name
  "commission.read",
  "commission.create",
  "commission.write",
  "commission.advance", // move a commission to its next stage
  "commission.signoff", // the owner's sign-off on a builder's stage change
  "commission.assign", // choose a commission's builder and cohort
  "spec.read",
  "spec.draft",
  "spec.approve", // the client's consent to a locked spec version
  "payment.read",
  "payment.pay", // pay one's own commission's invoices by card (the data layer checks it is theirs)
  "payment.request", // ask the client for a deposit or balance
  "payment.record", // record a payment taken outside the processor
  "payment.refund",
  "photo.read",
  "photo.upload",
  "photo.reference", // reference pictures on a commission whose spec is still being agreed
  "photo.remove",
  "setup.read",
  "setup.write",
  "setup.signoff",
  "member.names", // the names of the people in the workshop
  "member.read", // the full member list with e-mail addresses
  "member.manage", // invite, change roles, remove
  "settings.manage", // name, units, currency
  "ledger.read",
  "reconciliation.manage",
  "reconciliation.override", // change what a locked (reconciled) month holds: the owner alone
  "overview.read", // the workshop's dashboards
  "cohort.read", // course cohorts (a builder: the cohorts they belong to)
  "cohort.manage", // create, change and remove cohorts
  "outbox.read", // e-mail that could not be delivered
  "outbox.retry",
] as const;
export type Permission = (typeof PERMISSIONS)[number];

const CLIENT: Permission[] = ["workshop.read", "commission.read", "commission.create", "spec.read", "spec.approve", "payment.read", "payment.pay", "photo.read", "photo.reference", "setup.read"];

const BUILDER: Permission[] = [
  "workshop.read",
  "commission.read",
  "commission.create",
  "commission.write",
  "commission.advance",
  "spec.read",
  "spec.draft",
  "photo.read",
  "photo.upload",
  "setup.read",
  "setup.write",
  "setup.signoff",
  "member.names",
  "cohort.read",
];

const BOOKKEEPER: Permission[] = [
  "workshop.read",
  "commission.read",
  "spec.read",
  "payment.read",
  "payment.request",
  "payment.record",
  "payment.refund",
  "photo.read",
  "setup.read",
  "member.names",
  "member.read",
  "ledger.read",
  "reconciliation.manage",
  "overview.read",
  "cohort.read",
];

// The owner runs the workshop: everything except approving a spec, which is the client's consent.
const OWNER: Permission[] = PERMISSIONS.filter((p) => p !== "spec.approve");

/** The role → permission table. */
export const ROLE_PERMISSIONS: Record<Role, ReadonlySet<Permission>> = {
  owner: new Set(OWNER),
  builder: new Set(BUILDER),
  bookkeeper: new Set(BOOKKEEPER),
  client: new Set(CLIENT),
};

/** A permission or a list of which any one suffices. */
export type PermissionRequirement = Permission | readonly Permission[];

/** True when the role holds the permission (or, for a list, at least one of them). */
export function can(role: Role, required: PermissionRequirement): boolean {
  const list = typeof required === "string" ? [required] : required;
  return list.some((p) => ROLE_PERMISSIONS[role].has(p));
}

export function isRole(value: unknown): value is Role {
  return typeof value === "string" && (ROLES as readonly string[]).includes(value);
}
