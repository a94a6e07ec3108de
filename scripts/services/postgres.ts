// Our own PostgreSQL cluster for `npm start` and `npm test`, from Debian's server binaries.
//
// - DATABASE_URL set in the environment: that server is used as it is and nothing is started.
// - Otherwise: a cluster under <repo>/.data/postgres, listening on 127.0.0.1 only (port 54329,
//   EIGENROOM_PG_PORT overrides), its socket under <repo>/.data/pg-socket, superuser `eigenroom`
//   with trust authentication (loopback only; a development cluster). As root the cluster belongs to
//   Debian's `postgres` system user, because initdb refuses to run as root.
// - Idempotent: an existing cluster is reused; a running one is reused and left running.
// - Several of our processes may share one cluster (npm start and npm test side by side). Each one
//   registers under .data/pg-clients/<pid>; the one that started the server stops it at the end
//   unless another live process still uses it, in which case that process inherits the job.
import { spawnSync } from "node:child_process";
import { createHash } from "node:crypto";
import fs from "node:fs";
import net from "node:net";
import os from "node:os";
import path from "node:path";
import pg from "pg";

export const DEFAULT_PG_PORT = 54329;
const SUPERUSER = "eigenroom";

export interface PostgresHandle {
  /** Connection URL for a database on this server (the server in DATABASE_URL, or our cluster). */
  url(dbName: string): string;
  /** Connection URL of the maintenance database (`postgres`). */
  baseUrl: string;
  /** True when this process started the server (and so will stop it, unless others still use it). */
  startedHere: boolean;
  /** True when DATABASE_URL pointed at an existing server and no cluster is managed here. */
  external: boolean;
  port: number;
  /** Releases this process's use of the cluster; stops the server if this process is responsible for it. */
  stop(): Promise<void>;
}

export interface EnsurePostgresOptions {
  /** Repository root (default: the folder above scripts/). */
  repoRoot?: string;
  /** Preferred port (default EIGENROOM_PG_PORT or 54329). */
  port?: number;
  /**
   * When the preferred port is taken by something other than our cluster: false (default) fails
   * with an explanation; true picks a free port instead (the test runner does this, since it stops
   * the server again at the end).
   */
  allowOtherPort?: boolean;
  log?: (line: string) => void;
}

const defaultLog = (line: string) => console.log(`postgres: ${line}`);

function repoRootDefault(): string {
  return path.resolve(path.dirname(new URL(import.meta.url).pathname), "..", "..");
}

/** Starts (or reuses) PostgreSQL and returns how to reach it. */
export async function ensurePostgres(opts: EnsurePostgresOptions = {}): Promise<PostgresHandle> {
  const log = opts.log ?? defaultLog;
  const external = process.env.DATABASE_URL?.trim();
  if (external) {
    const base = new URL(external);
    const url = (dbName: string) => {
      const u = new URL(base.href);
      u.pathname = `/${encodeURIComponent(dbName)}`;
      return u.href;
    };
    log(`using the server in DATABASE_URL (${base.hostname}:${base.port || 5432}); starting nothing`);
    await waitForServer(url("postgres"), 10_000);
    return { url, baseUrl: url("postgres"), startedHere: false, external: true, port: Number(base.port || 5432), stop: async () => {} };
  }

  const root = opts.repoRoot ?? repoRootDefault();
  const cluster = new LocalCluster(root, log);
  const wantedPort = opts.port ?? (process.env.EIGENROOM_PG_PORT ? Number(process.env.EIGENROOM_PG_PORT) : DEFAULT_PG_PORT);
  if (!Number.isInteger(wantedPort) || wantedPort < 1 || wantedPort > 65535) {
    throw new Error(`EIGENROOM_PG_PORT must be a port number, got ${JSON.stringify(process.env.EIGENROOM_PG_PORT)}`);
  }
  const { port, startedHere } = await cluster.start(wantedPort, opts.allowOtherPort ?? false);
  const url = (dbName: string) => `postgres://${SUPERUSER}@127.0.0.1:${port}/${encodeURIComponent(dbName)}`;
  await waitForServer(url("postgres"), 30_000);
  cluster.register(startedHere);

  let stopped = false;
  return {
    url,
    baseUrl: url("postgres"),
    startedHere,
    external: false,
    port,
    stop: async () => {
      if (stopped) return;
      stopped = true;
      cluster.release();
    },
  };
}

