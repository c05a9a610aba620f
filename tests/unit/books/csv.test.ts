// The CSV exports, read back with csv-parse (a reference CSV reader). Quoting follows RFC 4180
// (fields with commas, quotes or line breaks quoted, quotes doubled, CRLF between records); minor
// units per currency follow ISO 4217's minor-unit column (EUR 2, JPY 0, KWD 3); the formula guard
// follows OWASP's "CSV Injection" advice (a leading = + - @ tab or CR is neutralised).
import { parse } from "csv-parse/sync";
import { describe, expect, it } from "vitest";
import { LEDGER_COLUMNS, ledgerCsv, major, reconciliationCsv, safeText, type LedgerCsvEntry } from "@/lib/books/csv";

const entry = (over: Partial<LedgerCsvEntry> = {}): LedgerCsvEntry => ({
  id: 1,
  date: "2027-03-05T10:00:00.000Z",
  recordedAt: "2027-03-05T10:00:01.000Z",
  kind: "deposit",
  status: "paid",
  method: "card",
  commission: { number: "2027-007", title: "Walnut baritone" },
  client: { name: "Nadia Fensome" },
  reference: null,
  currency: "EUR",
  grossMinor: 90_000,
  feeMinor: 1_330,
  netMinor: 88_670,
  processor: { chargeId: "ch_1", refundId: null, balanceTransactionId: "txn_1" },
  month: "2027-03",
  monthLocked: false,
  ...over,
});

const read = (text: string) => parse(text, { bom: true, columns: true, skip_empty_lines: true }) as Array<Record<string, string>>;

describe("CSV exports", () => {
  it("writes amounts in major units with the currency's own decimals (ISO 4217)", () => {
    expect(major(123_450, "EUR")).toBe("1234.50");
    expect(major(-5, "EUR")).toBe("-0.05");
    expect(major(150_000, "JPY")).toBe("150000");
    expect(major(12_345, "KWD")).toBe("12.345");
    expect(major(-1, "KWD")).toBe("-0.001");
  });

  it("quotes commas, quotes and line breaks so a reader gets every field back unchanged (RFC 4180)", () => {
    const title = 'Baritone, 27" scale\n"fanned" frets';
    const text = ledgerCsv([entry({ commission: { number: "2027-007", title }, client: { name: "Østby, Maren" }, reference: 'Transfer "March"' })], []);
    expect(text.startsWith("\uFEFF")).toBe(true);
    expect(text).toContain("\r\n");
    const [row] = read(text);
    expect(row).toMatchObject({ row_type: "entry", commission_title: title, client: "Østby, Maren", reference: 'Transfer "March"', gross: "900.00", fee: "13.30", net: "886.70", currency: "EUR", date: "2027-03-05T10:00:00.000Z" });
    expect(Object.keys(row!)).toEqual([...LEDGER_COLUMNS]);
  });

  it("adds one total row per currency whose figures are the sum of that currency's settled entries", () => {
    const entries = [
      entry({ id: 1, grossMinor: 90_000, feeMinor: 1_330, netMinor: 88_670 }),
      entry({ id: 2, kind: "refund", grossMinor: -20_000, feeMinor: 0, netMinor: -20_000 }),
      entry({ id: 3, currency: "JPY", grossMinor: 150_000, feeMinor: 2_215, netMinor: 147_785 }),
    ];
    const totals = [
      { currency: "EUR", count: 2, grossMinor: 70_000, feeMinor: 1_330, netMinor: 68_670 },
      { currency: "JPY", count: 1, grossMinor: 150_000, feeMinor: 2_215, netMinor: 147_785 },
    ];
    const rows = read(ledgerCsv(entries, totals));
    const sum = (cur: string, col: string) => rows.filter((r) => r.row_type === "entry" && r.currency === cur).reduce((s, r) => s + Math.round(Number(r[col]) * (cur === "JPY" ? 1 : 100)), 0);
    const eur = rows.find((r) => r.row_type === "total" && r.currency === "EUR")!;
    const jpy = rows.find((r) => r.row_type === "total" && r.currency === "JPY")!;
    expect([eur.gross, eur.fee, eur.net, eur.reference]).toEqual(["700.00", "13.30", "686.70", "2 settled entries"]);
    expect(Math.round(Number(eur.net) * 100)).toBe(sum("EUR", "net"));
    expect([jpy.gross, jpy.net]).toEqual(["150000", "147785"]);
    expect(Number(jpy.gross)).toBe(sum("JPY", "gross"));
  });

  it("neutralises cells a spreadsheet would run as formulas (OWASP CSV injection), but not amounts", () => {
    for (const bad of ["=HYPERLINK(\"http://x\")", "+1", "-cmd", "@SUM(A1)", "\tx", "\rx"]) expect(safeText(bad)).toBe(`'${bad}`);
    expect(safeText("Walnut")).toBe("Walnut");
    const [row] = read(ledgerCsv([entry({ commission: { number: "2027-007", title: "=1+1" }, grossMinor: -500, netMinor: -500, feeMinor: 0, kind: "refund" })], []));
    expect(row!.commission_title).toBe("'=1+1");
    expect(row!.gross).toBe("-5.00");
  });

  it("writes a reconciliation with every column, blanks where a section has nothing to say", () => {
    const rows = read(reconciliationCsv([{ section: "exception", kind: "amount_mismatch", detail: "Balance, 2027-007: differs", resolution_note: "Fee changed; confirmed" }]));
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ section: "exception", kind: "amount_mismatch", detail: "Balance, 2027-007: differs", resolution_note: "Fee changed; confirmed", payout: "" });
  });
});
