// `npm start`: PostgreSQL, migrations, the demo seed, the fake SMTP server, then Next.js on
// http://localhost:3000 (`--dev`: `next dev` instead of build + start). Ctrl-C, SIGTERM or the end of
// Next stops everything this process started.
import path from "node:path";
import { createDb } from "../db/create-db";
import { migrateToLatest } from "../db/migrate";
import { seedDemo } from "../db/seed";
import { DEMO_ACCOUNTS } from "../db/seed-data";
import { ensureDevCertificate } from "./services/dev-certificate";
import { startFakeSmtp, type FakeSmtpHandle } from "./services/fake-smtp";
import { startLocalProviders, type LocalProviders } from "./services/local-providers";
import { stopServices } from "./services/stop-services";
import { buildFingerprint, buildIsCurrent, forgetBuild, recordBuild } from "./services/next-build";
import { createDatabaseIfMissing, ensurePostgres, portIsFree, type PostgresHandle } from "./services/postgres";
import { type ManagedChild, reapOrphans, runToEnd, seconds, spawnManaged, trackChildrenIn, waitForHttp } from "./services/processes";

const root = path.resolve(path.dirname(new URL(import.meta.url).pathname), "..");
const dev = process.argv.includes("--dev");
const forceBuild = process.argv.includes("--rebuild") || process.env.EIGENROOM_REBUILD === "1";
const unknown = process.argv.slice(2).filter((a) => a !== "--dev" && a !== "--rebuild");
if (unknown.length > 0) {
  console.error(`usage: npm start [-- --rebuild]   |   npm run dev\nunknown arguments: ${unknown.join(" ")}`);
  process.exit(2);
}

const port = Number(process.env.PORT ?? 3000);
const smtpPort = Number(process.env.EIGENROOM_SMTP_PORT ?? 2525);
const appUrl = process.env.APP_URL ?? `http://localhost:${port}`;
const nextBin = path.join(root, "node_modules", ".bin", "next");
const t0 = Date.now();

let pgStarting: Promise<PostgresHandle> | undefined;
let smtp: FakeSmtpHandle | undefined;
let providers: LocalProviders | undefined;
let server: ManagedChild | undefined;
let shuttingDown = false;
let shutdownAt = 0;

function say(line: string): void {
  console.log(`eigenroom: ${line}`);
}

async function shutdown(code: number, why: string): Promise<never> {
  if (shuttingDown) {
    // The same signal often arrives twice (from the terminal and relayed by npm/tsx); only a later
    // Ctrl-C means "stop waiting".
    if (Date.now() - shutdownAt > 1500) process.exit(code);
    return new Promise<never>(() => {});
  }
  shuttingDown = true;
  shutdownAt = Date.now();
  say(`${why}; stopping`);
  await stopServices({ smtp, providers, pgStarting });
  say("stopped");
  process.exit(code);
}

process.on("SIGINT", () => void shutdown(130, "interrupted"));
process.on("SIGTERM", () => void shutdown(143, "terminated"));
process.on("SIGHUP", () => void shutdown(129, "hang-up"));