/** Creates the database when it does not exist yet. Returns true when it was created. */
export async function createDatabaseIfMissing(handle: PostgresHandle, name: string): Promise<boolean> {
  const client = new pg.Client({ connectionString: handle.baseUrl });
  await client.connect();
  try {
    const found = await client.query("select 1 from pg_database where datname = $1", [name]);
    if (found.rowCount) return false;
    try {
      await client.query(`create database ${quoteIdent(name)} encoding 'UTF8' template template0`);
    } catch (err) {
      // Another process created it between the check and here.
      if ((err as { code?: string }).code === "42P04") return false;
      throw err;
    }
    return true;
  } finally {
    await client.end();
  }
}

/** Drops the database (closing other sessions on it) and creates it empty. */
export async function recreateDatabase(handle: PostgresHandle, name: string): Promise<void> {
  const client = new pg.Client({ connectionString: handle.baseUrl });
  await client.connect();
  try {
    await client.query(`drop database if exists ${quoteIdent(name)} with (force)`);
    await client.query(`create database ${quoteIdent(name)} encoding 'UTF8' template template0`);
  } finally {
    await client.end();
  }
}

function quoteIdent(name: string): string {
  return `"${name.replace(/"/g, '""')}"`;
}

async function waitForServer(connectionString: string, timeoutMs: number): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  let lastError: unknown;
  while (Date.now() < deadline) {
    const client = new pg.Client({ connectionString, connectionTimeoutMillis: 2000 });
    try {
      await client.connect();
      await client.query("select 1");
      await client.end();
      return;
    } catch (err) {
      lastError = err;
      await client.end().catch(() => {});
      await sleep(200);
    }
  }
  const reason = lastError instanceof Error ? lastError.message : String(lastError);
  throw new Error(`PostgreSQL did not accept connections within ${timeoutMs / 1000} s (${reason})`);
}

export function sleep(ms: number): Promise<void> {
  return new Promise((resolve) => setTimeout(resolve, ms));
}

/** True when nothing listens on host:port (we can bind it ourselves). */
export function portIsFree(port: number, host = "127.0.0.1"): Promise<boolean> {
  return new Promise((resolve) => {
    const server = net.createServer();
    server.once("error", () => resolve(false));
    server.listen({ port, host, exclusive: true }, () => server.close(() => resolve(true)));
  });
}

/** A port the kernel considers free right now. */
export function freePort(host = "127.0.0.1"): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.once("error", reject);
    server.listen({ port: 0, host }, () => {
      const address = server.address();
      const port = typeof address === "object" && address ? address.port : 0;
      server.close(() => resolve(port));
    });
  });
}

class LocalCluster {
  readonly dataDir: string;
  readonly stateDir: string;
  readonly socketDir: string;
  readonly logFile: string;
  readonly clientsDir: string;
  readonly asRoot: boolean;
  private binDir = "";

  constructor(
    readonly root: string,
    private readonly log: (line: string) => void,
  ) {
    this.stateDir = path.join(root, ".data");
    this.dataDir = path.join(this.stateDir, "postgres");
    this.logFile = path.join(this.stateDir, "postgres.log");
    this.clientsDir = path.join(this.stateDir, "pg-clients");
    // A Unix socket path may not exceed 107 bytes; deep checkouts get a socket folder under /tmp.
    const inRepo = path.join(this.stateDir, "pg-socket");
    const longest = path.join(inRepo, ".s.PGSQL.65535.lock");
    this.socketDir =
      Buffer.byteLength(longest) <= 100
        ? inRepo
        : path.join(os.tmpdir(), `eigenroom-pg-${createHash("sha256").update(root).digest("hex").slice(0, 12)}`);
    this.asRoot = process.getuid?.() === 0;
  }

