// The payment provider's wire format, as its official SDK (`stripe`) types it, kept apart from our
// domain types in types.ts: only reshape.ts and stripe-provider.ts read these shapes.
import type Stripe from "stripe";

/** A checkout session as the provider's API answers it. */
export type RawCheckoutSession = Stripe.Checkout.Session;

/** A webhook event as `stripe.webhooks.constructEvent` returns it after checking its signature. */
export type RawEvent = Stripe.Event;

/** What the SDK sends to create a checkout session. */
export type RawCheckoutSessionCreateParams = Stripe.Checkout.SessionCreateParams;
