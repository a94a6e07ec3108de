import Stripe from "stripe";
import type { RawEvent } from "./raw-types";

export type VerifiedEvent = { ok: true; event: RawEvent } | { ok: false; reason: string };

// The SDK's refusals, in the words our API answers with (its own messages are long and point to its docs).
const REASONS: [RegExp, string][] = [
  [/^No stripe-signature header/i, "The signature header is missing."],
  [/^(Unable to extract timestamp|No signatures found with expected scheme)/i, "The signature header has no timestamp or no v1 signature."],
  [/^Timestamp outside the tolerance/i, "The signature's timestamp is outside the tolerance."],
];

/**
 * Checks a webhook delivery with the SDK (`stripe.webhooks.constructEvent`: the v1 HMAC of the raw
 * body under the endpoint's signing secret, and a timestamp within the SDK's tolerance of five
 * minutes) and parses it. Nothing is read from a body whose signature does not match.
 *
 * @example verifyPaymentEvent(body, request.headers.get("stripe-signature"), secret) // { ok: true, event }
 */
export function verifyPaymentEvent(payload: string, signature: string | null, secret: string, opts: { toleranceS?: number } = {}): VerifiedEvent {
  if (!secret) throw new TypeError("secret must be the webhook signing secret");
  if (!signature) return { ok: false, reason: "The signature header is missing." };
  try {
    return { ok: true, event: Stripe.webhooks.constructEvent(payload, signature, secret, opts.toleranceS) };
  } catch (error) {
    if (error instanceof Stripe.errors.StripeSignatureVerificationError) {
      return { ok: false, reason: REASONS.find(([re]) => re.test(error.message))?.[1] ?? "No signature matches the payload." };
    }
    // A correctly signed body that is not JSON (constructEvent parses it after the check).
    if (error instanceof SyntaxError) return { ok: false, reason: "the body is not JSON." };
    throw error;
  }
}
