// Paying the engineering fee, against the real test database and the fake payment provider started
// here, through the official SDK (`stripe`) the app uses. The provider's webhook reaches our route
// handler over real HTTP (a loopback server in this test hands each delivery to the handler, as Next
// would), signed by the fake with the SDK's own signer; forged and tampered deliveries below are
// signed with the same SDK helper (`stripe.webhooks.generateTestHeaderString`).
import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import Stripe from "stripe";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import * as checkoutRoute from "@/app/api/v1/invoices/[invoiceId]/checkout/route";
import * as invoiceRoute from "@/app/api/v1/invoices/[invoiceId]/route";
import * as voidRoute from "@/app/api/v1/invoices/[invoiceId]/void/route";
import * as invoicesRoute from "@/app/api/v1/invoices/route";
import * as webhookRoute from "@/app/api/v1/payments/webhook/route";
import { saveFeeSettingsAction } from "@/app/(app)/settings/fees/actions";
import { isFeePaid, reportDownloadGate } from "@/db/queries/invoices";
import { StripeProvider, verifyPaymentEvent } from "@/lib/payments";
import { startFakeStripe, type FakeStripeHandle } from "@/scripts/services/fake-stripe";
import { actAs, callRoute, type DemoWho } from "../support/act-as";
import { resetTables, testDb } from "./support/db";

const SECRET_KEY = "sk_test_integration_key";
const WEBHOOK_SECRET = "whsec_integration_secret";
let stripe: FakeStripeHandle;
let relay: Server;
let hollis: string;
let vale: string;

beforeAll(async () => {
  await resetTables();
  relay = createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on("data", (c: Buffer) => chunks.push(c));
    req.on("end", () => {
      const request = new Request(`http://eigenroom.test${req.url}`, { method: "POST", headers: req.headers as Record<string, string>, body: Buffer.concat(chunks) });
      webhookRoute
        .POST(request)
        .then(async (r) => {
          res.writeHead(r.status, { "content-type": "application/json" });
          res.end(await r.text());
        })
        .catch(() => {
          res.writeHead(500);
          res.end();
        });
    });
  });
  await new Promise<void>((resolve) => relay.listen(0, "127.0.0.1", resolve));
  stripe = await startFakeStripe({ port: 0, secretKey: SECRET_KEY, webhookSecret: WEBHOOK_SECRET, webhookUrl: `http://127.0.0.1:${(relay.address() as AddressInfo).port}/api/v1/payments/webhook`, log: () => {} });
  Object.assign(process.env, { STRIPE_SECRET_KEY: SECRET_KEY, STRIPE_API_URL: stripe.apiUrl, STRIPE_WEBHOOK_SECRET: WEBHOOK_SECRET });
  const id = async (name: string) => (await testDb().selectFrom("projects").select("id").where("name", "=", name).executeTakeFirstOrThrow()).id;
  hollis = await id("Hollis media room");
  vale = await id("Vale home studio");
});

afterAll(async () => {
  await stripe?.stop();
  await new Promise<void>((resolve) => (relay ? relay.close(() => resolve()) : resolve()));
});

const raise = (projectId: string) => callRoute(invoicesRoute.POST, { body: { projectId } });
const list = (projectId: string) => invoicesRoute.GET(new Request(`http://eigenroom.test/api/v1/invoices?projectId=${projectId}`), { params: Promise.resolve({}) });
const checkout = (invoiceId: string) => callRoute(checkoutRoute.POST, { method: "POST", params: { invoiceId } });
const invoiceRow = (id: string) => testDb().selectFrom("invoices").selectAll().where("id", "=", id).executeTakeFirstOrThrow();
/** A `Stripe-Signature` header for the payload, made by the SDK's own test signer. */
const sign = (payload: string, secret: string, timestamp?: number) => Stripe.webhooks.generateTestHeaderString({ payload, secret, ...(timestamp !== undefined && { timestamp }) });
const postWebhook = (payload: string, signature?: string) =>
  webhookRoute.POST(new Request("http://eigenroom.test/api/v1/payments/webhook", { method: "POST", headers: { "content-type": "application/json", ...(signature && { "stripe-signature": signature }) }, body: payload }));

describe("fee settings (owner only)", () => {
  it("saveFeeSettingsAction: the owner sets 850.00 EUR per project with downloads waiting; an engineer may not", async () => {
    await actAs("engineer");
    expect(await saveFeeSettingsAction({ basis: "per-project", amount: "1", currency: "EUR" })).toMatchObject({ ok: false, code: "forbidden" });
    await actAs("owner");
    expect(await saveFeeSettingsAction({ basis: "per-project", amount: "85O", currency: "EUR" })).toMatchObject({ ok: false, code: "bad_request", fields: { amount: [expect.stringContaining("850.00")] } });
    const r = await saveFeeSettingsAction({ basis: "per-project", amount: "850.00", currency: "EUR", downloadsWaitForPayment: true });
    expect(r).toEqual({ ok: true, data: { summary: "€850.00 per project" } });
    const fee = await testDb().selectFrom("fees").selectAll().executeTakeFirstOrThrow();
    expect(fee).toMatchObject({ basis: "per-project", amount_minor: 85000, currency: "EUR", downloads_wait_for_payment: true });
  });
});