  /** Starts the server unless it already runs; returns the port it listens on. */
  async start(wantedPort: number, allowOtherPort: boolean): Promise<{ port: number; startedHere: boolean }> {
    this.prepareFolders();
    this.binDir = this.findBinDir();
    if (!fs.existsSync(path.join(this.dataDir, "PG_VERSION"))) this.initdb();

    const running = this.runningPostmaster();
    if (running) {
      this.log(`reusing the running cluster in ${rel(this.root, this.dataDir)} (pid ${running.pid}, port ${running.port})`);
      return { port: running.port, startedHere: false };
    }
    this.removeStaleLocks();

    let port = wantedPort;
    if (!(await portIsFree(port))) {
      if (!allowOtherPort) {
        throw new Error(
          `port ${port} on 127.0.0.1 is taken by another program (maybe another checkout's cluster). ` +
            `Stop it, or choose another port with EIGENROOM_PG_PORT=<port>, or point DATABASE_URL at an existing server.`,
        );
      }
      port = await freePort();
      this.log(`port ${wantedPort} is taken by another program; using free port ${port} for this run`);
    }

    this.log(`starting PostgreSQL on 127.0.0.1:${port} (log: ${rel(this.root, this.logFile)})`);
    const options = `-c listen_addresses=127.0.0.1 -p ${port} -k ${shellQuote(this.socketDir)}`;
    const result = this.runAsOwner(path.join(this.binDir, "pg_ctl"), ["-D", this.dataDir, "-l", this.logFile, "-o", options, "-w", "-t", "60", "start"]);
    if (result.status !== 0) {
      throw new Error(`pg_ctl start failed (exit ${result.status}):\n${result.output}\nlast lines of ${this.logFile}:\n${tail(this.logFile, 15)}`);
    }
    return { port, startedHere: true };
  }

  /** Records that this process uses the cluster (and whether it is the one that must stop it). */
  register(startedHere: boolean): void {
    fs.mkdirSync(this.clientsDir, { recursive: true });
    fs.writeFileSync(path.join(this.clientsDir, String(process.pid)), startedHere ? "owner" : "user");
  }

  /** Unregisters this process; stops the server when this process owns it and nobody else uses it. */
  release(): void {
    const mine = path.join(this.clientsDir, String(process.pid));
    let owner = false;
    try {
      owner = fs.readFileSync(mine, "utf8").trim() === "owner";
      fs.rmSync(mine, { force: true });
    } catch {
      // Not registered (start failed early).
    }
    const others = this.liveClients();
    // An owner that died without cleaning up leaves the job to whoever ends last.
    const orphaned = this.deadClients().some((c) => c.owner);
    for (const dead of this.deadClients()) fs.rmSync(path.join(this.clientsDir, String(dead.pid)), { force: true });
    if (!owner && !orphaned) return;
    if (others.length > 0) {
      const heir = others[0]!;
      fs.writeFileSync(path.join(this.clientsDir, String(heir.pid)), "owner");
      this.log(`left running: process ${heir.pid} still uses it and will stop it`);
      return;
    }
    const running = this.runningPostmaster();
    if (!running) return;
    this.log("stopping PostgreSQL");
    const result = this.runAsOwner(path.join(this.binDir || this.findBinDir(), "pg_ctl"), ["-D", this.dataDir, "-m", "fast", "-w", "-t", "60", "stop"]);
    if (result.status !== 0) this.log(`pg_ctl stop failed (exit ${result.status}): ${result.output}`);
  }

  private clients(): { pid: number; owner: boolean; alive: boolean }[] {
    let names: string[] = [];
    try {
      names = fs.readdirSync(this.clientsDir);
    } catch {
      return [];
    }
    const list: { pid: number; owner: boolean; alive: boolean }[] = [];
    for (const name of names) {
      const pid = Number(name);
      if (!Number.isInteger(pid) || pid <= 0 || pid === process.pid) continue;
      let owner = false;
      try {
        owner = fs.readFileSync(path.join(this.clientsDir, name), "utf8").trim() === "owner";
      } catch {
        continue;
      }
      list.push({ pid, owner, alive: processAlive(pid) });
    }
    return list;
  }

  private liveClients() {
    return this.clients().filter((c) => c.alive);
  }

