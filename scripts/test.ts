// `npm test`: PostgreSQL (reused when running), a fresh `eigenroom_test` database (migrated and
// seeded), the fake SMTP server on its own port, then unit + integration tests, a production build in
// .next-test served on its own port, and the end-to-end tests in Chromium. Everything started here is
// stopped at the end, on failure and on Ctrl-C. Exit code 0 only when every phase passed.
//
//   npm test                          everything
//   npm test -- tests/lib/modes       only the projects those paths belong to (here: unit)
//   npm test -- -t "sign-in"          every project, with the extra arguments passed to vitest
// Without arguments the whole project is also type-checked (tsc --noEmit).
import fs from "node:fs";
import path from "node:path";
import { createDb } from "../db/create-db";
import { migrateToLatest } from "../db/migrate";
import { seedDemo } from "../db/seed";
import { ensureDevCertificate } from "./services/dev-certificate";
import { startFakeSmtp, type FakeSmtpHandle } from "./services/fake-smtp";
import { startLocalProviders, type LocalProviders } from "./services/local-providers";
import { stopServices } from "./services/stop-services";
import { buildFingerprint, buildIsCurrent, forgetBuild, recordBuild } from "./services/next-build";
import { ensurePostgres, freePort, portIsFree, recreateDatabase, type PostgresHandle } from "./services/postgres";
import { reapOrphans, runToEnd, seconds, spawnManaged, trackChildrenIn, waitForHttp } from "./services/processes";

const root = path.resolve(path.dirname(new URL(import.meta.url).pathname), "..");
const TEST_DB = "eigenroom_test";
const DIST_DIR = ".next-test";
const nextBin = path.join(root, "node_modules", ".bin", "next");
const vitestBin = path.join(root, "node_modules", ".bin", "vitest");

type Project = "unit" | "integration" | "e2e";
type Outcome = "passed" | "failed" | "skipped";
const phases: { name: string; ms: number; outcome: Outcome; note?: string }[] = [];
const tStart = Date.now();

let pgStarting: Promise<PostgresHandle> | undefined;
let smtp: FakeSmtpHandle | undefined;
let providers: LocalProviders | undefined;
let lockHeld = false;
let finishing = false;
let finishingAt = 0;

function say(line: string): void {
  console.log(`\neigenroom test: ${line}`);
}

async function phase(name: string, fn: () => Promise<void | { outcome: Outcome; note?: string }>): Promise<boolean> {
  say(`── ${name}`);
  const t = Date.now();
  try {
    const result = await fn();
    const outcome = result ? result.outcome : "passed";
    phases.push({ name, ms: Date.now() - t, outcome, note: result ? result.note : undefined });
    return outcome !== "failed";
  } catch (err) {
    const message = err instanceof Error ? err.message : String(err);
    console.error(`eigenroom test: ${name} failed: ${message}`);
    phases.push({ name, ms: Date.now() - t, outcome: "failed", note: message.split("\n")[0] });
    return false;
  }
}

function skip(name: string, why: string): void {
  phases.push({ name, ms: 0, outcome: "skipped", note: why });
}

// ---- arguments: paths choose projects, everything else goes to vitest ----
function parseArgs(argv: string[]): { projects: Set<Project>; paths: Record<Project, string[]>; extra: string[] } {
  const paths: Record<Project, string[]> = { unit: [], integration: [], e2e: [] };
  const extra: string[] = [];
  const projects = new Set<Project>();
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i]!;
    if (arg.startsWith("-")) {
      extra.push(arg);
      // Flags that take a value.
      if (["-t", "--testNamePattern", "--reporter", "--bail", "--retry", "--shard", "--seed"].includes(arg) && i + 1 < argv.length) extra.push(argv[++i]!);
      continue;
    }
    const rel = path.relative(root, path.resolve(arg)).split(path.sep).join("/");
    const project: Project | undefined = rel.startsWith("tests/e2e")
      ? "e2e"
      : rel.startsWith("tests/integration")
        ? "integration"
        : rel.startsWith("tests/lib") || rel.startsWith("tests/unit")
          ? "unit"
          : undefined;
    if (!project) {
      // A name filter rather than a path: hand it to every project.
      for (const p of ["unit", "integration", "e2e"] as const) paths[p].push(arg);
      continue;
    }
    paths[project].push(rel);
    projects.add(project);
  }
  if (projects.size === 0) for (const p of ["unit", "integration", "e2e"] as const) projects.add(p);
  return { projects, paths, extra };
}

