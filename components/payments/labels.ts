// Words and badge tones for invoices and payments, shared by the payments page's parts.
import type { BadgeTone } from "@/components/ui/badge";
import type { InvoiceKind, InvoiceStatus } from "@/lib/money/invoices";
import { formatMoney, money } from "@/lib/money/money";
import type { PaymentOut } from "@/lib/schemas/payment";

export const INVOICE_LABEL: Record<InvoiceKind, string> = { deposit: "Deposit", balance: "Balance" };

export const INVOICE_STATUS: Record<InvoiceStatus, { label: string; tone: BadgeTone }> = {
  none: { label: "Nothing due", tone: "neutral" },
  not_due: { label: "Not due yet", tone: "neutral" },
  due: { label: "Due", tone: "warning" },
  part_paid: { label: "Part paid", tone: "accent" },
  paid: { label: "Paid", tone: "success" },
  void: { label: "Not due (cancelled)", tone: "neutral" },
};

export function paymentStatus(p: PaymentOut): { label: string; tone: BadgeTone } {
  if (p.kind === "refund") {
    if (p.status === "pending") return { label: "Refund pending", tone: "warning" };
    if (p.status === "paid") return { label: "Refunded", tone: "primary" };
    return { label: "Refund failed", tone: "danger" };
  }
  if (p.status === "pending") return { label: "Checkout open", tone: "accent" };
  if (p.status === "paid") return { label: "Paid", tone: "success" };
  if (p.status === "failed") return { label: "Failed", tone: "danger" };
  return { label: "Not completed", tone: "neutral" };
}

export function paymentWhat(p: PaymentOut): string {
  if (p.kind === "refund") return `Refund of payment #${p.refundOf}`;
  return `${INVOICE_LABEL[p.kind]}${p.method === "card" ? " by card" : ", recorded by the workshop"}`;
}

/** "€1,234.50" for minor units in a currency. */
export const fmt = (minor: number, currency: string) => formatMoney(money(minor, currency));

/** A date-time in UTC, short ("3 Dec 2026, 14:05 UTC"). */
export function utc(isoTime: string | null): string {
  if (!isoTime) return "—";
  return `${new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeStyle: "short", timeZone: "UTC" }).format(new Date(isoTime))} UTC`;
}
