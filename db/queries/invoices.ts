import { type Kysely, sql, type Transaction } from "kysely";
import type { Database, FeeBasis, InvoiceStatus } from "../schema";

type Db = Kysely<Database> | Transaction<Database>;

/** The firm's engineering fee; undefined until the owner sets one. */
export interface FeeSettings {
  basis: FeeBasis;
  amountMinor: number;
  currency: string;
  downloadsWaitForPayment: boolean;
  updatedAt: Date;
}

export interface Invoice {
  id: string;
  firmId: string;
  projectId: string;
  reportId: string | null;
  description: string;
  amountMinor: number;
  currency: string;
  status: InvoiceStatus;
  checkoutSessionId: string | null;
  checkoutUrl: string | null;
  paidAt: Date | null;
  voidedAt: Date | null;
  createdAt: Date;
}

type InvoiceRow = Awaited<ReturnType<ReturnType<typeof selectInvoices>["executeTakeFirstOrThrow"]>>;

function selectInvoices(db: Db) {
  return db.selectFrom("invoices").selectAll();
}

function toInvoice(r: InvoiceRow): Invoice {
  return {
    id: r.id,
    firmId: r.firm_id,
    projectId: r.project_id,
    reportId: r.report_id,
    description: r.description,
    amountMinor: r.amount_minor,
    currency: r.currency,
    status: r.status,
    checkoutSessionId: r.checkout_session_id,
    checkoutUrl: r.checkout_url,
    paidAt: r.paid_at,
    voidedAt: r.voided_at,
    createdAt: r.created_at,
  };
}

export async function getFeeSettings(db: Db, firmId: string): Promise<FeeSettings | undefined> {
  const r = await db.selectFrom("fees").selectAll().where("firm_id", "=", firmId).executeTakeFirst();
  return r && { basis: r.basis, amountMinor: r.amount_minor, currency: r.currency, downloadsWaitForPayment: r.downloads_wait_for_payment, updatedAt: r.updated_at };
}

export async function saveFeeSettings(db: Db, firmId: string, userId: string, input: Omit<FeeSettings, "updatedAt">): Promise<FeeSettings> {
  const values = { basis: input.basis, amount_minor: input.amountMinor, currency: input.currency, downloads_wait_for_payment: input.downloadsWaitForPayment, updated_by: userId, updated_at: sql<Date>`now()` };
  await db
    .insertInto("fees")
    .values({ firm_id: firmId, ...values })
    .onConflict((oc) => oc.column("firm_id").doUpdateSet(values))
    .execute();
  return (await getFeeSettings(db, firmId))!;
}

export async function listProjectInvoices(db: Db, projectId: string): Promise<Invoice[]> {
  return (await selectInvoices(db).where("project_id", "=", projectId).orderBy("created_at", "desc").orderBy("id").execute()).map(toInvoice);
}

/** An invoice of the firm (callers then check the project's visibility), or undefined. */
export async function findInvoice(db: Db, firmId: string, invoiceId: string): Promise<Invoice | undefined> {
  if (!/^[0-9a-f-]{36}$/i.test(invoiceId)) return undefined;
  const r = await selectInvoices(db).where("firm_id", "=", firmId).where("id", "=", invoiceId).executeTakeFirst();
  return r && toInvoice(r);
}

export async function insertInvoice(db: Db, values: { firmId: string; projectId: string; reportId: string | null; description: string; amountMinor: number; currency: string; createdBy: string }): Promise<Invoice> {
  const r = await db
    .insertInto("invoices")
    .values({ firm_id: values.firmId, project_id: values.projectId, report_id: values.reportId, description: values.description, amount_minor: values.amountMinor, currency: values.currency, created_by: values.createdBy })
    .returningAll()
    .executeTakeFirstOrThrow();
  return toInvoice(r);
}

export async function setCheckoutSession(db: Db, invoiceId: string, sessionId: string, url: string | null): Promise<void> {
  await db.updateTable("invoices").set({ checkout_session_id: sessionId, checkout_url: url, updated_at: sql`now()` }).where("id", "=", invoiceId).where("status", "=", "open").execute();
}

export async function clearCheckoutSession(db: Db, sessionId: string): Promise<number> {
  const r = await db.updateTable("invoices").set({ checkout_session_id: null, checkout_url: null, updated_at: sql`now()` }).where("checkout_session_id", "=", sessionId).where("status", "=", "open").executeTakeFirst();
  return Number(r.numUpdatedRows);
}

