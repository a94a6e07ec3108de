// The local stand-ins for object storage (s3rver) and the payment provider (our fake of the API the
// stripe SDK calls), started together by npm start and npm test unless the environment already
// points at real ones (S3_BUCKET / STRIPE_SECRET_KEY set). The app reaches both through the usual
// SDKs (@aws-sdk/client-s3, stripe); only the endpoints differ.
import { randomBytes } from "node:crypto";
import { rm } from "node:fs/promises";
import path from "node:path";
import { startFakeS3, type FakeS3Handle } from "./fake-s3";
import { startFakeStripe, type FakeStripeHandle } from "./fake-stripe";

export interface LocalProviders {
  /** S3_* and STRIPE_* for the app (empty for what the environment already configures). */
  env: Record<string, string>;
  notes: string[];
  stop(): Promise<void>;
}

export async function startLocalProviders(opts: { root: string; s3Dir?: string; s3Port: number; stripePort: number; appUrl: string; quiet?: boolean; freshS3?: boolean }): Promise<LocalProviders> {
  const env: Record<string, string> = {};
  const notes: string[] = [];
  const log = opts.quiet ? () => {} : undefined;
  let s3: FakeS3Handle | undefined;
  let stripe: FakeStripeHandle | undefined;
  if (!process.env.S3_BUCKET) {
    const dir = opts.s3Dir ?? path.join(opts.root, ".data", "s3");
    // The test database is new each run; so is its bucket.
    if (opts.freshS3) await rm(dir, { recursive: true, force: true });
    s3 = await startFakeS3({ port: opts.s3Port, dir, bucket: "eigenroom-local", log });
    Object.assign(env, { S3_ENDPOINT: s3.endpoint, S3_BUCKET: "eigenroom-local", S3_ACCESS_KEY_ID: s3.accessKeyId, S3_SECRET_ACCESS_KEY: s3.secretAccessKey, S3_REGION: "us-east-1", S3_FORCE_PATH_STYLE: "true" });
    notes.push(`fake S3 (s3rver) on ${s3.endpoint} (files in ${path.relative(opts.root, dir)})`);
  }
  if (!process.env.STRIPE_SECRET_KEY) {
    // A fresh pair each run: nothing to keep secret, nothing to commit.
    const secretKey = `sk_test_local_${randomBytes(12).toString("hex")}`;
    const webhookSecret = `whsec_local_${randomBytes(16).toString("hex")}`;
    const webhookUrl = `${opts.appUrl.replace(/\/+$/, "")}/api/v1/payments/webhook`;
    stripe = await startFakeStripe({ port: opts.stripePort, secretKey, webhookSecret, webhookUrl, log });
    Object.assign(env, { STRIPE_SECRET_KEY: secretKey, STRIPE_API_URL: stripe.apiUrl, STRIPE_WEBHOOK_SECRET: webhookSecret });
    notes.push(`fake payment provider on ${stripe.apiUrl} for the stripe SDK (webhooks to ${webhookUrl})`);
  }
  return {
    env,
    notes,
    async stop() {
      await Promise.allSettled([s3?.stop(), stripe?.stop()]);
    },
  };
}
