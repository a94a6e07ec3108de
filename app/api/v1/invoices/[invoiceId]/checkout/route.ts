import { db } from "@/db/client";
import { apiRoute } from "@/lib/api/route";
import { serverEnv } from "@/lib/env";
import { startCheckout } from "@/lib/payments/invoices";
import { paymentProvider } from "@/lib/payments/provider";

type P = { invoiceId: string };

/** The project's client starts paying: answers the hosted checkout page to send the browser to. */
export const POST = apiRoute<P>(async ({ actor, params }) => ({ body: await startCheckout(db, paymentProvider(), actor, params.invoiceId, serverEnv().APP_URL) }));
