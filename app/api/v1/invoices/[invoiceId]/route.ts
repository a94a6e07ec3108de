import { db } from "@/db/client";
import { apiRoute } from "@/lib/api/route";
import { invoiceFor, invoiceView } from "@/lib/payments/invoices";

type P = { invoiceId: string };

export const GET = apiRoute<P>(async ({ actor, params }) => ({ body: { invoice: invoiceView(await invoiceFor(db, actor, params.invoiceId, "invoice.read")) } }));
