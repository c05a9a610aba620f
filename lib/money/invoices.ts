// A commission's two invoices — the deposit and the balance — worked out from its price, its
// deposit and the payments recorded against it. Pure: the data layer loads the lines, the pages
// and the checkout use the result. Amounts are integer minor units of the commission's currency.

export const INVOICE_KINDS = ["deposit", "balance"] as const;
export type InvoiceKind = (typeof INVOICE_KINDS)[number];

export type PaymentStatus = "pending" | "paid" | "failed" | "cancelled";

/** One row of the commission's payments: money in (deposit, balance) or back out (refund). */
export interface LedgerLine {
  id: number;
  kind: InvoiceKind | "refund";
  status: PaymentStatus;
  method: "offline" | "card";
  amountMinor: number;
  /** For a refund: the payment it returns. */
  refundOf: number | null;
}

/** Where the commission stands, as far as money is concerned. */
export type CommissionPhase = "spec" | "deposit" | "build" | "final_setup" | "delivered" | "on_hold" | "cancelled";

export type InvoiceStatus =
  /** Nothing to pay (a deposit of 0 %). */
  | "none"
  /** Not payable yet (the spec is not approved; the balance before the build starts). */
  | "not_due"
  | "due"
  | "part_paid"
  | "paid"
  /** The commission was cancelled with money still outstanding: nothing more is asked. */
  | "void";

export interface Invoice {
  kind: InvoiceKind;
  currency: string;
  amountMinor: number;
  /** Paid against this invoice, less refunds that went through. */
  paidMinor: number;
  /** Still to pay (never negative). */
  outstandingMinor: number;
  status: InvoiceStatus;
  /** The client may pay the outstanding amount by card now. */
  payable: boolean;
  /** A card Checkout for this invoice is open (started, not yet confirmed or expired). */
  checkoutOpen: boolean;
}

export interface CommissionMoneyState {
  priceMinor: number;
  depositMinor: number;
  currency: string;
  phase: CommissionPhase;
}

export interface InvoiceSummary {
  invoices: [Invoice, Invoice];
  /** Everything paid, less refunds that went through. */
  paidMinor: number;
  refundedMinor: number;
  /** Refunds asked of the processor and not yet confirmed by it. */
  refundPendingMinor: number;
  outstandingMinor: number;
  /** Paid beyond the price (e.g. a card payment and a bank transfer for the same invoice). */
  overpaidMinor: number;
}

const DEPOSIT_PHASES: readonly CommissionPhase[] = ["deposit", "build", "final_setup"];
const BALANCE_PHASES: readonly CommissionPhase[] = ["build", "final_setup"];

/** The phase of a stage key: `isBuildStage` says whether it is one of the workshop's build stages. */
export function phaseOf(stage: string, isBuildStage: boolean): CommissionPhase {
  if (isBuildStage) return "build";
  const fixed: readonly CommissionPhase[] = ["spec", "deposit", "final_setup", "delivered", "on_hold", "cancelled"];
  return (fixed as readonly string[]).includes(stage) ? (stage as CommissionPhase) : "build";
}

/** Net amount paid by kind: payments that went through less the refunds of them that went through. */
function netPaid(lines: readonly LedgerLine[]) {
  const kindOf = new Map(lines.map((l) => [l.id, l.kind]));
  const paid = { deposit: 0, balance: 0 };
  let refunded = 0;
  let refundPending = 0;
  for (const l of lines) {
    if (l.kind === "refund") {
      const of = l.refundOf === null ? undefined : kindOf.get(l.refundOf);
      if (l.status === "paid") {
        refunded += l.amountMinor;
        if (of === "deposit" || of === "balance") paid[of] -= l.amountMinor;
      } else if (l.status === "pending") refundPending += l.amountMinor;
    } else if (l.status === "paid") paid[l.kind] += l.amountMinor;
  }
  return { paid, refunded, refundPending };
}

function statusOf(amount: number, paid: number, outstanding: number, payable: boolean, phase: CommissionPhase): InvoiceStatus {
  if (amount <= 0) return "none";
  if (outstanding <= 0) return "paid";
  if (phase === "cancelled") return "void";
  if (paid > 0) return "part_paid";
  return payable ? "due" : "not_due";
}

/**
 * The deposit and balance invoices. The deposit counts deposit payments only (as the stage guard
 * does); the balance is whatever of the price is still open once the deposit's share is set aside,
 * so money recorded as "balance" early still counts toward the price.
 */
export function summarizeInvoices(c: CommissionMoneyState, lines: readonly LedgerLine[]): InvoiceSummary {
  const { paid, refunded, refundPending } = netPaid(lines);
  const totalPaid = paid.deposit + paid.balance;
  const pendingCard = (kind: InvoiceKind) => lines.some((l) => l.kind === kind && l.method === "card" && l.status === "pending");

  const depositOutstanding = Math.max(0, c.depositMinor - paid.deposit);
  const totalOutstanding = Math.max(0, c.priceMinor - totalPaid);
  const balanceAmount = Math.max(0, c.priceMinor - c.depositMinor);
  const balanceOutstanding = Math.min(balanceAmount, Math.max(0, totalOutstanding - depositOutstanding));

  const depositPayable = c.depositMinor > 0 && depositOutstanding > 0 && DEPOSIT_PHASES.includes(c.phase);
  const balancePayable = balanceAmount > 0 && balanceOutstanding > 0 && depositOutstanding === 0 && BALANCE_PHASES.includes(c.phase);

  const depositPaid = c.depositMinor - depositOutstanding;
  const balancePaid = balanceAmount - balanceOutstanding;
  const deposit: Invoice = {
    kind: "deposit",
    currency: c.currency,
    amountMinor: c.depositMinor,
    paidMinor: depositPaid,
    outstandingMinor: depositOutstanding,
    status: statusOf(c.depositMinor, depositPaid, depositOutstanding, depositPayable, c.phase),
    payable: depositPayable,
    checkoutOpen: pendingCard("deposit"),
  };
  const balance: Invoice = {
    kind: "balance",
    currency: c.currency,
    amountMinor: balanceAmount,
    paidMinor: balancePaid,
    outstandingMinor: balanceOutstanding,
    status: statusOf(balanceAmount, balancePaid, balanceOutstanding, balancePayable, c.phase),
    payable: balancePayable,
    checkoutOpen: pendingCard("balance"),
  };
  return {
    invoices: [deposit, balance],
    paidMinor: totalPaid,
    refundedMinor: refunded,
    refundPendingMinor: refundPending,
    outstandingMinor: totalOutstanding,
    overpaidMinor: Math.max(0, totalPaid - c.priceMinor),
  };
}

/**
 * What can still be returned of one payment: its amount less refunds that went through or are
 * waiting for the processor (so two refund requests cannot together return more than was paid).
 */
export function refundableMinor(payment: LedgerLine, lines: readonly LedgerLine[]): number {
  if (payment.kind === "refund" || payment.status !== "paid") return 0;
  const returned = lines
    .filter((l) => l.kind === "refund" && l.refundOf === payment.id && (l.status === "paid" || l.status === "pending"))
    .reduce((s, l) => s + l.amountMinor, 0);
  return Math.max(0, payment.amountMinor - returned);
}