let invoiceId: string;

describe("invoices: raising and who sees them", () => {
  it("POST /invoices: an engineer raises the project fee once (201), a second time is 409; builders and clients may not (403)", async () => {
    await actAs("builder");
    expect((await raise(hollis)).status).toBe(403);
    await actAs("client");
    expect((await raise(hollis)).status).toBe(403);
    await actAs("engineer");
    const r = await raise(hollis);
    expect(r.status).toBe(201);
    expect(r.json.invoice).toMatchObject({ projectId: hollis, status: "open", amountMinor: 85000, currency: "EUR", amountText: "€850.00", description: "Engineering fee — Hollis media room" });
    invoiceId = r.json.invoice.id;
    const again = await raise(hollis);
    expect(again.status).toBe(409);
    expect(again.json.error.message).toBe("This project already has an open or paid invoice for the fee.");
  });

  it("GET: the client and staff see the invoice; the builder gets 403; a client of another project gets 404", async () => {
    const expected: Record<Exclude<DemoWho, "anonymous">, number> = { owner: 200, engineer: 200, client: 200, builder: 403, client2: 404 };
    for (const [who, status] of Object.entries(expected) as [Exclude<DemoWho, "anonymous">, number][]) {
      await actAs(who);
      expect((await list(hollis)).status, `${who} list`).toBe(status);
      expect((await callRoute(invoiceRoute.GET, { params: { invoiceId } })).status, `${who} one`).toBe(status);
    }
    await actAs("client");
    const body = await (await list(hollis)).json();
    expect(body.invoices.map((i: { id: string }) => i.id)).toEqual([invoiceId]);
    expect(body.invoices[0]).not.toHaveProperty("checkoutSessionId");
    await actAs("anonymous");
    expect((await list(hollis)).status).toBe(401);
  });

  it("the report download waits: reportDownloadGate names the open invoice and isFeePaid is false", async () => {
    expect(await isFeePaid(testDb(), hollis)).toBe(false);
    expect(await reportDownloadGate(testDb(), hollis)).toEqual({ allowed: false, openInvoiceId: invoiceId });
    expect(await reportDownloadGate(testDb(), vale)).toEqual({ allowed: false, openInvoiceId: null });
  });
});

describe("checkout → webhook → paid", () => {
  it("POST /invoices/{id}/checkout: only the project's client pays (engineer 403, builder 403, client2 404)", async () => {
    for (const [who, status] of [["engineer", 403], ["owner", 403], ["builder", 403], ["client2", 404]] as const) {
      await actAs(who);
      expect((await checkout(invoiceId)).status, who).toBe(status);
    }
    expect(stripe.sessions.size).toBe(0);
  });

  let payUrl: string;
  it("the client gets the provider's hosted page for the invoice's amount; asking again reuses the session", async () => {
    await actAs("client");
    const r = await checkout(invoiceId);
    expect(r.status).toBe(200);
    payUrl = r.json.url;
    expect(payUrl).toMatch(new RegExp(`^${stripe.apiUrl}/pay/cs_test_`));
    const session = [...stripe.sessions.values()][0]!;
    expect(session).toMatchObject({ amount_total: 85000, currency: "eur", client_reference_id: invoiceId, metadata: { invoice_id: invoiceId }, customer_email: "client@larchmere.example", status: "open" });
    expect(session.success_url).toBe(`${process.env.APP_URL}/projects/${hollis}?paid=${invoiceId}`);
    expect((await checkout(invoiceId)).json.url).toBe(payUrl);
    expect(stripe.sessions.size).toBe(1);
    expect((await invoiceRow(invoiceId)).checkout_session_id).toBe(session.id);
  });

  it("paying on the hosted page delivers a signed checkout.session.completed that marks the invoice paid", async () => {
    const page = await fetch(payUrl);
    expect(await page.text()).toContain("Pay €850.00");
    const paid = await fetch(payUrl, { method: "POST", redirect: "manual" });
    expect(paid.status).toBe(303);
    expect(paid.headers.get("location")).toBe(`${process.env.APP_URL}/projects/${hollis}?paid=${invoiceId}`);
    const delivery = stripe.deliveries.at(-1)!;
    expect(delivery).toMatchObject({ type: "checkout.session.completed", status: 200 });
    const row = await invoiceRow(invoiceId);
    expect(row.status).toBe("paid");
    expect(row.paid_at).toBeInstanceOf(Date);
    const event = await testDb().selectFrom("payment_events").selectAll().where("provider_event_id", "=", delivery.eventId).executeTakeFirstOrThrow();
    expect(event).toMatchObject({ type: "checkout.session.completed", outcome: "marked-paid", invoice_id: invoiceId });
    expect(await isFeePaid(testDb(), hollis)).toBe(true);
    expect(await reportDownloadGate(testDb(), hollis)).toEqual({ allowed: true });
    await actAs("client");
    expect((await checkout(invoiceId)).status).toBe(409);
  });

  it("a replayed webhook changes nothing: the provider's retry and the identical delivery both answer duplicate", async () => {
    const first = stripe.deliveries.at(-1)!;
    const before = await invoiceRow(invoiceId);
    const retry = await stripe.redeliver(first.eventId);
    expect(retry.status).toBe(200);
    expect(retry.eventId).toBe(first.eventId);
    const identical = await postWebhook(first.payload, first.signature);
    expect(identical.status).toBe(200);
    expect(await identical.json()).toMatchObject({ received: true, outcome: "duplicate" });
    expect(await invoiceRow(invoiceId)).toEqual(before);
    expect((await testDb().selectFrom("payment_events").select("id").where("provider_event_id", "=", first.eventId).execute()).length).toBe(1);
  });
});

