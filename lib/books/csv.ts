// CSV exports of the books: the ledger and a month's reconciliation. Pure (csv-stringify does the
// quoting: RFC 4180, CRLF line ends, a byte-order mark so spreadsheet programs read UTF-8).
// Dates are ISO 8601 in UTC; amounts are decimal strings in major units (toMajorString: 2 decimals
// for EUR, none for JPY, 3 for KWD) beside their ISO 4217 currency code.
import { stringify } from "csv-stringify/sync";
import { money, toMajorString } from "@/lib/money/money";
import type { CurrencyTotals } from "./entries";

/** Major units of `minor` in `currency` ("1234.50", "1500" for JPY, "12.345" for KWD). */
export function major(minor: number, currency: string): string {
  return toMajorString(money(minor, currency));
}

/**
 * Text people typed (titles, names, references, notes): a spreadsheet would run a cell starting
 * with = + - @ (or a tab or carriage return) as a formula, so such a cell is prefixed with an
 * apostrophe (OWASP, "CSV Injection").
 */
export function safeText(text: string | null | undefined): string {
  const s = text ?? "";
  return /^[=+\-@\t\r]/.test(s) ? `'${s}` : s;
}

export function toCsv(columns: readonly string[], rows: ReadonlyArray<Record<string, string>>): string {
  return stringify(rows as Array<Record<string, string>>, { header: true, columns: [...columns], bom: true, record_delimiter: "windows" });
}

export const LEDGER_COLUMNS = [
  "row_type",
  "entry_id",
  "date",
  "recorded_at",
  "kind",
  "status",
  "method",
  "commission_number",
  "commission_title",
  "client",
  "reference",
  "currency",
  "gross",
  "fee",
  "net",
  "processor_charge",
  "processor_refund",
  "processor_balance_transaction",
  "month",
  "month_locked",
] as const;

export interface LedgerCsvEntry {
  id: number;
  date: string;
  recordedAt: string;
  kind: string;
  status: string;
  method: string;
  commission: { number: string; title: string };
  client: { name: string };
  reference: string | null;
  currency: string;
  grossMinor: number;
  feeMinor: number;
  netMinor: number;
  processor: { chargeId: string | null; refundId: string | null; balanceTransactionId: string | null } | null;
  month: string;
  monthLocked: boolean;
}

/** The ledger as CSV: one row per entry, then one "total" row per currency (settled entries only). */
export function ledgerCsv(entries: readonly LedgerCsvEntry[], totals: readonly CurrencyTotals[]): string {
  const rows = entries.map((e) => ({
    row_type: "entry",
    entry_id: String(e.id),
    date: e.date,
    recorded_at: e.recordedAt,
    kind: e.kind,
    status: e.status,
    method: e.method,
    commission_number: safeText(e.commission.number),
    commission_title: safeText(e.commission.title),
    client: safeText(e.client.name),
    reference: safeText(e.reference),
    currency: e.currency,
    gross: major(e.grossMinor, e.currency),
    fee: major(e.feeMinor, e.currency),
    net: major(e.netMinor, e.currency),
    processor_charge: e.processor?.chargeId ?? "",
    processor_refund: e.processor?.refundId ?? "",
    processor_balance_transaction: e.processor?.balanceTransactionId ?? "",
    month: e.month,
    month_locked: e.monthLocked ? "yes" : "no",
  }));
  const blank = Object.fromEntries(LEDGER_COLUMNS.map((c) => [c, ""])) as Record<(typeof LEDGER_COLUMNS)[number], string>;
  for (const t of totals) {
    rows.push({
      ...blank,
      row_type: "total",
      status: "paid",
      reference: `${t.count} settled ${t.count === 1 ? "entry" : "entries"}`,
      currency: t.currency,
      gross: major(t.grossMinor, t.currency),
      fee: major(t.feeMinor, t.currency),
      net: major(t.netMinor, t.currency),
    });
  }
  return toCsv(LEDGER_COLUMNS, rows);
}

export const RECONCILIATION_COLUMNS = [
  "section",
  "month",
  "kind",
  "state",
  "payment_id",
  "commission_number",
  "processor_ref",
  "payout",
  "date",
  "ledger_amount",
  "ledger_currency",
  "processor_amount",
  "processor_fee",
  "processor_net",
  "processor_currency",
  "detail",
  "resolution_note",
  "resolved_by",
  "resolved_at",
] as const;

export type ReconciliationCsvRow = Partial<Record<(typeof RECONCILIATION_COLUMNS)[number], string>>;

/** A month's reconciliation as CSV: its pairs, exceptions (with resolutions), payouts and their lines. */
export function reconciliationCsv(rows: readonly ReconciliationCsvRow[]): string {
  const full = rows.map((r) => Object.fromEntries(RECONCILIATION_COLUMNS.map((c) => [c, r[c] ?? ""])));
  return toCsv(RECONCILIATION_COLUMNS, full);
}