// ---- one `npm test` per checkout at a time (they share the test database and .next-test) ----
const lockDir = path.join(root, ".data", "test.lock");

async function acquireLock(): Promise<void> {
  fs.mkdirSync(path.dirname(lockDir), { recursive: true });
  let announced = false;
  for (;;) {
    try {
      fs.mkdirSync(lockDir);
      fs.writeFileSync(path.join(lockDir, "pid"), String(process.pid));
      lockHeld = true;
      return;
    } catch (err) {
      if ((err as { code?: string }).code !== "EEXIST") throw err;
    }
    let holder = NaN;
    try {
      holder = Number(fs.readFileSync(path.join(lockDir, "pid"), "utf8"));
    } catch {
      // being written right now, or left empty by a crash
    }
    const alive = Number.isInteger(holder) && holder > 0 && processAlive(holder);
    if (!alive) {
      const age = Date.now() - fs.statSync(lockDir).mtimeMs;
      if (Number.isInteger(holder) || age > 5000) {
        fs.rmSync(lockDir, { recursive: true, force: true });
        continue;
      }
    } else if (!announced) {
      console.log(`eigenroom test: another npm test (pid ${holder}) is running in this folder; waiting for it to finish`);
      announced = true;
    }
    await new Promise((r) => setTimeout(r, 1000));
  }
}

function releaseLock(): void {
  if (lockHeld) fs.rmSync(lockDir, { recursive: true, force: true });
  lockHeld = false;
}

function processAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (err) {
    return (err as { code?: string }).code === "EPERM";
  }
}

async function pickPort(preferred: number, what: string): Promise<number> {
  if ((await portIsFree(preferred)) && (await portIsFree(preferred, "0.0.0.0"))) return preferred;
  const port = await freePort();
  console.log(`eigenroom test: port ${preferred} (${what}) is in use; using ${port} instead`);
  return port;
}

async function finish(code: number): Promise<never> {
  if (finishing) {
    // The same signal often arrives twice (from the terminal and relayed by npm/tsx); only a later
    // Ctrl-C means "stop waiting".
    if (Date.now() - finishingAt > 1500) process.exit(code);
    return new Promise<never>(() => {});
  }
  finishing = true;
  finishingAt = Date.now();
  const t = Date.now();
  await stopServices({ smtp, providers, pgStarting });
  releaseLock();
  phases.push({ name: "stop services", ms: Date.now() - t, outcome: "passed" });
  printSummary(code);
  process.exit(code);
}

// Each vitest run also writes a JSON report; their counts make the closing "N passed, N failed" line.
const counts = { passed: 0, failed: 0, skipped: 0 };
function vitestReportArgs(phaseName: string): string[] {
  const file = path.join(root, ".data", `vitest-${phaseName}.json`);
  fs.mkdirSync(path.dirname(file), { recursive: true });
  fs.rmSync(file, { force: true });
  return ["--reporter=default", "--reporter=json", `--outputFile.json=${file}`];
}
function addCounts(phaseName: string): void {
  const file = path.join(root, ".data", `vitest-${phaseName}.json`);
  try {
    const r = JSON.parse(fs.readFileSync(file, "utf8")) as { numPassedTests?: number; numFailedTests?: number; numPendingTests?: number; numTodoTests?: number };
    counts.passed += r.numPassedTests ?? 0;
    counts.failed += r.numFailedTests ?? 0;
    counts.skipped += (r.numPendingTests ?? 0) + (r.numTodoTests ?? 0);
  } catch {
    // vitest did not get as far as writing its report; the phase itself reports the failure.
  }
}

