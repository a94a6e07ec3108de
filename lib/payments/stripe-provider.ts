import Stripe from "stripe";
import type { RawCheckoutSessionCreateParams } from "./raw-types";
import { reshapeCheckoutSession } from "./reshape";
import type { CheckoutSession, NewCheckout, PaymentProvider } from "./types";

/** The provider's own API; STRIPE_API_URL points elsewhere only for the local fake. */
export const DEFAULT_API_URL = "https://api.stripe.com";

export interface StripeProviderConfig {
  secretKey: string;
  /** e.g. https://api.stripe.com (default), or the local fake's http://127.0.0.1:<port>. */
  apiUrl?: string;
  /** Milliseconds before a call is given up (default 15 s). */
  timeoutMs?: number;
  /** Retries of a failed call (the SDK retries with the same idempotency key; default 2). */
  maxNetworkRetries?: number;
}

/**
 * The SDK's connection settings for an API base URL: none for the provider's own API, else its
 * host, port and protocol (how the SDK is pointed at the local fake).
 *
 * @example stripeConnection("http://127.0.0.1:12111") // { host: "127.0.0.1", port: 12111, protocol: "http" }
 */
export function stripeConnection(apiUrl: string): Pick<Stripe.StripeConfig, "host" | "port" | "protocol"> {
  const url = new URL(apiUrl);
  if (url.protocol !== "http:" && url.protocol !== "https:") throw new RangeError(`apiUrl must be an http(s) URL, got ${apiUrl}`);
  if (url.pathname !== "/" || url.search) throw new RangeError(`apiUrl must be a base URL without a path, got ${apiUrl}`);
  if (url.origin === DEFAULT_API_URL) return {};
  const protocol = url.protocol === "http:" ? "http" : "https";
  return { host: url.hostname.replace(/^\[(.*)\]$/, "$1"), port: url.port ? Number(url.port) : protocol === "http" ? 80 : 443, protocol };
}

/** What we send for one invoice's hosted checkout (one line item: the fee). */
export function checkoutParams(input: NewCheckout): RawCheckoutSessionCreateParams {
  return {
    mode: "payment",
    success_url: input.successUrl,
    cancel_url: input.cancelUrl,
    client_reference_id: input.invoiceId,
    ...(input.customerEmail && { customer_email: input.customerEmail }),
    metadata: { invoice_id: input.invoiceId },
    line_items: [{ quantity: 1, price_data: { currency: input.currency.toLowerCase(), unit_amount: input.amountMinor, product_data: { name: input.description } } }],
  };
}

/** The payment provider through its official SDK (`stripe`). */
export class StripeProvider implements PaymentProvider {
  readonly #stripe: Stripe;

  constructor(config: StripeProviderConfig) {
    if (!config.secretKey) throw new TypeError("secretKey must be the provider's secret API key");
    this.#stripe = new Stripe(config.secretKey, {
      ...stripeConnection(config.apiUrl ?? DEFAULT_API_URL),
      timeout: config.timeoutMs ?? 15_000,
      maxNetworkRetries: config.maxNetworkRetries ?? 2,
      appInfo: { name: "Eigenroom" },
    });
  }

  async createCheckoutSession(input: NewCheckout): Promise<CheckoutSession> {
    return reshapeCheckoutSession(await this.#stripe.checkout.sessions.create(checkoutParams(input), { idempotencyKey: input.idempotencyKey }));
  }

  async retrieveCheckoutSession(id: string): Promise<CheckoutSession> {
    return reshapeCheckoutSession(await this.#stripe.checkout.sessions.retrieve(id));
  }
}
