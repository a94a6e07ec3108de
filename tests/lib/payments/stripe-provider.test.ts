import { describe, expect, it } from "vitest";
import { checkoutParams, DEFAULT_API_URL, StripeProvider, stripeConnection } from "@/lib/payments/stripe-provider";

// How the SDK client is pointed (STACK.md: new Stripe(key, { host, port, protocol }) against a local
// fake) and what we ask it to create. The calls themselves run against the fake provider in
// tests/integration/payments-checkout.test.ts.
describe("stripeConnection", () => {
  it("leaves the provider's own API to the SDK's defaults", () => {
    expect(stripeConnection(DEFAULT_API_URL)).toEqual({});
    expect(stripeConnection("https://api.stripe.com/")).toEqual({});
  });

  it("derives host, port and protocol for the local fake (IPv4, IPv6, default ports)", () => {
    expect(stripeConnection("http://127.0.0.1:12111")).toEqual({ host: "127.0.0.1", port: 12111, protocol: "http" });
    expect(stripeConnection("http://[::1]:4000")).toEqual({ host: "::1", port: 4000, protocol: "http" });
    expect(stripeConnection("http://localhost")).toEqual({ host: "localhost", port: 80, protocol: "http" });
    expect(stripeConnection("https://payments.example.invalid")).toEqual({ host: "payments.example.invalid", port: 443, protocol: "https" });
  });

  it("refuses URLs the SDK could not use", () => {
    expect(() => stripeConnection("ftp://127.0.0.1:21")).toThrow(RangeError);
    expect(() => stripeConnection("http://127.0.0.1:12111/v1")).toThrow(/without a path/);
    expect(() => stripeConnection("not a url")).toThrow(TypeError);
  });
});

describe("checkoutParams", () => {
  it("one line item of the fee in lower-case currency, our invoice id in metadata and client_reference_id", () => {
    const p = checkoutParams({ invoiceId: "inv-1", description: "Engineering fee — Demo room", amountMinor: 85000, currency: "EUR", successUrl: "http://a.invalid/ok", cancelUrl: "http://a.invalid/no", customerEmail: "client@example.invalid", idempotencyKey: "k" });
    expect(p).toEqual({
      mode: "payment",
      success_url: "http://a.invalid/ok",
      cancel_url: "http://a.invalid/no",
      client_reference_id: "inv-1",
      customer_email: "client@example.invalid",
      metadata: { invoice_id: "inv-1" },
      line_items: [{ quantity: 1, price_data: { currency: "eur", unit_amount: 85000, product_data: { name: "Engineering fee — Demo room" } } }],
    });
    expect(checkoutParams({ invoiceId: "inv-1", description: "x", amountMinor: 1, currency: "GBP", successUrl: "http://a.invalid/ok", cancelUrl: "http://a.invalid/no", idempotencyKey: "k" })).not.toHaveProperty("customer_email");
  });
});

describe("StripeProvider", () => {
  it("needs a secret key", () => {
    expect(() => new StripeProvider({ secretKey: "" })).toThrow(TypeError);
  });
});
