export { FEE_CURRENCIES, formatMoney, fromMinorUnits, toMinorUnits, type FeeCurrency } from "./money";
export { paymentProvider } from "./provider";
export type { RawCheckoutSession, RawCheckoutSessionCreateParams, RawEvent } from "./raw-types";
export { reshapeCheckoutSession, reshapeEvent } from "./reshape";
export { feeSettingsSchema, raiseInvoiceSchema, type FeeSettingsInput, type RaiseInvoiceInput } from "./schemas";
export { checkoutParams, DEFAULT_API_URL, StripeProvider, stripeConnection, type StripeProviderConfig } from "./stripe-provider";
export type { CheckoutSession, NewCheckout, PaymentEvent, PaymentProvider } from "./types";
export { verifyPaymentEvent, type VerifiedEvent } from "./verify-event";