  private deadClients() {
    return this.clients().filter((c) => !c.alive);
  }

  private prepareFolders(): void {
    fs.mkdirSync(this.dataDir, { recursive: true });
    fs.mkdirSync(this.socketDir, { recursive: true });
    if (!fs.existsSync(this.logFile)) fs.writeFileSync(this.logFile, "");
    if (!this.asRoot) {
      fs.chmodSync(this.dataDir, 0o700);
      return;
    }
    // As root the server runs as `postgres`: it must be able to reach the data folder.
    const pgUser = lookupUser("postgres");
    if (!pgUser) {
      throw new Error("the `postgres` system user does not exist; reinstall Debian's postgresql package (apt-get install -y postgresql)");
    }
    // .data itself only needs to be traversable by others.
    const mode = fs.statSync(this.stateDir).mode & 0o777;
    if ((mode & 0o001) === 0) fs.chmodSync(this.stateDir, mode | 0o001);
    for (const dir of [this.dataDir, this.socketDir]) fs.chownSync(dir, pgUser.uid, pgUser.gid);
    fs.chownSync(this.logFile, pgUser.uid, pgUser.gid);
    fs.chmodSync(this.dataDir, 0o700);
    const blocked = firstUntraversableAncestor(this.stateDir);
    if (blocked) {
      throw new Error(
        `PostgreSQL runs as the \`postgres\` system user (initdb refuses root), and that user cannot enter ${blocked} ` +
          `(mode ${(fs.statSync(blocked).mode & 0o777).toString(8)}), so it cannot reach ${this.dataDir}.\n` +
          `Fix one of: clone the repository somewhere reachable (e.g. under /work, /srv or /tmp); ` +
          `or allow traversal with \`chmod o+x ${blocked}\`; or set DATABASE_URL to an existing PostgreSQL server.`,
      );
    }
    const probe = spawnSync("runuser", ["-u", "postgres", "--", "test", "-w", this.dataDir], { encoding: "utf8" });
    if (probe.status !== 0) {
      throw new Error(`the postgres user cannot write to ${this.dataDir}; check the folder's owner and mode (${probe.stderr.trim()})`);
    }
  }

  private findBinDir(): string {
    const base = "/usr/lib/postgresql";
    let majors: number[] = [];
    try {
      majors = fs
        .readdirSync(base)
        .filter((name) => /^\d+$/.test(name) && fs.existsSync(path.join(base, name, "bin", "initdb")))
        .map(Number)
        .sort((a, b) => b - a);
    } catch {
      // none installed
    }
    if (majors.length === 0) {
      throw new Error(`no PostgreSQL server binaries under ${base}/<major>/bin; install them with: apt-get install -y postgresql`);
    }
    const versionFile = path.join(this.dataDir, "PG_VERSION");
    if (fs.existsSync(versionFile)) {
      const clusterMajor = Number(fs.readFileSync(versionFile, "utf8").trim());
      if (!majors.includes(clusterMajor)) {
        throw new Error(
          `the cluster in ${this.dataDir} was made by PostgreSQL ${clusterMajor}, but only ${majors.join(", ")} is installed. ` +
            `It holds only local development data: delete ${this.dataDir} to start afresh (or install postgresql-${clusterMajor}).`,
        );
      }
      return path.join(base, String(clusterMajor), "bin");
    }
    return path.join(base, String(majors[0]), "bin");
  }

  private initdb(): void {
    const leftovers = fs.readdirSync(this.dataDir);
    if (leftovers.length > 0) {
      throw new Error(
        `${this.dataDir} is not empty but holds no PostgreSQL cluster (no PG_VERSION). ` +
          `Remove it (rm -rf ${this.dataDir}) and run again.`,
      );
    }
    this.log(`creating a new cluster in ${rel(this.root, this.dataDir)}`);
    const result = this.runAsOwner(path.join(this.binDir, "initdb"), [
      "-D",
      this.dataDir,
      "-U",
      SUPERUSER,
      "--auth=trust",
      "--encoding=UTF8",
      "--locale=C.UTF-8",
      "--no-instructions",
    ]);
    if (result.status !== 0) throw new Error(`initdb failed (exit ${result.status}):\n${result.output}`);
  }

