// A small local stand-in for the payment provider's API, for development and tests (loopback only).
// It answers exactly the calls the app's SDK client makes (lib/payments/stripe-provider.ts: the
// official `stripe` package pointed here with host/port/protocol) — POST /v1/checkout/sessions
// (form-encoded, with an Idempotency-Key), GET /v1/checkout/sessions/<id>, and for tests
// POST /v1/checkout/sessions/<id>/expire and GET /v1/events/<id> — with objects of the SDK's own
// types. It serves a hosted checkout page of its own at /pay/<id> whose "Pay" button marks the
// session paid and then POSTs a `checkout.session.completed` event to the app's webhook URL, signed
// by the SDK's own signer (`stripe.webhooks.generateTestHeaderString`). State lives in memory;
// nothing is charged, ever.
import { createHash, randomBytes } from "node:crypto";
import { createServer, type IncomingMessage, type ServerResponse } from "node:http";
import type { AddressInfo } from "node:net";
import Stripe from "stripe";

export interface FakeStripeOptions {
  /** 0 = any free port. */
  port: number;
  host?: "127.0.0.1" | "::1";
  /** The secret key the app must send (Authorization: Bearer …). */
  secretKey: string;
  /** Signs webhook deliveries. */
  webhookSecret: string;
  /** Where events are POSTed (the app's /api/v1/payments/webhook); none = events are only recorded. */
  webhookUrl?: string;
  log?: (line: string) => void;
}

/** The session fields the fake fills, typed by the SDK (so what it answers is what the SDK reads). */
export type FakeCheckoutSession = Pick<
  Stripe.Checkout.Session,
  | "id"
  | "object"
  | "url"
  | "status"
  | "payment_status"
  | "mode"
  | "amount_subtotal"
  | "amount_total"
  | "currency"
  | "client_reference_id"
  | "customer_email"
  | "metadata"
  | "success_url"
  | "cancel_url"
  | "created"
  | "expires_at"
  | "livemode"
>;

interface LineItem {
  name: string;
  quantity: number;
  unitAmount: number;
}

export interface FakeDelivery {
  eventId: string;
  type: string;
  payload: string;
  signature: string;
  status: number | "failed";
}

export interface FakeStripeHandle {
  port: number;
  /** http://127.0.0.1:<port> — the STRIPE_API_URL to give the app (its SDK client derives host, port and protocol). */
  apiUrl: string;
  sessions: Map<string, FakeCheckoutSession>;
  deliveries: FakeDelivery[];
  setWebhookUrl(url: string | undefined): void;
  /** What the hosted page's Pay button does; resolves with the delivery. */
  pay(sessionId: string): Promise<FakeDelivery>;
  /** Delivers an event again, as the provider retries: same event and body, fresh timestamp and signature. */
  redeliver(eventId: string): Promise<FakeDelivery>;
  /** Expires an open session (as the provider does after 24 h) and delivers `checkout.session.expired`. */
  expire(sessionId: string): Promise<FakeDelivery>;
  stop(): Promise<void>;
}

const id = (prefix: string) => `${prefix}_test_${randomBytes(12).toString("base64url")}`;

/** `a[b][0][c]=v` form parameters → nested objects/arrays (as the provider reads them). */
export function parseForm(body: string): Record<string, unknown> {
  const root: Record<string, unknown> = {};
  for (const [fullKey, value] of new URLSearchParams(body)) {
    const path = fullKey.split(/\[|\]\[|\]/).filter((p) => p !== "");
    let node: Record<string, unknown> = root;
    path.forEach((part, i) => {
      if (i === path.length - 1) node[part] = value;
      else node = (node[part] ??= {}) as Record<string, unknown>;
    });
  }
  return root;
}

const listOf = (v: unknown): Record<string, unknown>[] => (v && typeof v === "object" ? Object.keys(v).sort((a, b) => Number(a) - Number(b)).map((k) => (v as Record<string, Record<string, unknown>>)[k]!) : []);

function html(s: string): string {
  return s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");
}

function sendJson(res: ServerResponse, status: number, body: unknown): void {
  res.writeHead(status, { "content-type": "application/json" });
  res.end(JSON.stringify(body));
}

/** The provider's error body; the SDK turns it into its StripeError subclasses by `type` and status. */
const apiError = (res: ServerResponse, status: number, message: string, extra: Record<string, string> = {}, type = "invalid_request_error") => sendJson(res, status, { error: { type, message, ...extra } });

