import type { RawApiError, RawCheckoutSession } from "./raw-types";
import { formEncode, reshapeCheckoutSession } from "./reshape";
import type { PaymentProvider } from "./types";

export interface HttpProviderConfig {
  secretKey: string;
  /** e.g. https://api.stripe.com, or the local fake's http://127.0.0.1:<port>. */
  apiUrl: string;
  /** Milliseconds before a call is given up (default 15 s). */
  timeoutMs?: number;
}

export class PaymentProviderError extends Error {
  readonly status: number;
  constructor(status: number, message: string) {
    super(message);
    this.name = "PaymentProviderError";
    this.status = status;
  }
}

/**
 * The payment provider over its REST API (form-encoded requests, JSON answers, bearer secret key),
 * the calls the provider's official SDK makes for the same operations.
 */
export function createHttpPaymentProvider(config: HttpProviderConfig): PaymentProvider {
  const base = config.apiUrl.replace(/\/+$/, "");
  async function call<T>(method: "GET" | "POST", path: string, params?: Record<string, unknown>, idempotencyKey?: string): Promise<T> {
    const res = await fetch(`${base}${path}`, {
      method,
      headers: {
        authorization: `Bearer ${config.secretKey}`,
        ...(method === "POST" && { "content-type": "application/x-www-form-urlencoded" }),
        ...(idempotencyKey && { "idempotency-key": idempotencyKey }),
      },
      body: method === "POST" ? formEncode(params ?? {}) : undefined,
      signal: AbortSignal.timeout(config.timeoutMs ?? 15_000),
    });
    const text = await res.text();
    let json: unknown;
    try {
      json = JSON.parse(text);
    } catch {
      throw new PaymentProviderError(res.status, `The payment provider answered ${res.status} with a body that is not JSON.`);
    }
    if (!res.ok) throw new PaymentProviderError(res.status, (json as RawApiError).error?.message ?? `The payment provider answered ${res.status}.`);
    return json as T;
  }
  return {
    async createCheckoutSession(input) {
      const raw = await call<RawCheckoutSession>(
        "POST",
        "/v1/checkout/sessions",
        {
          mode: "payment",
          success_url: input.successUrl,
          cancel_url: input.cancelUrl,
          client_reference_id: input.invoiceId,
          customer_email: input.customerEmail,
          metadata: { invoice_id: input.invoiceId },
          line_items: [{ quantity: 1, price_data: { currency: input.currency.toLowerCase(), unit_amount: input.amountMinor, product_data: { name: input.description } } }],
        },
        input.idempotencyKey,
      );
      return reshapeCheckoutSession(raw);
    },
    async retrieveCheckoutSession(id) {
      return reshapeCheckoutSession(await call<RawCheckoutSession>("GET", `/v1/checkout/sessions/${encodeURIComponent(id)}`));
    },
  };
}
