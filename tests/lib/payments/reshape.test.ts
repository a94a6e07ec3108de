import { describe, expect, it } from "vitest";
import type { RawCheckoutSession, RawEvent } from "@/lib/payments/raw-types";
import { reshapeCheckoutSession, reshapeEvent } from "@/lib/payments/reshape";

// SDK shapes (Stripe.Checkout.Session, Stripe.Event) → our domain types; only the fields we read.
const session = (over: Partial<RawCheckoutSession> = {}) =>
  ({ id: "cs_test_1", object: "checkout.session", url: "https://pay.example.invalid/cs_test_1", status: "open", payment_status: "unpaid", amount_total: 85000, currency: "eur", client_reference_id: "inv-1", metadata: { invoice_id: "inv-1" }, created: 1_767_225_600, ...over }) as RawCheckoutSession;
const event = (type: string, object: unknown) => ({ id: "evt_1", object: "event", type, created: 1_767_225_600, livemode: false, data: { object } }) as unknown as RawEvent;

describe("reshapeCheckoutSession", () => {
  it("upper-cases the currency, reads our invoice id from metadata (else client_reference_id)", () => {
    expect(reshapeCheckoutSession(session())).toEqual({ id: "cs_test_1", url: "https://pay.example.invalid/cs_test_1", status: "open", paid: false, amountMinor: 85000, currency: "EUR", invoiceId: "inv-1" });
    expect(reshapeCheckoutSession(session({ metadata: {}, client_reference_id: "inv-2" })).invoiceId).toBe("inv-2");
    expect(reshapeCheckoutSession(session({ metadata: null, client_reference_id: null, currency: null, amount_total: null, url: null }))).toMatchObject({ invoiceId: null, currency: null, amountMinor: null, url: null });
  });

  it("maps statuses: null and open → open, complete, expired; an unknown status counts as closed", () => {
    expect(reshapeCheckoutSession(session({ status: null })).status).toBe("open");
    expect(reshapeCheckoutSession(session({ status: "complete", payment_status: "paid" }))).toMatchObject({ status: "complete", paid: true });
    expect(reshapeCheckoutSession(session({ status: "expired" })).status).toBe("expired");
    expect(reshapeCheckoutSession(session({ status: "paused_by_someone" })).status).toBe("expired");
  });
});

describe("reshapeEvent", () => {
  it("completed and async-succeeded checkouts are checkout-paid; expired is checkout-expired", () => {
    const paid = reshapeEvent(event("checkout.session.completed", session({ status: "complete", payment_status: "paid" })));
    expect(paid).toMatchObject({ id: "evt_1", kind: "checkout-paid", providerType: "checkout.session.completed", session: { paid: true, invoiceId: "inv-1" }, createdAt: new Date(1_767_225_600_000) });
    expect(reshapeEvent(event("checkout.session.async_payment_succeeded", session())).kind).toBe("checkout-paid");
    expect(reshapeEvent(event("checkout.session.expired", session({ status: "expired" }))).kind).toBe("checkout-expired");
  });

  it("anything else is other, also a checkout type whose object is not a session", () => {
    expect(reshapeEvent(event("customer.created", { id: "cus_1", object: "customer" }))).toEqual({ id: "evt_1", kind: "other", providerType: "customer.created", createdAt: new Date(1_767_225_600_000) });
    expect(reshapeEvent(event("checkout.session.completed", { id: "cus_1", object: "customer" })).kind).toBe("other");
    expect(reshapeEvent(event("checkout.session.completed", null)).kind).toBe("other");
  });
});
