import { z } from "zod";

const envSchema = z.object({
  DATABASE_URL: z.string().min(1, "DATABASE_URL is required (npm start sets it for the local cluster)"),
  APP_URL: z.url().default("http://localhost:3000"),
  SMTP_URL: z.string().default("smtp://127.0.0.1:2525"),
  MAIL_FROM: z.string().default("Eigenroom <no-reply@eigenroom.invalid>"),
  /** "true"/"false"; by default cookies are Secure whenever APP_URL is https. */
  COOKIE_SECURE: z.enum(["true", "false"]).optional(),
  /**
   * PKCS#12 file (.p12/.pfx: certificate + private key) that signs issued reports. `npm start` and
   * `npm test` point it at a self-signed development certificate under .data/certs/ (created on first
   * run); in production set it to the firm's own certificate. Without it, reports cannot be issued.
   */
  SIGNING_P12_PATH: z.string().min(1).optional(),
  /** Password of SIGNING_P12_PATH (empty when the file has none). */
  SIGNING_P12_PASSWORD: z.string().optional(),
});

export type ServerEnv = z.infer<typeof envSchema> & { cookieSecure: boolean };

let cached: ServerEnv | undefined;

/** The server's configuration, checked once with a message that says what is missing. */
export function serverEnv(): ServerEnv {
  if (cached) return cached;
  const parsed = envSchema.safeParse(process.env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`).join("\n");
    throw new Error(`Eigenroom's configuration is incomplete:\n${lines}`);
  }
  const env = parsed.data;
  const cookieSecure = env.COOKIE_SECURE ? env.COOKIE_SECURE === "true" : env.APP_URL.startsWith("https:");
  cached = { ...env, cookieSecure };
  return cached;
}

// Object storage and the payment provider are read on first use (not at start), so the rest of the
// app runs without them; each is still checked once, with a message that names what is missing.
const storageEnvSchema = z.object({
  /** S3 API endpoint; `npm start`/`npm test` point it at the local fake (scripts/services/fake-s3.ts). Empty = the provider's default. */
  S3_ENDPOINT: z.url().optional(),
  S3_REGION: z.string().min(1).default("us-east-1"),
  S3_BUCKET: z.string().min(3, "S3_BUCKET is required for uploads (npm start sets it for the local fake)"),
  S3_ACCESS_KEY_ID: z.string().min(1, "S3_ACCESS_KEY_ID is required for uploads"),
  S3_SECRET_ACCESS_KEY: z.string().min(1, "S3_SECRET_ACCESS_KEY is required for uploads"),
  /** "true" (default with S3_ENDPOINT) addresses the bucket in the path, as S3-compatible servers expect. */
  S3_FORCE_PATH_STYLE: z.enum(["true", "false"]).optional(),
});

const paymentsEnvSchema = z.object({
  STRIPE_SECRET_KEY: z.string().min(1, "STRIPE_SECRET_KEY is required for payments (npm start sets a test key for the local fake)"),
  /** Base URL of the provider's API; `npm start`/`npm test` point it at the local fake (scripts/services/fake-stripe.ts). */
  STRIPE_API_URL: z.url().default("https://api.stripe.com"),
  STRIPE_WEBHOOK_SECRET: z.string().min(1, "STRIPE_WEBHOOK_SECRET is required to accept payment webhooks"),
});

export type StorageEnv = z.infer<typeof storageEnvSchema>;
export type PaymentsEnv = z.infer<typeof paymentsEnvSchema>;

function checkedOnce<S extends z.ZodType>(schema: S, what: string): () => z.infer<S> {
  let value: z.infer<S> | undefined;
  return () => {
    if (value) return value;
    const parsed = schema.safeParse(process.env);
    if (!parsed.success) {
      const lines = parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`).join("\n");
      throw new Error(`Eigenroom's ${what} configuration is incomplete:\n${lines}`);
    }
    value = parsed.data;
    return value;
  };
}

/** Object storage settings (room photos, drawings, client files). */
export const storageEnv: () => StorageEnv = checkedOnce(storageEnvSchema, "object storage");
/** Payment provider settings (engineering fee checkout and its webhook). */
export const paymentsEnv: () => PaymentsEnv = checkedOnce(paymentsEnvSchema, "payment provider");