async function readBody(req: IncomingMessage): Promise<string> {
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const c of req) {
    size += (c as Buffer).length;
    if (size > 256 * 1024) throw new Error("request body too large");
    chunks.push(c as Buffer);
  }
  return Buffer.concat(chunks).toString("utf8");
}

function checkoutPage(s: FakeCheckoutSession, lines: LineItem[]): string {
  const amount = new Intl.NumberFormat("en-GB", { style: "currency", currency: (s.currency ?? "eur").toUpperCase() }).format((s.amount_total ?? 0) / 100);
  const items = lines.map((l) => `<li>${html(l.name)}${l.quantity > 1 ? ` × ${l.quantity}` : ""}</li>`).join("");
  const state =
    s.status === "open"
      ? `<form method="post" action="/pay/${html(s.id)}"><button type="submit">Pay ${html(amount)}</button></form>${s.cancel_url ? `<p><a href="${html(s.cancel_url)}">Cancel and go back</a></p>` : ""}`
      : `<p role="status">${s.status === "complete" ? "This checkout is paid." : "This checkout has expired."}</p>`;
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>Test checkout</title><meta name="viewport" content="width=device-width,initial-scale=1">
<style>body{font:16px/1.5 system-ui,sans-serif;background:#f3f1ec;color:#1f2328;display:grid;place-items:center;min-height:100vh;margin:0}
main{background:#fff;border:1px solid #ddd8cc;border-radius:12px;padding:28px 32px;max-width:26rem;width:100%}
.tag{font-size:12px;letter-spacing:.08em;text-transform:uppercase;color:#8a5a2b}.amount{font-size:32px;font-weight:600;margin:4px 0 12px}
button{font:inherit;background:#2d5b4f;color:#fff;border:0;border-radius:8px;padding:10px 18px;cursor:pointer;width:100%}
ul{padding-left:1.1rem;color:#555}</style></head>
<body><main><div class="tag">Local test checkout — no money moves</div><div class="amount">${html(amount)}</div><ul>${items}</ul>
${s.customer_email ? `<p>Paying as ${html(s.customer_email)}</p>` : ""}${state}</main></body></html>`;
}

/** Starts the fake payment provider; resolves once it listens. */
export async function startFakeStripe(opts: FakeStripeOptions): Promise<FakeStripeHandle> {
  const host = opts.host ?? "127.0.0.1";
  if (host !== "127.0.0.1" && host !== "::1") throw new RangeError(`host must be a loopback address, got ${String(host)}`);
  const log = opts.log ?? ((line: string) => console.log(`payments: ${line}`));
  let webhookUrl = opts.webhookUrl;
  let base = "";
  const sessions = new Map<string, FakeCheckoutSession>();
  const lineItems = new Map<string, LineItem[]>();
  // Idempotency-Key → the session it made and a hash of the parameters it was first sent with.
  const byIdempotencyKey = new Map<string, { sessionId: string; paramsHash: string }>();
  const events = new Map<string, { type: string; payload: string }>();
  const deliveries: FakeDelivery[] = [];

  async function deliver(eventId: string): Promise<FakeDelivery> {
    const event = events.get(eventId);
    if (!event) throw new RangeError(`no event ${eventId}`);
    // The SDK's own signer: `t=<unix s>,v1=<HMAC-SHA256 of "<t>.<body>">`, fresh timestamp each delivery.
    const signature = Stripe.webhooks.generateTestHeaderString({ payload: event.payload, secret: opts.webhookSecret });
    let status: number | "failed" = "failed";
    if (webhookUrl) {
      try {
        const res = await fetch(webhookUrl, { method: "POST", headers: { "content-type": "application/json; charset=utf-8", "stripe-signature": signature, "user-agent": "eigenroom-fake-payments/1" }, body: event.payload, signal: AbortSignal.timeout(15_000) });
        status = res.status;
        await res.text();
      } catch (err) {
        log(`delivery of ${eventId} to ${webhookUrl} failed: ${err instanceof Error ? err.message : String(err)}`);
      }
    }
    const delivery = { eventId, type: event.type, payload: event.payload, signature, status };
    deliveries.push(delivery);
    log(`event ${event.type} ${eventId} → ${webhookUrl ?? "(no webhook url)"}: ${status}`);
    return delivery;
  }

  function emit(type: "checkout.session.completed" | "checkout.session.expired", object: FakeCheckoutSession): string {
    const eventId = id("evt");
    const event = {
      id: eventId,
      object: "event",
      api_version: Stripe.API_VERSION,
      created: Math.floor(Date.now() / 1000),
      livemode: false,
      pending_webhooks: 1,
      request: { id: null, idempotency_key: null },
      type,
      data: { object: { ...object, metadata: { ...object.metadata } } },
    };
    const payload = JSON.stringify(event, null, 2);
    events.set(eventId, { type, payload });
    return eventId;
  }

  async function pay(sessionId: string): Promise<FakeDelivery> {
    const s = sessions.get(sessionId);
    if (!s) throw new RangeError(`no checkout session ${sessionId}`);
    if (s.status !== "open") throw new RangeError(`checkout session ${sessionId} is ${s.status}`);
    s.status = "complete";
    s.payment_status = "paid";
    s.url = null;
    return deliver(emit("checkout.session.completed", s));
  }

  async function expire(sessionId: string): Promise<FakeDelivery> {
    const s = sessions.get(sessionId);
    if (!s) throw new RangeError(`no checkout session ${sessionId}`);
    if (s.status !== "open") throw new RangeError(`checkout session ${sessionId} is ${s.status}`);
    s.status = "expired";
    s.url = null;
    return deliver(emit("checkout.session.expired", s));
  }

  function createSession(form: Record<string, unknown>): { session: FakeCheckoutSession; lines: LineItem[] } | { param: string; message: string } {
    if (form.mode !== "payment") return { param: "mode", message: "mode must be payment" };
    if (typeof form.success_url !== "string" || !/^https?:\/\//.test(form.success_url)) return { param: "success_url", message: "success_url must be an absolute URL" };
    if (form.cancel_url !== undefined && (typeof form.cancel_url !== "string" || !/^https?:\/\//.test(form.cancel_url))) return { param: "cancel_url", message: "cancel_url must be an absolute URL" };
    const items = listOf(form.line_items);
    if (items.length === 0) return { param: "line_items", message: "line_items must have at least one item" };
    const lines: LineItem[] = [];
    let currency = "";
    for (const [i, item] of items.entries()) {
      const price = item.price_data as Record<string, unknown> | undefined;
      const unitAmount = Number(price?.unit_amount);
      const quantity = Number(item.quantity ?? 1);
      const cur = String(price?.currency ?? "");
      if (!price || !/^\d+$/.test(String(price.unit_amount))) return { param: `line_items[${i}][price_data][unit_amount]`, message: "unit_amount must be a non-negative integer" };
      if (!Number.isInteger(quantity) || quantity < 1) return { param: `line_items[${i}][quantity]`, message: "quantity must be a positive integer" };
      if (!/^[a-z]{3}$/.test(cur)) return { param: `line_items[${i}][price_data][currency]`, message: "currency must be a lower-case ISO currency code" };
      if (currency && cur !== currency) return { param: `line_items[${i}][price_data][currency]`, message: "all line items must share one currency" };
      currency = cur;
      lines.push({ name: String((price.product_data as Record<string, unknown> | undefined)?.name ?? "Item"), quantity, unitAmount });
    }
    const created = Math.floor(Date.now() / 1000);
    const sid = id("cs");
    const total = lines.reduce((a, l) => a + l.unitAmount * l.quantity, 0);
    const metadata = Object.fromEntries(Object.entries((form.metadata as Record<string, unknown> | undefined) ?? {}).map(([k, v]) => [k, String(v)]));
    return {
      lines,
      session: {
        id: sid,
        object: "checkout.session",
        url: `${base}/pay/${sid}`,
        status: "open",
        payment_status: "unpaid",
        mode: "payment",
        amount_subtotal: total,
        amount_total: total,
        currency,
        client_reference_id: typeof form.client_reference_id === "string" ? form.client_reference_id : null,
        customer_email: typeof form.customer_email === "string" ? form.customer_email : null,
        metadata,
        success_url: form.success_url,
        cancel_url: typeof form.cancel_url === "string" ? form.cancel_url : null,
        created,
        expires_at: created + 24 * 3600,
        livemode: false,
      },
    };
  }

  async function handle(req: IncomingMessage, res: ServerResponse): Promise<void> {
    const url = new URL(req.url ?? "/", base);
    const method = req.method ?? "GET";
    const payPath = /^\/pay\/([\w-]+)$/.exec(url.pathname);
    if (payPath) {
      const s = sessions.get(payPath[1]!);
      if (!s) {
        res.writeHead(404, { "content-type": "text/plain" });
        res.end("No such checkout.");
        return;
      }
      if (method === "GET") {
        res.writeHead(200, { "content-type": "text/html; charset=utf-8" });
        res.end(checkoutPage(s, lineItems.get(s.id) ?? []));
        return;
      }
      if (method === "POST") {
        if (s.status === "open") await pay(s.id);
        if (s.status === "expired") {
          // Nothing to pay any more: the page says so instead of sending the client back as if paid.
          res.writeHead(409, { "content-type": "text/html; charset=utf-8" });
          res.end(checkoutPage(s, lineItems.get(s.id) ?? []));
          return;
        }
        res.writeHead(303, { location: (s.success_url ?? "/").replace("{CHECKOUT_SESSION_ID}", s.id) });
        res.end();
        return;
      }
    }
    if (!url.pathname.startsWith("/v1/")) {
      res.writeHead(404, { "content-type": "text/plain" });
      res.end("Not found.");
      return;
    }
    if (req.headers.authorization !== `Bearer ${opts.secretKey}`) return apiError(res, 401, "Invalid API Key provided.", {}, "invalid_request_error");
    const body = method === "POST" ? await readBody(req) : "";
    if (method === "POST" && body && !String(req.headers["content-type"] ?? "").startsWith("application/x-www-form-urlencoded")) {
      return apiError(res, 400, "Parameters must be sent form-encoded (application/x-www-form-urlencoded).");
    }
    if (method === "POST" && url.pathname === "/v1/checkout/sessions") {
      const key = req.headers["idempotency-key"];
      const paramsHash = createHash("sha256").update(body).digest("hex");
      const known = typeof key === "string" ? byIdempotencyKey.get(key) : undefined;
      if (known) {
        // As the provider does: the same key answers the same session, but only for the same parameters.
        if (known.paramsHash !== paramsHash) return apiError(res, 400, `Keys for idempotent requests can only be used with the same parameters they were first used with. Try using a key other than '${key}' if you meant to execute a different request.`, {}, "idempotency_error");
        return sendJson(res, 200, sessions.get(known.sessionId));
      }
      const made = createSession(parseForm(body));
      if ("message" in made) return apiError(res, 400, made.message, { param: made.param, code: "parameter_invalid" });
      sessions.set(made.session.id, made.session);
      lineItems.set(made.session.id, made.lines);
      if (typeof key === "string") byIdempotencyKey.set(key, { sessionId: made.session.id, paramsHash });
      log(`checkout session ${made.session.id} for ${made.session.amount_total} ${made.session.currency}`);
      return sendJson(res, 200, made.session);
    }
    const one = /^\/v1\/checkout\/sessions\/([\w-]+)(\/expire)?$/.exec(url.pathname);
    if (one) {
      const s = sessions.get(one[1]!);
      if (!s) return apiError(res, 404, `No such checkout.session: '${one[1]}'`, { code: "resource_missing", param: "session" });
      if (method === "GET" && !one[2]) return sendJson(res, 200, s);
      if (method === "POST" && one[2]) {
        if (s.status !== "open") return apiError(res, 400, `Only an open session can be expired; this one is ${s.status}.`);
        await expire(s.id);
        return sendJson(res, 200, s);
      }
    }
    const ev = /^\/v1\/events\/([\w-]+)$/.exec(url.pathname);
    if (ev && method === "GET") {
      const e = events.get(ev[1]!);
      return e ? sendJson(res, 200, JSON.parse(e.payload)) : apiError(res, 404, `No such event: '${ev[1]}'`, { code: "resource_missing" });
    }
    return apiError(res, 404, `Unrecognized request URL (${method}: ${url.pathname}).`);
  }

  const server = createServer((req, res) => {
    handle(req, res).catch((err: unknown) => {
      log(`error: ${err instanceof Error ? err.message : String(err)}`);
      if (!res.headersSent) apiError(res, 500, "The fake payment provider failed; see its log.");
      else res.destroy();
    });
  });
  await new Promise<void>((resolve, reject) => {
    const onError = (err: Error) => reject(new Error(`fake payment provider could not listen on ${host}:${opts.port}: ${err.message}`));
    server.once("error", onError);
    server.listen(opts.port, host, () => {
      server.off("error", onError);
      resolve();
    });
  });
  const port = (server.address() as AddressInfo).port;
  base = `http://${host === "::1" ? "[::1]" : host}:${port}`;
  log(`listening on ${base}; webhooks → ${webhookUrl ?? "(none yet)"}`);
  return {
    port,
    apiUrl: base,
    sessions,
    deliveries,
    setWebhookUrl: (u) => {
      webhookUrl = u;
    },
    pay,
    redeliver: deliver,
    expire,
    stop: () =>
      new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeAllConnections();
      }),
  };
}