export async function voidInvoiceRow(db: Db, invoiceId: string): Promise<Invoice | undefined> {
  const r = await db.updateTable("invoices").set({ status: "void", voided_at: sql`now()`, updated_at: sql`now()` }).where("id", "=", invoiceId).where("status", "=", "open").returningAll().executeTakeFirst();
  return r && toInvoice(r);
}

/** The invoice a checkout session pays for, locked for the rest of the transaction. */
export async function lockInvoiceForSession(trx: Transaction<Database>, sessionId: string, invoiceId: string | null): Promise<Invoice | undefined> {
  let q = trx.selectFrom("invoices").selectAll().forUpdate();
  q = invoiceId && /^[0-9a-f-]{36}$/i.test(invoiceId) ? q.where((eb) => eb.or([eb("checkout_session_id", "=", sessionId), eb("id", "=", invoiceId)])) : q.where("checkout_session_id", "=", sessionId);
  const r = await q.orderBy(sql`checkout_session_id = ${sessionId}`, "desc").executeTakeFirst();
  return r && toInvoice(r);
}

export async function markInvoicePaid(trx: Transaction<Database>, invoiceId: string, sessionId: string): Promise<void> {
  await trx.updateTable("invoices").set({ status: "paid", paid_at: sql`now()`, checkout_session_id: sessionId, checkout_url: null, updated_at: sql`now()` }).where("id", "=", invoiceId).where("status", "=", "open").execute();
}

/** Records a provider event once; false when its id was seen before (a replay: change nothing). */
export async function recordPaymentEvent(trx: Transaction<Database>, event: { providerEventId: string; type: string; payload: unknown }): Promise<boolean> {
  const r = await trx
    .insertInto("payment_events")
    .values({ provider_event_id: event.providerEventId, type: event.type, payload: JSON.stringify(event.payload), outcome: "received" })
    .onConflict((oc) => oc.column("provider_event_id").doNothing())
    .returning("id")
    .executeTakeFirst();
  return r !== undefined;
}

export async function setPaymentEventOutcome(trx: Transaction<Database>, providerEventId: string, outcome: string, invoiceId: string | null): Promise<void> {
  await trx.updateTable("payment_events").set({ outcome, invoice_id: invoiceId }).where("provider_event_id", "=", providerEventId).execute();
}

/**
 * Whether the engineering fee of the project is paid: a paid invoice for the whole project, or — with
 * `reportId` — for that report. For the report download (lib/report): see `reportDownloadGate`.
 */
export async function isFeePaid(db: Db, projectId: string, opts: { reportId?: string } = {}): Promise<boolean> {
  const r = await db
    .selectFrom("invoices")
    .select("id")
    .where("project_id", "=", projectId)
    .where("status", "=", "paid")
    .where((eb) => (opts.reportId ? eb.or([eb("report_id", "is", null), eb("report_id", "=", opts.reportId)]) : eb("report_id", "is", null)))
    .executeTakeFirst();
  return r !== undefined;
}

/** Whether the project's firm makes the client's report download wait for payment of a (non-zero) fee. */
export async function downloadsWaitForPayment(db: Db, projectId: string): Promise<boolean> {
  const r = await db
    .selectFrom("projects as p")
    .innerJoin("fees as f", "f.firm_id", "p.firm_id")
    .select(["f.downloads_wait_for_payment", "f.amount_minor"])
    .where("p.id", "=", projectId)
    .executeTakeFirst();
  return Boolean(r && r.downloads_wait_for_payment && r.amount_minor > 0);
}

/**
 * May the client download the report now? Allowed when the firm does not make downloads wait, or the
 * fee covering the report is paid; otherwise the open invoice to pay (if one was raised).
 */
export async function reportDownloadGate(db: Db, projectId: string, reportId?: string): Promise<{ allowed: true } | { allowed: false; openInvoiceId: string | null }> {
  if (!(await downloadsWaitForPayment(db, projectId))) return { allowed: true };
  if (await isFeePaid(db, projectId, { reportId })) return { allowed: true };
  const open = await db
    .selectFrom("invoices")
    .select("id")
    .where("project_id", "=", projectId)
    .where("status", "=", "open")
    .where((eb) => (reportId ? eb.or([eb("report_id", "is", null), eb("report_id", "=", reportId)]) : eb("report_id", "is", null)))
    .orderBy("created_at")
    .executeTakeFirst();
  return { allowed: false, openInvoiceId: open?.id ?? null };
}