describe("POST /payments/webhook: refusals", () => {
  let openInvoice: string;
  const forged = (overrides: Record<string, unknown> = {}) =>
    JSON.stringify({
      id: `evt_forged_${Math.random().toString(36).slice(2)}`,
      object: "event",
      type: "checkout.session.completed",
      created: Math.floor(Date.now() / 1000),
      livemode: false,
      data: { object: { id: "cs_test_forged", object: "checkout.session", url: null, status: "complete", payment_status: "paid", amount_total: 85000, currency: "eur", client_reference_id: openInvoice, metadata: { invoice_id: openInvoice }, created: 0, ...overrides } },
    });

  beforeAll(async () => {
    await actAs("engineer");
    openInvoice = (await raise(vale)).json.invoice.id;
  });

  it("refuses a bad signature, a missing one and a stale one with 400, recording nothing", async () => {
    const payload = forged();
    const wrongSecret = await postWebhook(payload, sign(payload, "whsec_someone_else"));
    expect(wrongSecret.status).toBe(400);
    expect((await wrongSecret.json()).error).toEqual({ code: "bad_request", message: "Webhook refused: No signature matches the payload." });
    expect((await postWebhook(payload)).status).toBe(400);
    const old = Math.floor(Date.now() / 1000) - 3600;
    const stale = await postWebhook(payload, sign(payload, WEBHOOK_SECRET, old));
    expect(stale.status).toBe(400);
    expect((await stale.json()).error.message).toContain("outside the tolerance");
    const tampered = await postWebhook(payload.replace("85000", "1"), sign(payload, WEBHOOK_SECRET));
    expect(tampered.status).toBe(400);
    expect((await invoiceRow(openInvoice)).status).toBe("open");
    expect(await testDb().selectFrom("payment_events").select("id").where("provider_event_id", "like", "evt_forged_%").execute()).toEqual([]);
  });

  it("a correctly signed event whose amount differs from the invoice is recorded but does not mark it paid", async () => {
    const payload = forged({ amount_total: 100 });
    const r = await postWebhook(payload, sign(payload, WEBHOOK_SECRET));
    expect(r.status).toBe(200);
    expect((await r.json()).outcome).toBe("amount-mismatch");
    expect((await invoiceRow(openInvoice)).status).toBe("open");
  });

  it("an event we do not act on is acknowledged and ignored", async () => {
    const payload = JSON.stringify({ id: "evt_other_1", object: "event", type: "customer.created", created: Math.floor(Date.now() / 1000), livemode: false, data: { object: { id: "cus_1", object: "customer" } } });
    const r = await postWebhook(payload, sign(payload, WEBHOOK_SECRET));
    expect(await r.json()).toMatchObject({ outcome: "ignored" });
  });

  it("POST /invoices/{id}/void: staff void an open invoice; its client then cannot pay it (409), a paid one cannot be voided", async () => {
    await actAs("client2");
    expect((await callRoute(voidRoute.POST, { method: "POST", params: { invoiceId: openInvoice } })).status).toBe(403);
    await actAs("engineer");
    const r = await callRoute(voidRoute.POST, { method: "POST", params: { invoiceId: openInvoice } });
    expect(r.status).toBe(200);
    expect(r.json.invoice.status).toBe("void");
    expect((await callRoute(voidRoute.POST, { method: "POST", params: { invoiceId } })).status).toBe(409);
    await actAs("client2");
    expect((await checkout(openInvoice)).json.error.message).toBe("This invoice was voided by the firm; there is nothing to pay.");
    // With the old one void, a new invoice may be raised for the same project.
    await actAs("engineer");
    expect((await raise(vale)).status).toBe(201);
  });
});

