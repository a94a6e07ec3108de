import type { RawCheckoutSession, RawEvent } from "./raw-types";
import type { CheckoutSession, PaymentEvent } from "./types";

/** The provider's session statuses we know; any other (a status added later) is treated as closed. */
function statusOf(raw: RawCheckoutSession["status"]): CheckoutSession["status"] {
  if (raw === null || raw === "open") return "open";
  if (raw === "complete") return "complete";
  return "expired";
}

/** SDK checkout session → the app's session (currency upper case, our invoice id from metadata). */
export function reshapeCheckoutSession(raw: RawCheckoutSession): CheckoutSession {
  return {
    id: raw.id,
    url: raw.url ?? null,
    status: statusOf(raw.status),
    paid: raw.payment_status === "paid",
    amountMinor: raw.amount_total ?? null,
    currency: raw.currency ? raw.currency.toUpperCase() : null,
    invoiceId: raw.metadata?.invoice_id ?? raw.client_reference_id ?? null,
  };
}

const PAID = new Set<string>(["checkout.session.completed", "checkout.session.async_payment_succeeded"]);

/**
 * A verified provider event → the app's event; anything we do not act on is `other`. The event's
 * object is checked to be a checkout session before it is read as one (the signature proves who sent
 * the body, not that its shape is the one we expect).
 */
export function reshapeEvent(raw: RawEvent): PaymentEvent {
  const createdAt = new Date(raw.created * 1000);
  const object: unknown = raw.data?.object;
  const isSession = typeof object === "object" && object !== null && (object as { object?: unknown }).object === "checkout.session" && typeof (object as { id?: unknown }).id === "string";
  if (isSession) {
    const session = reshapeCheckoutSession(object as RawCheckoutSession);
    if (PAID.has(raw.type)) return { id: raw.id, kind: "checkout-paid", providerType: raw.type, session, createdAt };
    if (raw.type === "checkout.session.expired") return { id: raw.id, kind: "checkout-expired", providerType: raw.type, session, createdAt };
  }
  return { id: raw.id, kind: "other", providerType: raw.type, createdAt };
}
