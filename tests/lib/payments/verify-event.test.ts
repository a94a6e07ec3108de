import Stripe from "stripe";
import { describe, expect, it } from "vitest";
import { verifyPaymentEvent } from "@/lib/payments/verify-event";

// Signed with the SDK's own test signer (stripe.webhooks.generateTestHeaderString); the scheme is the
// provider's v1: HMAC-SHA256 of "<t>.<body>" with the endpoint secret, five minutes' tolerance
// (the SDK's DEFAULT_TOLERANCE, 300 s).
const SECRET = "whsec_unit_test_secret";
const payload = JSON.stringify({ id: "evt_unit_1", object: "event", type: "checkout.session.completed", created: 1_767_225_600, livemode: false, data: { object: { id: "cs_test_1", object: "checkout.session" } } });
const sign = (body: string, secret = SECRET, timestamp?: number) => Stripe.webhooks.generateTestHeaderString({ payload: body, secret, ...(timestamp !== undefined && { timestamp }) });

describe("verifyPaymentEvent (stripe.webhooks.constructEvent)", () => {
  it("accepts a body signed with the endpoint's secret and returns the parsed event", () => {
    const r = verifyPaymentEvent(payload, sign(payload), SECRET);
    expect(r).toEqual({ ok: true, event: JSON.parse(payload) });
  });

  it("refuses another secret, a changed body, a missing header, a header without v1 and a stale timestamp, each in plain words", () => {
    expect(verifyPaymentEvent(payload, sign(payload, "whsec_someone_else"), SECRET)).toEqual({ ok: false, reason: "No signature matches the payload." });
    expect(verifyPaymentEvent(payload.replace("cs_test_1", "cs_test_2"), sign(payload), SECRET)).toEqual({ ok: false, reason: "No signature matches the payload." });
    expect(verifyPaymentEvent(payload, null, SECRET)).toEqual({ ok: false, reason: "The signature header is missing." });
    expect(verifyPaymentEvent(payload, "t=1767225600", SECRET)).toEqual({ ok: false, reason: "The signature header has no timestamp or no v1 signature." });
    expect(verifyPaymentEvent(payload, "nonsense", SECRET)).toEqual({ ok: false, reason: "The signature header has no timestamp or no v1 signature." });
    const old = Math.floor(Date.now() / 1000) - 301;
    expect(verifyPaymentEvent(payload, sign(payload, SECRET, old), SECRET)).toEqual({ ok: false, reason: "The signature's timestamp is outside the tolerance." });
    expect(verifyPaymentEvent(payload, sign(payload, SECRET, old), SECRET, { toleranceS: 600 })).toMatchObject({ ok: true });
  });

  it("a correctly signed body that is not JSON is refused; an empty secret is a programming error", () => {
    expect(verifyPaymentEvent("not json", sign("not json"), SECRET)).toEqual({ ok: false, reason: "the body is not JSON." });
    expect(() => verifyPaymentEvent(payload, sign(payload), "")).toThrow(TypeError);
  });
});
