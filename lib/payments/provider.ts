import { paymentsEnv } from "@/lib/env";
import { createHttpPaymentProvider } from "./http-provider";
import type { PaymentProvider } from "./types";

let instance: PaymentProvider | undefined;

/** The app's payment provider, configured from STRIPE_* once (see lib/env.ts). */
export function paymentProvider(): PaymentProvider {
  instance ??= createHttpPaymentProvider({ secretKey: paymentsEnv().STRIPE_SECRET_KEY, apiUrl: paymentsEnv().STRIPE_API_URL });
  return instance;
}