async function main(): Promise<void> {
  const childrenDir = path.join(root, ".data", "children");
  await reapOrphans(childrenDir, root);
  trackChildrenIn(childrenDir);
  for (const [p, what, knob] of [
    [port, "Next.js", "PORT"],
    [smtpPort, "the fake SMTP server", "EIGENROOM_SMTP_PORT"],
  ] as const) {
    if (!Number.isInteger(p) || p < 1 || p > 65535) throw new Error(`${knob} must be a port number`);
    // Checked first, so a second `npm start` does not rebuild .next under a running server.
    if (knob === "EIGENROOM_SMTP_PORT" && process.env.SMTP_URL) continue;
    if (!(await portIsFree(p)) || !(await portIsFree(p, "0.0.0.0"))) {
      throw new Error(`port ${p} (${what}) is already in use — is another \`npm start\` running? Stop it, or choose another port with ${knob}=<port>.`);
    }
  }

  pgStarting = ensurePostgres();
  const pgHandle = await pgStarting;
  const databaseUrl = pgHandle.external ? (process.env.DATABASE_URL as string) : pgHandle.url("eigenroom");
  const dbName = decodeURIComponent(new URL(databaseUrl).pathname.slice(1)) || "eigenroom";
  if (await createDatabaseIfMissing(pgHandle, dbName)) say(`created database ${dbName}`);

  const db = createDb(databaseUrl, 2);
  try {
    await migrateToLatest(db);
    say("migrations applied");
    const { created } = await seedDemo(db);
    say(created ? "demo data seeded" : "demo data already present (seeded once; your changes are kept)");
  } finally {
    await db.destroy();
  }

  let smtpUrl = process.env.SMTP_URL;
  if (smtpUrl) {
    say(`SMTP_URL is set; mail goes to ${new URL(smtpUrl).host} (no fake SMTP server started)`);
  } else {
    smtp = await startFakeSmtp({ port: smtpPort, host: "127.0.0.1", databaseUrl });
    smtpUrl = `smtp://127.0.0.1:${smtpPort}`;
    say(`fake SMTP server on ${smtpUrl} (messages land in the development outbox)`);
  }
  // Uploads and payments: local fakes of object storage and the payment provider, unless S3_BUCKET / STRIPE_SECRET_KEY are set.
  providers = await startLocalProviders({ root, s3Port: Number(process.env.EIGENROOM_S3_PORT ?? 4569), stripePort: Number(process.env.EIGENROOM_STRIPE_PORT ?? 12111), appUrl, quiet: true });
  for (const note of providers.notes) say(note);
  // Issued reports are signed; without SIGNING_P12_PATH a self-signed development certificate is used.
  const signing = process.env.SIGNING_P12_PATH ? undefined : ensureDevCertificate(root);
  if (signing) say(`${signing.created ? "created the" : "using the"} development signing certificate ${path.relative(root, signing.p12Path)} (SHA-256 ${signing.fingerprintSha256.slice(0, 23)}…)`);

  const env: NodeJS.ProcessEnv = {
    ...process.env,
    NEXT_TELEMETRY_DISABLED: "1",
    NEXT_DIST_DIR: ".next",
    DATABASE_URL: databaseUrl,
    SMTP_URL: smtpUrl,
    APP_URL: appUrl,
    ...providers.env,
    ...(signing && { SIGNING_P12_PATH: signing.p12Path, SIGNING_P12_PASSWORD: signing.password }),
  };
  if (shuttingDown) return;

  if (dev) {
    say(`starting next dev on port ${port}`);
    server = spawnManaged("next dev", nextBin, ["dev", "-p", String(port)], { cwd: root, env: { ...env, NODE_ENV: "development" } });
  } else {
    const buildEnv = { DATABASE_URL: databaseUrl, SMTP_URL: smtpUrl, APP_URL: appUrl, MAIL_FROM: process.env.MAIL_FROM, NEXT_DIST_DIR: ".next" };
    const fingerprint = buildFingerprint(root, buildEnv);
    if (!forceBuild && buildIsCurrent(root, ".next", fingerprint)) {
      say("the build in .next matches the sources; skipping next build (npm start -- --rebuild forces one)");
    } else {
      say("next build");
      const tb = Date.now();
      forgetBuild(root, ".next");
      const code = await runToEnd("next build", nextBin, ["build"], { cwd: root, env: { ...env, NODE_ENV: "production" } });
      if (shuttingDown) return;
      if (code !== 0) throw new Error(`next build failed (exit ${code})`);
      recordBuild(root, ".next", fingerprint);
      say(`built in ${seconds(Date.now() - tb)}`);
    }
    if (shuttingDown) return;
    server = spawnManaged("next start", nextBin, ["start", "-p", String(port)], { cwd: root, env: { ...env, NODE_ENV: "production" } });
  }

  void server.exited.then(({ code, signal }) => {
    if (!shuttingDown) void shutdown(code === 0 ? 0 : 1, `Next.js exited (${signal ?? `code ${code}`})`);
  });

  if (!(await waitForHttp(`http://127.0.0.1:${port}/sign-in`, dev ? 180_000 : 60_000, server))) {
    if (!shuttingDown) throw new Error(`Next.js did not answer on port ${port}`);
    return;
  }
  printBanner();
}

function printBanner(): void {
  const rows = DEMO_ACCOUNTS.map((a) => [a.role, a.email, a.password, a.name]);
  const head = ["role", "email", "password", "name"];
  const widths = head.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i]!.length)));
  const line = (cells: string[]) => `  ${cells.map((c, i) => c.padEnd(widths[i]!)).join("  ")}`;
  console.log("");
  console.log(`  Eigenroom is ready at ${appUrl}  (${dev ? "development mode" : "production build"}; up in ${seconds(Date.now() - t0)})`);
  console.log("");
  console.log("  Demo sign-ins:");
  console.log(line(head));
  console.log(line(widths.map((w) => "-".repeat(w))));
  for (const r of rows) console.log(line(r));
  console.log("");
  console.log("  Press Ctrl-C to stop Next.js, the fake SMTP server and PostgreSQL (if started here).");
  console.log("");
}

main().catch((err: unknown) => {
  console.error(`eigenroom: ${err instanceof Error ? err.message : String(err)}`);
  void shutdown(1, "start failed");
});
