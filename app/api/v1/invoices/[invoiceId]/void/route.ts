import { db } from "@/db/client";
import { apiRoute } from "@/lib/api/route";
import { voidInvoice } from "@/lib/payments/invoices";

type P = { invoiceId: string };

/** Voids an open invoice (owners, engineers); a paid one stays paid. */
export const POST = apiRoute<P>(async ({ actor, params }) => ({ body: { invoice: await voidInvoice(db, actor, params.invoiceId) } }));
