import "server-only";
import type { Kysely } from "kysely";
import { clearCheckoutSession, lockInvoiceForSession, markInvoicePaid, recordPaymentEvent, setPaymentEventOutcome } from "@/db/queries/invoices";
import type { Database } from "@/db/schema";
import { reshapeEvent } from "./reshape";
import { verifyPaymentEvent } from "./verify-event";

export type WebhookOutcome =
  | "marked-paid"
  | "already-paid"
  | "invoice-void"
  | "amount-mismatch"
  | "unknown-invoice"
  | "not-paid-yet"
  | "session-expired"
  | "ignored"
  | "duplicate";

export type WebhookResult = { ok: true; eventId: string; outcome: WebhookOutcome } | { ok: false; status: 400; message: string };

/**
 * Handles one webhook delivery: the signature is checked against the raw body first, by the
 * provider's SDK (400 when it does not match — nothing is read from an unsigned body); each event
 * id is recorded once, so a replayed delivery changes nothing; a paid checkout marks its open
 * invoice paid when amount and currency match the invoice.
 */
export async function handlePaymentWebhook(db: Kysely<Database>, payload: string, signature: string | null, secret: string): Promise<WebhookResult> {
  const verified = verifyPaymentEvent(payload, signature, secret);
  if (!verified.ok) return { ok: false, status: 400, message: `Webhook refused: ${verified.reason}` };
  const raw = verified.event;
  if (typeof raw?.id !== "string" || typeof raw.type !== "string") return { ok: false, status: 400, message: "Webhook refused: not an event." };
  const event = reshapeEvent(raw);

  const outcome = await db.transaction().execute(async (trx): Promise<{ outcome: WebhookOutcome; invoiceId: string | null }> => {
    if (!(await recordPaymentEvent(trx, { providerEventId: event.id, type: event.providerType, payload: raw }))) return { outcome: "duplicate", invoiceId: null };
    let result: { outcome: WebhookOutcome; invoiceId: string | null } = { outcome: "ignored", invoiceId: null };
    if (event.kind === "checkout-paid") {
      const invoice = await lockInvoiceForSession(trx, event.session.id, event.session.invoiceId);
      if (!invoice) result = { outcome: "unknown-invoice", invoiceId: null };
      else if (!event.session.paid) result = { outcome: "not-paid-yet", invoiceId: invoice.id };
      else if (invoice.status === "paid") result = { outcome: "already-paid", invoiceId: invoice.id };
      else if (invoice.status === "void") result = { outcome: "invoice-void", invoiceId: invoice.id };
      else if (event.session.amountMinor !== invoice.amountMinor || event.session.currency !== invoice.currency) result = { outcome: "amount-mismatch", invoiceId: invoice.id };
      else {
        await markInvoicePaid(trx, invoice.id, event.session.id);
        result = { outcome: "marked-paid", invoiceId: invoice.id };
      }
    } else if (event.kind === "checkout-expired") {
      await clearCheckoutSession(trx, event.session.id);
      result = { outcome: "session-expired", invoiceId: event.session.invoiceId };
    }
    await setPaymentEventOutcome(trx, event.id, result.outcome, result.invoiceId && /^[0-9a-f-]{36}$/i.test(result.invoiceId) ? result.invoiceId : null);
    return result;
  });
  if (outcome.outcome === "amount-mismatch" || outcome.outcome === "invoice-void" || outcome.outcome === "unknown-invoice") {
    console.error(`[payments] event ${event.id} (${event.providerType}) needs a person: ${outcome.outcome}`);
  }
  return { ok: true, eventId: event.id, outcome: outcome.outcome };
}
