// Test card numbers and what each one does. The numbers follow the widely published test-card
// convention, so the same numbers behave alike against a real test-mode account.

export type CardOutcome =
  | { ok: true; brand: string; funding: "credit" | "debit" }
  | { ok: false; brand: string; code: string; decline_code: string | null; message: string };

interface TestCard {
  number: string;
  label: string;
  outcome: CardOutcome;
}

const declined = (brand: string, code: string, decline_code: string | null, message: string): CardOutcome => ({
  ok: false,
  brand,
  code,
  decline_code,
  message,
});

export const TEST_CARDS: TestCard[] = [
  { number: "4242424242424242", label: "Visa, succeeds", outcome: { ok: true, brand: "visa", funding: "credit" } },
  { number: "5555555555554444", label: "Mastercard, succeeds", outcome: { ok: true, brand: "mastercard", funding: "credit" } },
  { number: "4000056655665556", label: "Visa debit, succeeds", outcome: { ok: true, brand: "visa", funding: "debit" } },
  { number: "4000000000000002", label: "Declined (generic)", outcome: declined("visa", "card_declined", "generic_decline", "Your card was declined.") },
  {
    number: "4000000000009995",
    label: "Declined: insufficient funds",
    outcome: declined("visa", "card_declined", "insufficient_funds", "Your card has insufficient funds."),
  },
  { number: "4000000000000069", label: "Declined: expired card", outcome: declined("visa", "expired_card", null, "Your card has expired.") },
  {
    number: "4000000000000127",
    label: "Declined: incorrect CVC",
    outcome: declined("visa", "incorrect_cvc", null, "Your card's security code is incorrect."),
  },
  {
    number: "4000000000000119",
    label: "Fails: processing error",
    outcome: declined("visa", "processing_error", null, "An error occurred while processing your card. Try again in a little bit."),
  },
];

/** Luhn check, so a typo is caught before anything is charged. */
export function luhnValid(digits: string): boolean {
  let sum = 0;
  for (let i = 0; i < digits.length; i++) {
    let d = Number(digits[digits.length - 1 - i]);
    if (i % 2 === 1) d = d * 2 > 9 ? d * 2 - 9 : d * 2;
    sum += d;
  }
  return digits.length >= 12 && sum % 10 === 0;
}

export type CardCheck = { valid: true; outcome: CardOutcome; last4: string } | { valid: false; field: string; message: string };

/** Validates what a payer typed and finds the test card's outcome. */
export function checkCard(input: { number: string; exp: string; cvc: string }, now = new Date()): CardCheck {
  const digits = input.number.replace(/[\s-]/g, "");
  if (!/^\d+$/.test(digits) || !luhnValid(digits)) return { valid: false, field: "card_number", message: "That card number is not valid." };
  const card = TEST_CARDS.find((c) => c.number === digits);
  if (!card) return { valid: false, field: "card_number", message: "This is a test checkout: use one of the test card numbers listed below." };
  const exp = parseExpiry(input.exp);
  if (!exp) return { valid: false, field: "card_exp", message: "Enter the expiry as MM/YY." };
  const endOfMonth = new Date(Date.UTC(exp.year, exp.month, 1));
  if (endOfMonth <= now) return { valid: false, field: "card_exp", message: "The expiry date is in the past." };
  if (!/^\d{3,4}$/.test(input.cvc.trim())) return { valid: false, field: "card_cvc", message: "Enter the 3 or 4 digit security code." };
  return { valid: true, outcome: card.outcome, last4: digits.slice(-4) };
}

export function parseExpiry(value: string): { month: number; year: number } | null {
  const m = /^\s*(\d{1,2})\s*\/\s*(\d{2}|\d{4})\s*$/.exec(value);
  if (!m) return null;
  const month = Number(m[1]);
  const year = m[2]!.length === 2 ? 2000 + Number(m[2]) : Number(m[2]);
  return month >= 1 && month <= 12 ? { month, year } : null;
}
