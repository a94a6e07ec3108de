/** A hosted checkout for one invoice, as the app sees it. */
export interface CheckoutSession {
  id: string;
  /** Where the client pays (the provider's hosted page); null once the session is closed. */
  url: string | null;
  status: "open" | "complete" | "expired";
  paid: boolean;
  amountMinor: number | null;
  /** ISO 4217, upper case. */
  currency: string | null;
  /** Our invoice id (sent as client_reference_id and metadata). */
  invoiceId: string | null;
}

/** A webhook event reduced to what we act on. */
export type PaymentEvent =
  | { id: string; kind: "checkout-paid"; providerType: string; session: CheckoutSession; createdAt: Date }
  | { id: string; kind: "checkout-expired"; providerType: string; session: CheckoutSession; createdAt: Date }
  | { id: string; kind: "other"; providerType: string; createdAt: Date };

export interface NewCheckout {
  invoiceId: string;
  description: string;
  amountMinor: number;
  currency: string;
  successUrl: string;
  cancelUrl: string;
  customerEmail?: string;
  /** Same key → the provider returns the same session instead of a second one. */
  idempotencyKey: string;
}

/** What the app needs from the payment provider; stripe-provider.ts implements it with the official SDK. */
export interface PaymentProvider {
  createCheckoutSession(input: NewCheckout): Promise<CheckoutSession>;
  retrieveCheckoutSession(id: string): Promise<CheckoutSession>;
}
