import type { RawCheckoutSession, RawEvent } from "./raw-types";
import type { CheckoutSession, PaymentEvent } from "./types";

export function reshapeCheckoutSession(raw: RawCheckoutSession): CheckoutSession {
  return {
    id: raw.id,
    url: raw.url,
    status: raw.status ?? "open",
    paid: raw.payment_status === "paid",
    amountMinor: raw.amount_total,
    currency: raw.currency ? raw.currency.toUpperCase() : null,
    invoiceId: raw.metadata?.invoice_id ?? raw.client_reference_id ?? null,
  };
}

const PAID = new Set(["checkout.session.completed", "checkout.session.async_payment_succeeded"]);

/** A provider event → the app's event; anything we do not act on is `other`. */
export function reshapeEvent(raw: RawEvent): PaymentEvent {
  const createdAt = new Date(raw.created * 1000);
  const object = raw.data?.object as Partial<RawCheckoutSession> | undefined;
  if (object?.object === "checkout.session" && typeof object.id === "string") {
    const session = reshapeCheckoutSession(object as RawCheckoutSession);
    if (PAID.has(raw.type)) return { id: raw.id, kind: "checkout-paid", providerType: raw.type, session, createdAt };
    if (raw.type === "checkout.session.expired") return { id: raw.id, kind: "checkout-expired", providerType: raw.type, session, createdAt };
  }
  return { id: raw.id, kind: "other", providerType: raw.type, createdAt };
}

/** Nested params in the provider's form encoding: a[b][0][c]=v. */
export function formEncode(params: Record<string, unknown>): string {
  const out: string[] = [];
  const walk = (prefix: string, value: unknown) => {
    if (value === undefined || value === null) return;
    if (Array.isArray(value)) value.forEach((v, i) => walk(`${prefix}[${i}]`, v));
    else if (typeof value === "object") for (const [k, v] of Object.entries(value)) walk(prefix ? `${prefix}[${k}]` : k, v);
    else out.push(`${encodeURIComponent(prefix)}=${encodeURIComponent(String(value))}`);
  };
  walk("", params);
  return out.join("&");
}