function printSummary(code: number): void {
  const width = Math.max(...phases.map((p) => p.name.length));
  console.log("\n  phase".padEnd(width + 4) + "   time      result");
  for (const p of phases) {
    console.log(`  ${p.name.padEnd(width)}  ${seconds(p.ms).padStart(8)}   ${p.outcome}${p.note ? ` — ${p.note}` : ""}`);
  }
  console.log(`  ${"total".padEnd(width)}  ${seconds(Date.now() - tStart).padStart(8)}   ${code === 0 ? "PASSED" : "FAILED"}\n`);
  console.log(`${counts.passed} passed, ${counts.failed} failed${counts.skipped ? `, ${counts.skipped} skipped` : ""}`);
}

process.on("SIGINT", () => {
  if (!finishing) console.error("\neigenroom test: interrupted; stopping");
  void finish(130);
});
process.on("SIGTERM", () => void finish(143));
process.on("SIGHUP", () => void finish(129));

async function main(): Promise<number> {
  const { projects, paths, extra } = parseArgs(process.argv.slice(2));
  const filtered = process.argv.length > 2;
  await acquireLock();
  const childrenDir = path.join(root, ".data", "children");
  await reapOrphans(childrenDir, root);
  trackChildrenIn(childrenDir);

  let ok = true;
  let databaseUrl = "";
  let smtpUrl = "";
  const servicesOk = await phase("postgres + test database", async () => {
    pgStarting = ensurePostgres({ allowOtherPort: true });
    const pg = await pgStarting;
    databaseUrl = pg.url(TEST_DB);
    await recreateDatabase(pg, TEST_DB);
    const db = createDb(databaseUrl, 2);
    try {
      await migrateToLatest(db);
      await seedDemo(db);
    } finally {
      await db.destroy();
    }
    return { outcome: "passed", note: `${TEST_DB} on port ${pg.port}${pg.startedHere ? " (started here)" : " (reused)"}` };
  });
  if (!servicesOk) return 1;

  const smtpOk = await phase("fake SMTP", async () => {
    const port = await pickPort(Number(process.env.EIGENROOM_TEST_SMTP_PORT ?? 2535), "test SMTP");
    smtp = await startFakeSmtp({ port, host: "127.0.0.1", databaseUrl, log: () => {} });
    smtpUrl = `smtp://127.0.0.1:${port}`;
    return { outcome: "passed", note: smtpUrl };
  });
  if (!smtpOk) return 1;
  // Issued reports are signed; without SIGNING_P12_PATH the development certificate (.data/certs) is used.
  const signing = process.env.SIGNING_P12_PATH ? undefined : ensureDevCertificate(root);

  const appPort = await pickPort(Number(process.env.EIGENROOM_TEST_APP_PORT ?? 3100), "test app");
  const appUrl = `http://127.0.0.1:${appPort}`;
  // Uploads and payments for the app under test (integration tests start their own in-process fakes).
  const providersOk = await phase("fake S3 + payment provider", async () => {
    const s3Port = await pickPort(Number(process.env.EIGENROOM_TEST_S3_PORT ?? 4579), "test S3");
    const stripePort = await pickPort(Number(process.env.EIGENROOM_TEST_STRIPE_PORT ?? 12121), "test payments");
    providers = await startLocalProviders({ root, s3Dir: path.join(root, ".data", "s3-test"), freshS3: true, s3Port, stripePort, appUrl, quiet: true });
    return { outcome: "passed", note: providers.notes.join("; ") || "configured by the environment" };
  });
  if (!providersOk) return 1;
  const testEnv: NodeJS.ProcessEnv = {
    ...process.env,
    NEXT_TELEMETRY_DISABLED: "1",
    DATABASE_URL: databaseUrl,
    SMTP_URL: smtpUrl,
    APP_URL: appUrl,
    ...providers?.env,
    MAIL_FROM: "Eigenroom <no-reply@eigenroom.invalid>",
    NEXT_DIST_DIR: DIST_DIR,
    ...(signing && { SIGNING_P12_PATH: signing.p12Path, SIGNING_P12_PASSWORD: signing.password }),
  };
  const passWithNoTests = filtered ? ["--passWithNoTests"] : [];

  // next.config.ts leaves type checking out of `next build`; the whole project is checked here.
  if (!filtered) {
    ok =
      (await phase("typecheck (tsc --noEmit)", async () => {
        const code = await runToEnd("tsc", path.join(root, "node_modules", ".bin", "tsc"), ["--noEmit", "-p", "."], { cwd: root, env: testEnv });
        return code === 0 ? { outcome: "passed" } : { outcome: "failed", note: `tsc exit ${code}` };
      })) && ok;
    if (finishing) return 1;
  } else {
    skip("typecheck (tsc --noEmit)", "test selection given; run npm run typecheck");
  }

  const fast = (["unit", "integration"] as const).filter((p) => projects.has(p));
  if (fast.length > 0) {
    const name = `vitest ${fast.join(" + ")}`;
    ok =
      (await phase(name, async () => {
        const args = ["run", ...fast.flatMap((p) => ["--project", p]), ...new Set(fast.flatMap((p) => paths[p])), ...extra, ...passWithNoTests, ...vitestReportArgs("fast")];
        const code = await runToEnd("vitest", vitestBin, args, { cwd: root, env: { ...testEnv, NODE_ENV: "test" } });
        addCounts("fast");
        return code === 0 ? { outcome: "passed" } : { outcome: "failed", note: `vitest exit ${code}` };
      })) && ok;
  }
  if (finishing) return 1;

  if (!projects.has("e2e")) {
    skip("next build (.next-test)", "no e2e tests selected");
    return ok ? 0 : 1;
  }

  const buildEnvForHash = { DATABASE_URL: databaseUrl, SMTP_URL: smtpUrl, APP_URL: appUrl, MAIL_FROM: testEnv.MAIL_FROM, NEXT_DIST_DIR: DIST_DIR };
  const built = await phase("next build (.next-test)", async () => {
    // The environment is part of the fingerprint: a page prerendered at build time may embed it.
    const fingerprint = buildFingerprint(root, buildEnvForHash);
    if (process.env.EIGENROOM_REBUILD !== "1" && buildIsCurrent(root, DIST_DIR, fingerprint)) {
      return { outcome: "passed", note: "sources unchanged since the last test build; reused it" };
    }
    forgetBuild(root, DIST_DIR);
    const code = await runToEnd("next build", nextBin, ["build"], { cwd: root, env: { ...testEnv, NODE_ENV: "production" } });
    if (code !== 0) return { outcome: "failed", note: `next build exit ${code}` };
    recordBuild(root, DIST_DIR, fingerprint);
    return { outcome: "passed" };
  });
  if (finishing) return 1;
  if (!built) {
    skip("vitest e2e", "no build");
    return 1;
  }

  const served = await phase(`next start (:${appPort})`, async () => {
    const server = spawnManaged("next start", nextBin, ["start", "-p", String(appPort), "-H", "127.0.0.1"], { cwd: root, env: { ...testEnv, NODE_ENV: "production" } });
    if (!(await waitForHttp(`${appUrl}/sign-in`, 60_000, server))) throw new Error(`the test app did not answer on ${appUrl}`);
    return { outcome: "passed", note: appUrl };
  });
  if (finishing) return 1;
  if (!served) {
    skip("vitest e2e", "app not serving");
    return 1;
  }

  ok =
    (await phase("vitest e2e", async () => {
      const args = ["run", "--project", "e2e", ...paths.e2e, ...extra, ...passWithNoTests, ...vitestReportArgs("e2e")];
      const code = await runToEnd("vitest", vitestBin, args, { cwd: root, env: { ...testEnv, NODE_ENV: "test" } });
      addCounts("e2e");
      return code === 0 ? { outcome: "passed" } : { outcome: "failed", note: `vitest exit ${code}` };
    })) && ok;
  return ok ? 0 : 1;
}

main()
  .then((code) => finish(code))
  .catch((err: unknown) => {
    console.error(`eigenroom test: ${err instanceof Error ? (err.stack ?? err.message) : String(err)}`);
    void finish(1);
  });
