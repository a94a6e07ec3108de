// End-to-end helpers: Debian's Chromium through playwright-core, the app's URL, signing in,
// screenshots, and the development outbox of the test database. `npm test` sets APP_URL and
// DATABASE_URL (the test app on its own port and the `eigenroom_test` database).
import fs from "node:fs";
import path from "node:path";
import pg from "pg";
import { type Browser, type BrowserContext, chromium, type Page } from "playwright-core";

export const CHROMIUM_PATH = "/usr/bin/chromium";

/** Chromium flags that work on this kind of machine (also as root); see ../shared/STACK.md. */
export const CHROMIUM_ARGS = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

const root = path.resolve(path.dirname(new URL(import.meta.url).pathname), "..", "..", "..");
export const SCREENSHOT_DIR = path.join(root, "tests", "e2e", "screenshots");

/**
 * Launches headless Chromium. Each launch gets a fresh, temporary user-data-dir (playwright makes
 * one and removes it on close); each `browser.newContext()` is a separate cookie jar, so one
 * browser can hold several signed-in roles side by side.
 */
export async function launchBrowser(): Promise<Browser> {
  if (!fs.existsSync(CHROMIUM_PATH)) throw new Error(`${CHROMIUM_PATH} is missing; npm test installs Debian's chromium package`);
  return chromium.launch({ executablePath: CHROMIUM_PATH, headless: true, args: CHROMIUM_ARGS });
}

/** A new isolated session (own cookies) with one page. Close the context when done. */
export async function newSession(browser: Browser): Promise<{ context: BrowserContext; page: Page }> {
  const context = await browser.newContext({ baseURL: appUrl("/"), viewport: { width: 1280, height: 900 } });
  const page = await context.newPage();
  return { context, page };
}

/** The absolute URL of `pathname` on the app under test (APP_URL, default http://127.0.0.1:3100). */
export function appUrl(pathname = "/"): string {
  const base = process.env.APP_URL ?? "http://127.0.0.1:3100";
  return new URL(pathname, base.endsWith("/") ? base : `${base}/`).href;
}

/**
 * Signs in on /sign-in: fills the fields labelled exactly "Email" and "Password" and presses the
 * button named "Sign in". By default waits until the browser has left /sign-in and throws if it
 * does not; pass `{ expectSuccess: false }` to test a refused sign-in.
 */
export async function signIn(page: Page, email: string, password: string, opts: { expectSuccess?: boolean; timeoutMs?: number } = {}): Promise<void> {
  const timeout = opts.timeoutMs ?? 20_000;
  await page.goto(appUrl("/sign-in"));
  await page.getByLabel("Email", { exact: true }).fill(email);
  await page.getByLabel("Password", { exact: true }).fill(password);
  await page.getByRole("button", { name: "Sign in", exact: true }).click();
  if (opts.expectSuccess === false) return;
  try {
    await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"), { timeout });
  } catch {
    const alert = await page
      .getByRole("alert")
      .allInnerTexts()
      .catch(() => []);
    throw new Error(`sign-in as ${email} did not leave /sign-in within ${timeout / 1000} s${alert.length ? ` (page says: ${alert.join(" / ")})` : ""}`);
  }
}

/** Saves a full-page PNG as tests/e2e/screenshots/<name>.png (git-ignored) and returns its path. */
export async function screenshot(page: Page, name: string): Promise<string> {
  const safe = name.replace(/[^a-zA-Z0-9._-]+/g, "-");
  fs.mkdirSync(SCREENSHOT_DIR, { recursive: true });
  const file = path.join(SCREENSHOT_DIR, `${safe}.png`);
  await page.screenshot({ path: file, fullPage: true });
  return file;
}

export interface OutboxMessage {
  id: number;
  receivedAt: Date;
  envelopeFrom: string | null;
  envelopeTo: string[];
  subject: string | null;
  textBody: string | null;
  htmlBody: string | null;
  raw: string;
  attachments: { filename: string | null; contentType: string; size: number }[];
}

let outboxPool: pg.Pool | undefined;

function pool(): pg.Pool {
  if (!outboxPool) {
    const connectionString = process.env.DATABASE_URL;
    if (!connectionString) throw new Error("DATABASE_URL is not set; run the e2e tests through npm test");
    outboxPool = new pg.Pool({ connectionString, max: 2 });
  }
  return outboxPool;
}

/** The id of the newest outbox message (0 when empty); pass it as `afterId` to wait for a newer one. */
export async function latestOutboxId(): Promise<number> {
  const { rows } = await pool().query<{ id: string | null }>("select max(id)::text as id from dev_outbox");
  return Number(rows[0]?.id ?? 0);
}

/**
 * The newest development-outbox message addressed to `recipient` (case-insensitive), waiting up to
 * `timeoutMs` for it to arrive. With `afterId`, only messages newer than that id count. Throws when
 * none arrives in time.
 */
export async function latestOutboxMessage(recipient: string, opts: { afterId?: number; timeoutMs?: number } = {}): Promise<OutboxMessage> {
  const deadline = Date.now() + (opts.timeoutMs ?? 15_000);
  for (;;) {
    const { rows } = await pool().query(
      `select id::text as id, received_at, envelope_from, envelope_to, subject, text_body, html_body, raw, attachments
         from dev_outbox
        where id > $2 and exists (select 1 from unnest(envelope_to) t where lower(t) = lower($1))
        order by id desc
        limit 1`,
      [recipient, opts.afterId ?? 0],
    );
    const row = rows[0];
    if (row) {
      return {
        id: Number(row.id),
        receivedAt: row.received_at,
        envelopeFrom: row.envelope_from,
        envelopeTo: row.envelope_to,
        subject: row.subject,
        textBody: row.text_body,
        htmlBody: row.html_body,
        raw: row.raw,
        attachments: row.attachments,
      };
    }
    if (Date.now() > deadline) throw new Error(`no development-outbox message for ${recipient} arrived in time`);
    await new Promise((r) => setTimeout(r, 250));
  }
}

/** The first link in a message's text (or HTML) body whose path starts with `pathPrefix`. */
export function findLink(message: OutboxMessage, pathPrefix: string): string {
  const haystack = `${message.textBody ?? ""}\n${message.htmlBody ?? ""}`;
  for (const match of haystack.matchAll(/https?:\/\/[^\s"'<>]+/g)) {
    const candidate = match[0].replace(/&amp;/g, "&").replace(/[).,;]+$/, "");
    try {
      if (new URL(candidate).pathname.startsWith(pathPrefix)) return candidate;
    } catch {
      // not a URL after all
    }
  }
  throw new Error(`message ${message.id} ("${message.subject ?? ""}") has no link to ${pathPrefix}`);
}

/** Closes the outbox connection pool (call in afterAll of files that used the outbox helpers). */
export async function closeOutbox(): Promise<void> {
  await outboxPool?.end();
  outboxPool = undefined;
}
