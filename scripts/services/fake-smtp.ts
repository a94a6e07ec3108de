// A local SMTP server that accepts every message and files it in the `dev_outbox` table, where the
// owner-only development outbox page (and the e2e tests) read it. Loopback only; nothing is relayed.
import { simpleParser } from "mailparser";
import pg from "pg";
import { SMTPServer, type SMTPServerAddress } from "smtp-server";

export const MAX_MESSAGE_BYTES = 25 * 1024 * 1024;

export interface FakeSmtpOptions {
  port: number;
  /** Loopback only: 127.0.0.1 (default) or ::1. */
  host?: "127.0.0.1" | "::1";
  /** The database whose dev_outbox receives the messages. */
  databaseUrl: string;
  log?: (line: string) => void;
}

export interface FakeSmtpHandle {
  port: number;
  stop(): Promise<void>;
}

/** Starts the fake SMTP server; resolves once it listens. */
export async function startFakeSmtp(opts: FakeSmtpOptions): Promise<FakeSmtpHandle> {
  const host = opts.host ?? "127.0.0.1";
  if (host !== "127.0.0.1" && host !== "::1") throw new RangeError(`host must be a loopback address, got ${String(host)}`);
  const log = opts.log ?? ((line: string) => console.log(`smtp: ${line}`));
  const pool = new pg.Pool({ connectionString: opts.databaseUrl, max: 3 });

  const server = new SMTPServer({
    name: "eigenroom-dev-outbox",
    banner: "Eigenroom development outbox (messages are stored, never delivered)",
    // smtp-server's bundled certificate has expired: offer no TLS at all.
    disabledCommands: ["STARTTLS"],
    secure: false,
    // No reverse DNS of the client: on a machine without a resolver it stalls the greeting.
    disableReverseLookup: true,
    authOptional: true,
    // A production-like SMTP_URL with credentials works against the fake too.
    allowInsecureAuth: true,
    onAuth(auth, _session, callback) {
      callback(null, { user: auth.username ?? "anonymous" });
    },
    size: MAX_MESSAGE_BYTES,
    logger: false,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on("data", (chunk: Buffer) => chunks.push(chunk));
      stream.on("error", (err) => callback(err));
      stream.on("end", () => {
        if (stream.sizeExceeded) {
          const err = Object.assign(new Error(`message exceeds the ${MAX_MESSAGE_BYTES} byte limit`), { responseCode: 552 });
          callback(err);
          return;
        }
        const raw = Buffer.concat(chunks);
        const envelopeFrom = session.envelope.mailFrom ? (session.envelope.mailFrom as SMTPServerAddress).address : null;
        const envelopeTo = session.envelope.rcptTo.map((r) => r.address);
        store(pool, raw, envelopeFrom, envelopeTo)
          .then((id) => {
            log(`stored message ${id} for ${envelopeTo.join(", ")}`);
            callback(null, `stored as dev_outbox ${id}`);
          })
          .catch((err: unknown) => {
            const reason = err instanceof Error ? err.message : String(err);
            log(`could not store a message for ${envelopeTo.join(", ")}: ${reason}`);
            callback(Object.assign(new Error(`outbox unavailable: ${reason}`), { responseCode: 451 }));
          });
      });
    },
  });

  await new Promise<void>((resolve, reject) => {
    const onError = (err: Error) => reject(new Error(`fake SMTP server could not listen on ${host}:${opts.port}: ${err.message}`));
    server.once("error", onError);
    server.listen(opts.port, host, () => {
      server.off("error", onError);
      server.on("error", (err) => log(`error: ${err.message}`));
      resolve();
    });
  });

  let stopped = false;
  return {
    port: opts.port,
    stop: async () => {
      if (stopped) return;
      stopped = true;
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await pool.end();
    },
  };
}

/** PostgreSQL text cannot hold NUL characters. */
function clean(value: string | null | undefined): string | null {
  return value == null ? null : value.replace(/\u0000/g, "");
}

async function store(pool: pg.Pool, raw: Buffer, envelopeFrom: string | null, envelopeTo: string[]): Promise<string> {
  const parsed = await simpleParser(raw);
  const attachments = parsed.attachments.map((a) => ({
    filename: a.filename ?? null,
    contentType: a.contentType,
    size: a.size,
  }));
  const html = typeof parsed.html === "string" ? parsed.html : null;
  const result = await pool.query<{ id: string }>(
    `insert into dev_outbox (envelope_from, envelope_to, subject, text_body, html_body, raw, attachments)
     values ($1, $2, $3, $4, $5, $6, $7::jsonb) returning id::text as id`,
    [clean(envelopeFrom), envelopeTo.map((a) => clean(a) ?? ""), clean(parsed.subject), clean(parsed.text), clean(html), clean(raw.toString("utf8")), JSON.stringify(attachments)],
  );
  return result.rows[0]?.id ?? "?";
}