  /** The postmaster serving our data folder, if one runs (checked in /proc, not just the pid file). */
  private runningPostmaster(): { pid: number; port: number } | undefined {
    const pidFile = path.join(this.dataDir, "postmaster.pid");
    let lines: string[];
    try {
      lines = fs.readFileSync(pidFile, "utf8").split("\n");
    } catch {
      return undefined;
    }
    const pid = Number(lines[0]);
    const port = Number(lines[3]);
    if (!Number.isInteger(pid) || pid <= 0 || !processAlive(pid)) return undefined;
    let cmdline = "";
    try {
      cmdline = fs.readFileSync(`/proc/${pid}/cmdline`, "utf8").replace(/\0/g, " ");
    } catch {
      return undefined;
    }
    // A pid from before a crash or reboot may now belong to an unrelated process.
    if (!/postgres/.test(cmdline) || !cmdline.includes(this.dataDir)) return undefined;
    return { pid, port };
  }

  /** After a crash the pid file and socket lock files stay behind; their pids may be reused. */
  private removeStaleLocks(): void {
    const pidFile = path.join(this.dataDir, "postmaster.pid");
    if (fs.existsSync(pidFile)) {
      this.log("removing a stale postmaster.pid left by a server that is no longer running");
      fs.rmSync(pidFile, { force: true });
    }
    try {
      for (const name of fs.readdirSync(this.socketDir)) {
        if (name.startsWith(".s.PGSQL.")) fs.rmSync(path.join(this.socketDir, name), { force: true });
      }
    } catch {
      // no socket folder yet
    }
  }

  private runAsOwner(bin: string, args: string[]): { status: number | null; output: string } {
    const [cmd, argv] = this.asRoot ? ["runuser", ["-u", "postgres", "--", bin, ...args]] : [bin, args];
    // cwd: the postgres user may not be allowed to stay in the caller's folder.
    const result = spawnSync(cmd as string, argv as string[], { encoding: "utf8", cwd: "/", stdio: ["ignore", "pipe", "pipe"] });
    if (result.error) return { status: null, output: result.error.message };
    return { status: result.status, output: `${result.stdout ?? ""}${result.stderr ?? ""}`.trim() };
  }
}

function processAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (err) {
    return (err as { code?: string }).code === "EPERM";
  }
}

function lookupUser(name: string): { uid: number; gid: number } | undefined {
  const passwd = fs.readFileSync("/etc/passwd", "utf8");
  for (const line of passwd.split("\n")) {
    const [user, , uid, gid] = line.split(":");
    if (user === name && uid && gid) return { uid: Number(uid), gid: Number(gid) };
  }
  const viaGetent = spawnSync("id", ["-u", name], { encoding: "utf8" });
  if (viaGetent.status === 0) {
    const gid = spawnSync("id", ["-g", name], { encoding: "utf8" });
    return { uid: Number(viaGetent.stdout.trim()), gid: Number(gid.stdout.trim()) };
  }
  return undefined;
}

/** The first folder from / down to `dir` that the postgres user cannot enter, if any. */
function firstUntraversableAncestor(dir: string): string | undefined {
  const whole = spawnSync("runuser", ["-u", "postgres", "--", "test", "-x", dir], { cwd: "/" });
  if (whole.status === 0) return undefined;
  const parts = path.resolve(dir).split(path.sep).filter(Boolean);
  let current: string = path.sep;
  for (const part of [undefined, ...parts]) {
    if (part) current = path.join(current, part);
    const probe = spawnSync("runuser", ["-u", "postgres", "--", "test", "-x", current], { cwd: "/" });
    if (probe.status !== 0) return current;
  }
  return undefined;
}

function shellQuote(value: string): string {
  return `'${value.replace(/'/g, `'\\''`)}'`;
}

function rel(root: string, p: string): string {
  const r = path.relative(root, p);
  return r.startsWith("..") ? p : r;
}

function tail(file: string, lines: number): string {
  try {
    return fs.readFileSync(file, "utf8").trimEnd().split("\n").slice(-lines).join("\n");
  } catch {
    return "(no log)";
  }
}