describe("a session that expires", () => {
  it("checkout.session.expired clears the invoice's session; the next checkout opens a new one with a new idempotency key", async () => {
    await actAs("engineer");
    const fresh = (await testDb().selectFrom("invoices").select("id").where("project_id", "=", vale).where("status", "=", "open").executeTakeFirstOrThrow()).id;
    await actAs("client2");
    const first = await checkout(fresh);
    expect(first.status).toBe(200);
    const firstId = (await invoiceRow(fresh)).checkout_session_id!;
    const expired = await stripe.expire(firstId);
    expect(expired).toMatchObject({ type: "checkout.session.expired", status: 200 });
    expect(await testDb().selectFrom("payment_events").select("outcome").where("provider_event_id", "=", expired.eventId).executeTakeFirstOrThrow()).toEqual({ outcome: "session-expired" });
    expect((await invoiceRow(fresh)).checkout_session_id).toBeNull();
    const second = await checkout(fresh);
    expect(second.status).toBe(200);
    expect(second.json.url).not.toBe(first.json.url);
    const secondId = (await invoiceRow(fresh)).checkout_session_id!;
    expect(stripe.sessions.get(secondId)).toMatchObject({ status: "open", metadata: { invoice_id: fresh } });
    expect(stripe.sessions.get(firstId)).toMatchObject({ status: "expired", url: null });
    const late = await fetch(first.json.url, { method: "POST", redirect: "manual" });
    expect(late.status).toBe(409);
    expect(await late.text()).toContain("This checkout has expired.");
  });
});

describe("StripeProvider (the official SDK) against the fake provider", () => {
  const input = (invoiceId: string) => ({ invoiceId, description: "Engineering fee — test", amountMinor: 12345, currency: "GBP", successUrl: "http://127.0.0.1:3998/ok", cancelUrl: "http://127.0.0.1:3998/no", idempotencyKey: `sdk-test:${invoiceId}` });

  it("creates a session from the SDK's form-encoded call and retrieves it; the same idempotency key answers the same session", async () => {
    const provider = new StripeProvider({ secretKey: SECRET_KEY, apiUrl: stripe.apiUrl });
    const made = await provider.createCheckoutSession(input("inv-sdk-1"));
    expect(made).toEqual({ id: expect.stringMatching(/^cs_test_/), url: `${stripe.apiUrl}/pay/${made.id}`, status: "open", paid: false, amountMinor: 12345, currency: "GBP", invoiceId: "inv-sdk-1" });
    expect(await provider.retrieveCheckoutSession(made.id)).toEqual(made);
    expect((await provider.createCheckoutSession(input("inv-sdk-1"))).id).toBe(made.id);
  });

  it("surfaces the provider's refusals as the SDK's errors: reused key with other parameters, unknown session, wrong secret key", async () => {
    const provider = new StripeProvider({ secretKey: SECRET_KEY, apiUrl: stripe.apiUrl, maxNetworkRetries: 0 });
    await provider.createCheckoutSession(input("inv-sdk-2"));
    await expect(provider.createCheckoutSession({ ...input("inv-sdk-2"), amountMinor: 1 })).rejects.toBeInstanceOf(Stripe.errors.StripeIdempotencyError);
    await expect(provider.retrieveCheckoutSession("cs_test_nothing")).rejects.toMatchObject({ type: "StripeInvalidRequestError", statusCode: 404, code: "resource_missing" });
    const stranger = new StripeProvider({ secretKey: "sk_test_not_this_one", apiUrl: stripe.apiUrl, maxNetworkRetries: 0 });
    await expect(stranger.retrieveCheckoutSession("cs_test_nothing")).rejects.toBeInstanceOf(Stripe.errors.StripeAuthenticationError);
  });

  it("verifyPaymentEvent (stripe.webhooks.constructEvent) accepts the fake's delivery for its exact body and refuses any other body", () => {
    const d = stripe.deliveries[0]!;
    const verified = verifyPaymentEvent(d.payload, d.signature, WEBHOOK_SECRET);
    expect(verified).toMatchObject({ ok: true, event: { id: d.eventId, type: "checkout.session.completed", data: { object: { object: "checkout.session", payment_status: "paid" } } } });
    expect(verifyPaymentEvent(`${d.payload} `, d.signature, WEBHOOK_SECRET)).toEqual({ ok: false, reason: "No signature matches the payload." });
    const ids = new Set(stripe.deliveries.map((x) => x.eventId));
    expect(ids.size).toBe(new Set(stripe.deliveries.map((x) => x.payload)).size); // one id per event, retries share it
  });
});
