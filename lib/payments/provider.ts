import { paymentsEnv } from "@/lib/env";
import { StripeProvider } from "./stripe-provider";
import type { PaymentProvider } from "./types";

let instance: PaymentProvider | undefined;

/** The app's payment provider (the official SDK), configured from STRIPE_* once (see lib/env.ts). */
export function paymentProvider(): PaymentProvider {
  instance ??= new StripeProvider({ secretKey: paymentsEnv().STRIPE_SECRET_KEY, apiUrl: paymentsEnv().STRIPE_API_URL });
  return instance;
}
