import { createHmac, timingSafeEqual } from "node:crypto";

/** How old a signed webhook may be (the provider's own default tolerance: five minutes). */
export const DEFAULT_TOLERANCE_S = 300;

export class WebhookSignatureError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "WebhookSignatureError";
  }
}

/** The v1 scheme: hex HMAC-SHA256 of `${t}.${payload}` with the endpoint's signing secret. */
export function computeSignature(payload: string, secret: string, timestampS: number): string {
  return createHmac("sha256", secret).update(`${timestampS}.${payload}`, "utf8").digest("hex");
}

/** A signature header `t=<unix seconds>,v1=<hex>` for the payload (the fake provider and tests sign with it). */
export function signatureHeader(payload: string, secret: string, timestampS = Math.floor(Date.now() / 1000)): string {
  return `t=${timestampS},v1=${computeSignature(payload, secret, timestampS)}`;
}

/**
 * Checks a webhook's signature header against the raw body: one of its v1 signatures must be the HMAC
 * of `${t}.${payload}` (constant-time compare) and t within the tolerance of now. Throws
 * WebhookSignatureError saying what is wrong; returns the signed timestamp.
 *
 * @example verifyWebhookSignature(body, "t=1767225600,v1=5257a8…", secret, { nowS: 1767225601 }) // 1767225600
 */
export function verifyWebhookSignature(payload: string, header: string | null, secret: string, opts: { toleranceS?: number; nowS?: number } = {}): number {
  if (!secret) throw new TypeError("secret must be the webhook signing secret");
  if (!header) throw new WebhookSignatureError("The signature header is missing.");
  const parts = header.split(",").map((p) => p.trim().split("=") as [string, string?]);
  const t = Number(parts.find(([k]) => k === "t")?.[1]);
  const signatures = parts.filter(([k, v]) => k === "v1" && v).map(([, v]) => v!);
  if (!Number.isInteger(t) || signatures.length === 0) throw new WebhookSignatureError("The signature header has no timestamp or no v1 signature.");
  const expected = Buffer.from(computeSignature(payload, secret, t), "hex");
  const matches = signatures.some((s) => {
    const given = Buffer.from(s, "hex");
    return given.length === expected.length && timingSafeEqual(given, expected);
  });
  if (!matches) throw new WebhookSignatureError("No signature matches the payload.");
  const now = opts.nowS ?? Math.floor(Date.now() / 1000);
  if (Math.abs(now - t) > (opts.toleranceS ?? DEFAULT_TOLERANCE_S)) throw new WebhookSignatureError("The signature's timestamp is outside the tolerance.");
  return t;
}
