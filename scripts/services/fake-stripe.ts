// A small local stand-in for the payment provider's API, for development and tests (loopback only).
// It answers the calls the app makes — create and retrieve a checkout session, expire one — with the
// provider's JSON shapes, serves a hosted checkout page of its own at /pay/<id> whose "Pay" button
// marks the session paid, and then delivers a `checkout.session.completed` event to the app's webhook
// URL, signed as the provider signs: header `Stripe-Signature: t=<unix s>,v1=<hex HMAC-SHA256 of
// "<t>.<body>" with the webhook secret>`. State lives in memory; nothing is charged, ever.
import { createHmac, randomBytes } from "node:crypto";
import { createServer, type IncomingMessage, type ServerResponse } from "node:http";
import type { AddressInfo } from "node:net";

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

export interface FakeCheckoutSession {
  id: string;
  object: "checkout.session";
  url: string | null;
  status: "open" | "complete" | "expired";
  payment_status: "paid" | "unpaid";
  mode: "payment";
  amount_total: number;
  currency: string;
  client_reference_id: string | null;
  customer_email: string | null;
  metadata: Record<string, string>;
  success_url: string;
  cancel_url: string | null;
  line_items_summary: { name: string; quantity: number; unit_amount: number }[];
  created: number;
  expires_at: number;
  livemode: false;
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
  /** http://127.0.0.1:<port> — the STRIPE_API_URL to give the app. */
  apiUrl: string;
  sessions: Map<string, FakeCheckoutSession>;
  deliveries: FakeDelivery[];
  setWebhookUrl(url: string | undefined): void;
  /** What the hosted page's Pay button does; resolves with the delivery. */
  pay(sessionId: string): Promise<FakeDelivery>;
  /** Delivers an event again, as the provider retries: same event and body, fresh timestamp and signature. */
  redeliver(eventId: string): Promise<FakeDelivery>;
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

const apiError = (res: ServerResponse, status: number, message: string, extra: Record<string, string> = {}) => sendJson(res, status, { error: { type: "invalid_request_error", message, ...extra } });

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

function checkoutPage(s: FakeCheckoutSession): string {
  const amount = new Intl.NumberFormat("en-GB", { style: "currency", currency: s.currency.toUpperCase() }).format(s.amount_total / 100);
  const items = s.line_items_summary.map((l) => `<li>${html(l.name)}${l.quantity > 1 ? ` × ${l.quantity}` : ""}</li>`).join("");
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
  const byIdempotencyKey = new Map<string, string>();
  const events = new Map<string, { type: string; payload: string }>();
  const deliveries: FakeDelivery[] = [];

  async function deliver(eventId: string): Promise<FakeDelivery> {
    const event = events.get(eventId);
    if (!event) throw new RangeError(`no event ${eventId}`);
    const t = Math.floor(Date.now() / 1000);
    const signature = `t=${t},v1=${createHmac("sha256", opts.webhookSecret).update(`${t}.${event.payload}`, "utf8").digest("hex")}`;
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

  function emit(type: string, object: unknown): string {
    const eventId = id("evt");
    const payload = JSON.stringify({ id: eventId, object: "event", api_version: "2026-01-01", created: Math.floor(Date.now() / 1000), livemode: false, pending_webhooks: 1, type, data: { object } }, null, 2);
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

  function createSession(form: Record<string, unknown>): FakeCheckoutSession | string {
    if (form.mode !== "payment") return "mode must be payment";
    if (typeof form.success_url !== "string" || !/^https?:\/\//.test(form.success_url)) return "success_url must be an absolute URL";
    const items = listOf(form.line_items);
    if (items.length === 0) return "line_items must have at least one item";
    const summary: FakeCheckoutSession["line_items_summary"] = [];
    let currency = "";
    for (const item of items) {
      const price = item.price_data as Record<string, unknown> | undefined;
      const unit = Number(price?.unit_amount);
      const quantity = Number(item.quantity ?? 1);
      const cur = String(price?.currency ?? "");
      if (!price || !Number.isInteger(unit) || unit < 0) return "line_items[].price_data.unit_amount must be a non-negative integer";
      if (!/^[a-z]{3}$/.test(cur)) return "line_items[].price_data.currency must be a lower-case ISO currency code";
      if (currency && cur !== currency) return "all line items must share one currency";
      currency = cur;
      summary.push({ name: String((price.product_data as Record<string, unknown> | undefined)?.name ?? "Item"), quantity, unit_amount: unit });
    }
    const created = Math.floor(Date.now() / 1000);
    const sid = id("cs");
    return {
      id: sid,
      object: "checkout.session",
      url: `${base}/pay/${sid}`,
      status: "open",
      payment_status: "unpaid",
      mode: "payment",
      amount_total: summary.reduce((a, l) => a + l.unit_amount * l.quantity, 0),
      currency,
      client_reference_id: typeof form.client_reference_id === "string" ? form.client_reference_id : null,
      customer_email: typeof form.customer_email === "string" ? form.customer_email : null,
      metadata: Object.fromEntries(Object.entries((form.metadata as Record<string, string> | undefined) ?? {}).map(([k, v]) => [k, String(v)])),
      success_url: form.success_url,
      cancel_url: typeof form.cancel_url === "string" ? form.cancel_url : null,
      line_items_summary: summary,
      created,
      expires_at: created + 24 * 3600,
      livemode: false,
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
        res.end(checkoutPage(s));
        return;
      }
      if (method === "POST") {
        if (s.status === "open") await pay(s.id);
        res.writeHead(303, { location: s.success_url.replace("{CHECKOUT_SESSION_ID}", s.id) });
        res.end();
        return;
      }
    }
    if (!url.pathname.startsWith("/v1/")) {
      res.writeHead(404, { "content-type": "text/plain" });
      res.end("Not found.");
      return;
    }
    if (req.headers.authorization !== `Bearer ${opts.secretKey}`) return apiError(res, 401, "Invalid API Key provided.");
    const body = method === "POST" ? await readBody(req) : "";
    if (method === "POST" && url.pathname === "/v1/checkout/sessions") {
      const key = req.headers["idempotency-key"];
      const known = typeof key === "string" ? byIdempotencyKey.get(key) : undefined;
      if (known) return sendJson(res, 200, sessions.get(known));
      const made = createSession(parseForm(body));
      if (typeof made === "string") return apiError(res, 400, made);
      sessions.set(made.id, made);
      if (typeof key === "string") byIdempotencyKey.set(key, made.id);
      log(`checkout session ${made.id} for ${made.amount_total} ${made.currency}`);
      return sendJson(res, 200, made);
    }
    const one = /^\/v1\/checkout\/sessions\/([\w-]+)(\/expire)?$/.exec(url.pathname);
    if (one) {
      const s = sessions.get(one[1]!);
      if (!s) return apiError(res, 404, `No such checkout.session: '${one[1]}'`, { code: "resource_missing" });
      if (method === "GET" && !one[2]) return sendJson(res, 200, s);
      if (method === "POST" && one[2]) {
        if (s.status !== "open") return apiError(res, 400, `Only an open session can be expired; this one is ${s.status}.`);
        s.status = "expired";
        s.url = null;
        await deliver(emit("checkout.session.expired", s));
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
    stop: () =>
      new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeAllConnections();
      }),
  };
}
