// The objects the Stripe fake keeps, in the shape the Stripe API returns them (the fields our app
// and the SDK read; not every field the hosted API has).

export type Metadata = Record<string, string>;

export interface ListObject<T> {
  object: "list";
  data: T[];
  has_more: boolean;
  url: string;
}

export interface LineItem {
  id: string;
  object: "item";
  amount_discount: number;
  amount_subtotal: number;
  amount_tax: number;
  amount_total: number;
  currency: string;
  description: string;
  price: {
    id: string;
    object: "price";
    active: boolean;
    currency: string;
    product: string;
    type: "one_time";
    unit_amount: number;
    unit_amount_decimal: string;
  };
  quantity: number;
}

export interface CheckoutSession {
  id: string;
  object: "checkout.session";
  amount_subtotal: number;
  amount_total: number;
  cancel_url: string | null;
  client_reference_id: string | null;
  created: number;
  currency: string;
  customer: null;
  customer_details: { email: string | null; name: string | null; address: null; phone: null } | null;
  customer_email: string | null;
  expires_at: number;
  livemode: false;
  metadata: Metadata;
  mode: "payment";
  payment_intent: string | null;
  payment_method_types: string[];
  payment_status: "unpaid" | "paid";
  status: "open" | "complete" | "expired";
  success_url: string;
  total_details: { amount_discount: number; amount_shipping: number; amount_tax: number };
  ui_mode: "hosted";
  url: string | null;
}

export interface CardDetails {
  brand: string;
  last4: string;
  exp_month: number;
  exp_year: number;
  funding: "credit" | "debit";
  country: string;
}

export interface PaymentError {
  type: "card_error";
  code: string;
  decline_code: string | null;
  message: string;
  charge: string;
}

export interface PaymentIntent {
  id: string;
  object: "payment_intent";
  amount: number;
  amount_capturable: number;
  amount_received: number;
  canceled_at: number | null;
  capture_method: "automatic_async";
  client_secret: string;
  confirmation_method: "automatic";
  created: number;
  currency: string;
  customer: null;
  description: string | null;
  last_payment_error: PaymentError | null;
  latest_charge: string | null;
  livemode: false;
  metadata: Metadata;
  payment_method: string | null;
  payment_method_types: string[];
  receipt_email: string | null;
  status: "requires_payment_method" | "succeeded" | "canceled";
}

export interface Charge {
  id: string;
  object: "charge";
  amount: number;
  amount_captured: number;
  amount_refunded: number;
  balance_transaction: string | null;
  billing_details: { email: string | null; name: string | null; address: null; phone: null };
  captured: boolean;
  created: number;
  currency: string;
  description: string | null;
  failure_code: string | null;
  failure_message: string | null;
  livemode: false;
  metadata: Metadata;
  outcome: { network_status: string; reason: string | null; risk_level: "normal"; seller_message: string; type: string };
  paid: boolean;
  payment_intent: string | null;
  payment_method: string | null;
  payment_method_details: { type: "card"; card: CardDetails } | null;
  receipt_email: string | null;
  refunded: boolean;
  status: "succeeded" | "failed";
}

export interface Refund {
  id: string;
  object: "refund";
  amount: number;
  balance_transaction: string | null;
  charge: string;
  created: number;
  currency: string;
  failure_balance_transaction?: string;
  failure_reason?: string;
  metadata: Metadata;
  payment_intent: string | null;
  reason: "duplicate" | "fraudulent" | "requested_by_customer" | null;
  status: "pending" | "succeeded" | "failed" | "canceled";
}

export type BalanceTransactionType = "charge" | "refund" | "payout" | "adjustment" | "refund_failure";

export interface BalanceTransaction {
  id: string;
  object: "balance_transaction";
  amount: number;
  available_on: number;
  created: number;
  currency: string;
  description: string | null;
  exchange_rate: number | null;
  fee: number;
  fee_details: { amount: number; application: null; currency: string; description: string; type: "stripe_fee" }[];
  net: number;
  reporting_category: string;
  source: string | null;
  status: "pending" | "available";
  type: BalanceTransactionType;
}

export interface Payout {
  id: string;
  object: "payout";
  amount: number;
  arrival_date: number;
  automatic: boolean;
  balance_transaction: string;
  created: number;
  currency: string;
  description: string;
  destination: string;
  failure_code: null;
  failure_message: null;
  livemode: false;
  metadata: Metadata;
  method: "standard";
  reconciliation_status: "completed";
  source_type: "card";
  statement_descriptor: string | null;
  status: "paid";
  type: "bank_account";
}

export interface StripeEvent {
  id: string;
  object: "event";
  api_version: string;
  created: number;
  data: { object: unknown; previous_attributes?: Record<string, unknown> };
  livemode: false;
  pending_webhooks: number;
  request: { id: string | null; idempotency_key: string | null };
  type: string;
}

export interface DeliveryAttempt {
  at: string;
  url: string;
  status: number | null;
  error: string | null;
}

export interface Delivery {
  id: string;
  event_id: string;
  event_type: string;
  status: "pending" | "held" | "delivered" | "failed" | "dropped";
  note: string | null;
  seq: number;
  created_at: string;
  next_attempt_at: number | null;
  attempts: DeliveryAttempt[];
}

export interface WebhookRule {
  id: string;
  action: "duplicate" | "delay" | "drop" | "hold";
  event_type: string | null;
  remaining: number;
  copies: number;
  delay_ms: number;
}

export interface IdempotencyEntry {
  fingerprint: string;
  status: number;
  body: unknown;
  created: number;
}

export interface StripeState {
  checkout_sessions: Record<string, CheckoutSession>;
  line_items: Record<string, LineItem[]>;
  /** Extra per-session data the API does not show: payment_intent_data from create. */
  session_intent_data: Record<string, { metadata: Metadata; description: string | null }>;
  payment_intents: Record<string, PaymentIntent>;
  charges: Record<string, Charge>;
  refunds: Record<string, Refund>;
  balance_transactions: Record<string, BalanceTransaction>;
  payouts: Record<string, Payout>;
  /** balance transaction id → the payout that paid it out */
  payout_of: Record<string, string>;
  events: Record<string, StripeEvent>;
  deliveries: Record<string, Delivery>;
  rules: WebhookRule[];
  idempotency: Record<string, IdempotencyEntry>;
  /** Set by POST /admin/webhooks/endpoint; null = the configured default. */
  webhook_url: string | null;
  seq: number;
}

export function freshState(): StripeState {
  return {
    checkout_sessions: {},
    line_items: {},
    session_intent_data: {},
    payment_intents: {},
    charges: {},
    refunds: {},
    balance_transactions: {},
    payouts: {},
    payout_of: {},
    events: {},
    deliveries: {},
    rules: [],
    idempotency: {},
    webhook_url: null,
    seq: 0,
  };
}
