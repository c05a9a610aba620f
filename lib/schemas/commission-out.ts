// What the commission routes answer: the only shapes that leave lib/data for commissions, so a
// new column cannot leak by accident.
import type { MissingGuard } from "@/lib/workflow/machine";

export interface PersonRef {
  id: number;
  name: string;
}

export interface CommissionMoney {
  currency: string;
  priceMinor: number;
  depositMinor: number;
  depositPercent: number;
}

export interface CommissionSummary {
  id: number;
  number: string;
  title: string;
  /** For a client: the stage they have been told of (a move awaiting the owner's sign-off is not shown). */
  stage: string;
  stageLabel: string;
  heldFrom: string | null;
  stageEnteredAt: string;
  /** The workshop has moved on but the client has not been told yet (owner's sign-off pending). */
  awaitingSignoff: boolean;
  client: PersonRef;
  builder: PersonRef | null;
  /** Null for builders: prices are between the workshop's owner, bookkeeper and the client. */
  money: CommissionMoney | null;
  targetDate: string | null;
  overdue: boolean;
  createdAt: string;
  updatedAt: string;
}

export interface CommissionPage {
  items: CommissionSummary[];
  total: number;
  page: number;
  pageSize: number;
}

export interface TransitionOption {
  action: "advance" | "back" | "hold" | "resume" | "cancel";
  to: string | null;
  toLabel: string | null;
  allowed: boolean;
  reason: string | null;
  missing: string[];
  /** Which guard each line of `missing` is (same order): the page links to the tab that settles it. */
  missingGuards: MissingGuard[];
}

export interface CommissionDetail extends CommissionSummary {
  requestNotes: string;
  payments: { depositPaidMinor: number; paidMinor: number; refundedMinor: number; depositPaid: boolean; balancePaid: boolean } | null;
  stages: Array<{ key: string; label: string }>;
  transitions: TransitionOption[];
  latestSpecVersion: { id: number; version: number; approved: boolean; submitted: boolean; hasErrors: boolean } | null;
  approvedSpecVersion: { id: number; version: number } | null;
}

export interface StageHistoryEntry {
  id: number;
  from: string | null;
  fromLabel: string | null;
  to: string;
  toLabel: string;
  kind: string;
  actor: PersonRef | null;
  note: string | null;
  needsSignoff: boolean;
  signedOffAt: string | null;
  createdAt: string;
}

export interface CommentOut {
  id: number;
  author: PersonRef & { role: string | null };
  body: string;
  createdAt: string;
}
