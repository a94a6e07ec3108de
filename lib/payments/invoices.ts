import "server-only";
import { type Kysely, sql } from "kysely";
import {
  findInvoice,
  getFeeSettings,
  insertInvoice,
  type Invoice,
  listProjectInvoices,
  setCheckoutSession,
  voidInvoiceRow,
} from "@/db/queries/invoices";
import { projectFor } from "@/db/queries/projects";
import type { Database } from "@/db/schema";
import { AppError, conflict, notFound } from "@/lib/api/errors";
import type { Actor } from "@/lib/auth/actor";
import type { ProjectAction } from "@/lib/auth/permissions";
import { formatMoney } from "./money";
import type { RaiseInvoiceInput } from "./schemas";
import type { PaymentProvider } from "./types";

/** An invoice as its readers see it (no provider ids). */
export interface InvoiceView {
  id: string;
  projectId: string;
  reportId: string | null;
  description: string;
  amountMinor: number;
  currency: string;
  amountText: string;
  status: Invoice["status"];
  paidAt: Date | null;
  voidedAt: Date | null;
  createdAt: Date;
}

export function invoiceView(i: Invoice): InvoiceView {
  return {
    id: i.id,
    projectId: i.projectId,
    reportId: i.reportId,
    description: i.description,
    amountMinor: i.amountMinor,
    currency: i.currency,
    amountText: formatMoney(i.amountMinor, i.currency),
    status: i.status,
    paidAt: i.paidAt,
    voidedAt: i.voidedAt,
    createdAt: i.createdAt,
  };
}

/** The invoice for an action: 404 when it or its project is not visible to the actor, 403 when the role may not. */
export async function invoiceFor(db: Kysely<Database>, actor: Actor, invoiceId: string, action: ProjectAction): Promise<Invoice> {
  const invoice = await findInvoice(db, actor.firmId, invoiceId);
  if (!invoice) throw notFound("That invoice");
  await projectFor(db, actor, invoice.projectId, action).catch((error: unknown) => {
    if (error instanceof AppError && error.code === "not_found") throw notFound("That invoice");
    throw error;
  });
  return invoice;
}

export async function projectInvoices(db: Kysely<Database>, actor: Actor, projectId: string): Promise<InvoiceView[]> {
  await projectFor(db, actor, projectId, "invoice.read");
  return (await listProjectInvoices(db, projectId)).map(invoiceView);
}

/** The project's reports (id and number), for choosing which one a per-report fee invoices. */
export async function projectReports(db: Kysely<Database>, projectId: string): Promise<{ id: string; number: string }[]> {
  const { rows } = await sql<{ id: string; number: string }>`select id, number from reports where project_id = ${projectId} order by number`.execute(db);
  return rows;
}

/** Raises an invoice for the firm's fee: one per project, or one per report for a per-report fee. */
export async function raiseInvoice(db: Kysely<Database>, actor: Actor, input: RaiseInvoiceInput): Promise<InvoiceView> {
  const project = await projectFor(db, actor, input.projectId, "invoice.raise");
  const fee = await getFeeSettings(db, actor.firmId);
  if (!fee || fee.amountMinor === 0) throw new AppError("conflict", "The firm has no engineering fee yet. An owner sets it under Settings → Fees.");
  let description = `Engineering fee — ${project.name}`;
  if (fee.basis === "per-report") {
    if (!input.reportId) throw new AppError("bad_request", "The fee is charged per report: choose the report.", { reportId: ["Required for a per-report fee"] });
    const { rows } = await sql<{ id: string; number: string }>`select id, number from reports where id = ${input.reportId} and project_id = ${project.id}`.execute(db);
    const report = rows[0];
    if (!report) throw new AppError("bad_request", "That report is not part of this project.", { reportId: ["Not a report of this project"] });
    description = `Engineering fee — report ${report.number}, ${project.name}`;
  } else if (input.reportId) {
    throw new AppError("bad_request", "The fee is charged per project; leave the report out.", { reportId: ["Not used for a per-project fee"] });
  }
  try {
    const invoice = await insertInvoice(db, { firmId: actor.firmId, projectId: project.id, reportId: input.reportId ?? null, description, amountMinor: fee.amountMinor, currency: fee.currency, createdBy: actor.userId });
    return invoiceView(invoice);
  } catch (error) {
    if ((error as { code?: string }).code === "23505") throw conflict(fee.basis === "per-report" ? "That report already has an open or paid invoice." : "This project already has an open or paid invoice for the fee.");
    throw error;
  }
}

export async function voidInvoice(db: Kysely<Database>, actor: Actor, invoiceId: string): Promise<InvoiceView> {
  const invoice = await invoiceFor(db, actor, invoiceId, "invoice.raise");
  if (invoice.status !== "open") throw conflict(`Only an open invoice can be voided; this one is ${invoice.status}.`);
  const voided = await voidInvoiceRow(db, invoice.id);
  if (!voided) throw conflict("The invoice changed meanwhile (it may just have been paid). Reload.");
  return invoiceView(voided);
}

/**
 * Starts (or resumes) the hosted checkout of an open invoice for the project's client and returns
 * the page to send them to. An open session is reused; an expired one is replaced.
 */
export async function startCheckout(db: Kysely<Database>, provider: PaymentProvider, actor: Actor, invoiceId: string, appUrl: string): Promise<{ url: string }> {
  const invoice = await invoiceFor(db, actor, invoiceId, "invoice.pay");
  if (invoice.status === "paid") throw conflict("This invoice is already paid. Thank you.");
  if (invoice.status === "void") throw conflict("This invoice was voided by the firm; there is nothing to pay.");
  if (invoice.checkoutSessionId) {
    const existing = await provider.retrieveCheckoutSession(invoice.checkoutSessionId);
    if (existing.status === "open" && existing.url) return { url: existing.url };
    if (existing.status === "complete") throw conflict("This invoice has just been paid; the confirmation is on its way. Reload in a moment.");
  }
  const back = `${appUrl.replace(/\/+$/, "")}/projects/${invoice.projectId}`;
  // One key per attempt: the same click twice (or the SDK's retry) gets the same session, but after a
  // session expired — its id cleared by the webhook, or still stored — the key must be new, or the
  // provider would answer the old (expired) session again for as long as it remembers the key.
  const { rows } = await sql<{ n: number }>`select count(*)::int as n from payment_events where invoice_id = ${invoice.id} and outcome = 'session-expired'`.execute(db);
  const attempt = `:${rows[0]?.n ?? 0}${invoice.checkoutSessionId ? `:${invoice.checkoutSessionId}` : ""}`;
  const session = await provider.createCheckoutSession({
    invoiceId: invoice.id,
    description: invoice.description,
    amountMinor: invoice.amountMinor,
    currency: invoice.currency,
    successUrl: `${back}?paid=${invoice.id}`,
    cancelUrl: `${back}?checkout=cancelled`,
    customerEmail: actor.email,
    idempotencyKey: `invoice:${invoice.id}${attempt}`,
  });
  if (!session.url) throw new Error(`payment provider returned checkout session ${session.id} without a url`);
  await setCheckoutSession(db, invoice.id, session.id, session.url);
  return { url: session.url };
}
