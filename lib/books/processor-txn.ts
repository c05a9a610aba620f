// A processor balance transaction (as the Stripe API returns it, with `source` and the refund's
// `charge` expanded) turned into what reconciliation compares, and which workshop it belongs to.
// Pure.
//
// One processor account serves every workshop of an installation. Each charge we make carries its
// workshop's id in its metadata (lib/payments/processor-metadata.ts), and a refund belongs to the
// workshop of the charge it returns. A transaction with neither (money added by hand at the
// processor, adjustments, payouts themselves) belongs to no workshop: it is never shown to one.
import type Stripe from "stripe";
import type { ProcessorTxn } from "./matching";

type Expandable<T> = string | T | null | undefined;
type Meta = Record<string, string> | null | undefined;

const idOf = (v: Expandable<{ id: string }>) => (v == null ? null : typeof v === "string" ? v : v.id);
const objectOf = <T>(v: Expandable<T>) => (v != null && typeof v === "object" ? v : null);

function positiveInt(v: string | undefined): number | null {
  if (!v || !/^\d{1,10}$/.test(v)) return null;
  const n = Number(v);
  return n > 0 && n <= 2_147_483_647 ? n : null;
}

function fromMetadata(meta: Meta) {
  const kind = meta?.scalewright_invoice;
  return {
    workshopId: positiveInt(meta?.scalewright_workshop_id),
    commissionId: positiveInt(meta?.scalewright_commission_id),
    invoiceKind: kind === "deposit" || kind === "balance" ? kind : null,
  } as const;
}

/** The charge a transaction concerns and our metadata on it. */
function chargeOf(t: Stripe.BalanceTransaction): { chargeId: string | null; refundId: string | null; meta: ReturnType<typeof fromMetadata> } {
  const source = objectOf(t.source as Expandable<{ object?: string; id: string; metadata?: Meta; charge?: Expandable<{ id: string; metadata?: Meta }> }>);
  const none = { workshopId: null, commissionId: null, invoiceKind: null } as const;
  if (!source) return { chargeId: t.type === "charge" ? idOf(t.source as string | null) : null, refundId: null, meta: none };
  if (source.object === "charge") return { chargeId: source.id, refundId: null, meta: fromMetadata(source.metadata) };
  if (source.object === "refund") {
    // The refunded charge decides; a refund we asked for also names the workshop itself.
    const ofCharge = fromMetadata(objectOf(source.charge)?.metadata);
    return { chargeId: idOf(source.charge ?? null), refundId: source.id, meta: ofCharge.workshopId ? ofCharge : fromMetadata(source.metadata) };
  }
  return { chargeId: null, refundId: null, meta: none };
}

/** The transaction as reconciliation reads it; `inPeriod` says whether it is dated in the month compared. */
export function toProcessorTxn(t: Stripe.BalanceTransaction, inPeriod: boolean): ProcessorTxn {
  const { chargeId, refundId, meta } = chargeOf(t);
  return {
    id: t.id,
    type: t.type,
    amountMinor: t.amount,
    feeMinor: t.fee,
    netMinor: t.net,
    currency: t.currency.toUpperCase(),
    created: new Date(t.created * 1000),
    sourceId: idOf(t.source as Expandable<{ id: string }>),
    chargeId,
    refundId,
    workshopId: meta.workshopId,
    commissionId: meta.commissionId,
    invoiceKind: meta.invoiceKind,
    exchangeRate: t.exchange_rate ?? null,
    inPeriod,
  };
}
