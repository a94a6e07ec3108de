import { db } from "@/db/client";
import { AppError } from "@/lib/api/errors";
import { apiRoute, readJson } from "@/lib/api/route";
import { projectInvoices, raiseInvoice } from "@/lib/payments/invoices";
import { raiseInvoiceSchema } from "@/lib/payments/schemas";

/** GET /invoices?projectId=…: the project's invoices (owners, engineers, the project's client). */
export const GET = apiRoute(async ({ request, actor }) => {
  const projectId = new URL(request.url).searchParams.get("projectId");
  if (!projectId) throw new AppError("bad_request", "Say which project: ?projectId=…", { projectId: ["Required"] });
  return { body: { invoices: await projectInvoices(db, actor, projectId) } };
});

/** Raises an invoice for the firm's fee on a project (owners, engineers). */
export const POST = apiRoute(async ({ request, actor }) => {
  const input = await readJson(request, raiseInvoiceSchema);
  return { body: { invoice: await raiseInvoice(db, actor, input) }, status: 201 };
});
