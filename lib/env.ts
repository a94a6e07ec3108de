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
