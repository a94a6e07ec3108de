export { createHttpPaymentProvider, PaymentProviderError, type HttpProviderConfig } from "./http-provider";
export { FEE_CURRENCIES, formatMoney, fromMinorUnits, toMinorUnits, type FeeCurrency } from "./money";
export { paymentProvider } from "./provider";
export type { RawApiError, RawCheckoutSession, RawEvent } from "./raw-types";
export { formEncode, reshapeCheckoutSession, reshapeEvent } from "./reshape";
export { feeSettingsSchema, raiseInvoiceSchema, type FeeSettingsInput, type RaiseInvoiceInput } from "./schemas";
export { computeSignature, DEFAULT_TOLERANCE_S, signatureHeader, verifyWebhookSignature, WebhookSignatureError } from "./signature";
export type { CheckoutSession, NewCheckout, PaymentEvent, PaymentProvider } from "./types";
