// What reconciliation reads from the processor, through the stripe SDK: balance transactions of a
// month (every page), single ones by id or by source, payouts and the transactions each pays out.
// `source` and a refund's `charge` are expanded, so each transaction says which charge — and so
// which workshop — it belongs to. Processor errors become 503/409 for people (processor-errors.ts).
import type Stripe from "stripe";
import { stripe } from "@/lib/services/stripe";
import { callProcessor } from "./processor-errors";

const EXPAND = ["data.source", "data.source.charge"];
const PAGE = 100;

export interface ProcessorBooksReader {
  /** Every balance transaction created in [start, end). */
  transactionsCreated(start: Date, end: Date): Promise<Stripe.BalanceTransaction[]>;
  /** Balance transactions by id; ids the processor does not know are left out. */
  transactionsByIds(ids: readonly string[]): Promise<Stripe.BalanceTransaction[]>;
  /** The balance transactions of these charges or refunds. */
  transactionsBySources(sourceIds: readonly string[]): Promise<Stripe.BalanceTransaction[]>;
  /** Payouts created in [start, end). */
  payoutsCreated(start: Date, end: Date): Promise<Stripe.Payout[]>;
  /** Every balance transaction a payout pays out (its own included). */
  payoutTransactions(payoutId: string): Promise<Stripe.BalanceTransaction[]>;
}

const seconds = (d: Date) => Math.floor(d.getTime() / 1000);

/** Walks a list page by page with `starting_after` (the SDK's auto-paging, collected). */
async function everyPage<T extends { id: string }>(page: (startingAfter: string | undefined) => Promise<Stripe.ApiList<T>>): Promise<T[]> {
  const out: T[] = [];
  let after: string | undefined;
  for (;;) {
    const list = await page(after);
    out.push(...list.data);
    if (!list.has_more || list.data.length === 0) return out;
    after = list.data[list.data.length - 1]!.id;
  }
}

const isMissing = (err: unknown) => (err as { statusCode?: number; code?: string })?.statusCode === 404 || (err as { code?: string })?.code === "resource_missing";

export function stripeBooksReader(client: Stripe = stripe()): ProcessorBooksReader {
  const txnPages = (params: Stripe.BalanceTransactionListParams) =>
    everyPage((after) => client.balanceTransactions.list({ ...params, limit: PAGE, expand: EXPAND, ...(after ? { starting_after: after } : {}) }));
  return {
    transactionsCreated: (start, end) => callProcessor(() => txnPages({ created: { gte: seconds(start), lt: seconds(end) } })),
    transactionsByIds: (ids) =>
      callProcessor(async () => {
        const out: Stripe.BalanceTransaction[] = [];
        for (const id of new Set(ids)) {
          try {
            out.push(await client.balanceTransactions.retrieve(id, { expand: ["source", "source.charge"] }));
          } catch (err) {
            if (!isMissing(err)) throw err;
          }
        }
        return out;
      }),
    transactionsBySources: (sourceIds) =>
      callProcessor(async () => {
        const out: Stripe.BalanceTransaction[] = [];
        for (const source of new Set(sourceIds)) out.push(...(await txnPages({ source })));
        return out;
      }),
    payoutsCreated: (start, end) =>
      callProcessor(() => everyPage((after) => client.payouts.list({ created: { gte: seconds(start), lt: seconds(end) }, limit: PAGE, ...(after ? { starting_after: after } : {}) }))),
    payoutTransactions: (payoutId) => callProcessor(() => txnPages({ payout: payoutId })),
  };
}
