// The tabs of a commission's page, in order. Each feature adds ONE line for its tab: the URL
// segment under /[workshop]/commissions/[id]/ ("" is the overview), the label, and the permission
// a member needs to see it (the tab's page checks the same permission on the server).
import type { Permission } from "@/lib/auth/permissions";

export interface CommissionTab {
  segment: string;
  label: string;
  permission: Permission;
}

export const COMMISSION_TABS: CommissionTab[] = [
  { segment: "", label: "Overview", permission: "commission.read" },
  { segment: "spec", label: "Spec", permission: "spec.read" },
  { segment: "payments", label: "Payments", permission: "payment.read" },
  { segment: "photos", label: "Photos", permission: "photo.read" },
  { segment: "setup", label: "Setup", permission: "setup.read" },
];
