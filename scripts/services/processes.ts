// Child processes for the start and test scripts. Each child gets its own process group, so that
// stopping it also stops whatever it spawned (Next's build workers), and so that a Ctrl-C is handled
// once, by the script, which then stops everything in order.
import { type ChildProcess, spawn } from "node:child_process";
import fs from "node:fs";
import http from "node:http";
import path from "node:path";
import { sleep } from "./postgres";

export interface ManagedChild {
  name: string;
  child: ChildProcess;
  /** Resolves when the process has exited. */
  exited: Promise<{ code: number | null; signal: NodeJS.Signals | null }>;
  /** True once the process has exited. */
  readonly done: boolean;
  /** SIGTERM to the whole group, SIGKILL after `graceMs`. Resolves when it has exited. */
  stop(graceMs?: number): Promise<void>;
}

const live = new Set<ManagedChild>();
let closing = false;
let trackDir: string | undefined;

/**
 * Records every child started from now on as a file `<our pid>-<child pid>` in `dir`, so that a
 * later run can stop children left behind when this process was killed outright (SIGKILL).
 */
export function trackChildrenIn(dir: string): void {
  fs.mkdirSync(dir, { recursive: true });
  trackDir = dir;
}

/**
 * Stops children recorded in `dir` whose parent run has died, provided they still run in `cwd`
 * (a reused pid belongs to something else). Returns how many it stopped.
 */
export async function reapOrphans(dir: string, cwd: string): Promise<number> {
  let names: string[] = [];
  try {
    names = fs.readdirSync(dir);
  } catch {
    return 0;
  }
  let reaped = 0;
  for (const name of names) {
    const match = /^(\d+)-(\d+)$/.exec(name);
    if (!match) continue;
    const [parent, child] = [Number(match[1]), Number(match[2])];
    if (processAlive(parent)) continue;
    let childCwd = "";
    try {
      childCwd = fs.readlinkSync(`/proc/${child}/cwd`);
    } catch {
      // gone
    }
    if (childCwd === cwd) {
      console.log(`eigenroom: stopping process ${child} left behind by an earlier run that was killed`);
      signalGroup(child, "SIGTERM");
      for (let i = 0; i < 50 && processAlive(child); i++) await sleep(100);
      signalGroup(child, "SIGKILL");
      reaped++;
    }
    fs.rmSync(path.join(dir, name), { force: true });
  }
  return reaped;
}

function processAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (err) {
    return (err as { code?: string }).code === "EPERM";
  }
}

export function spawnManaged(name: string, cmd: string, args: string[], opts: { cwd: string; env: NodeJS.ProcessEnv }): ManagedChild {
  if (closing) throw new Error(`not starting ${name}: shutting down`);
  const child = spawn(cmd, args, { cwd: opts.cwd, env: opts.env, stdio: ["ignore", "inherit", "inherit"], detached: true });
  let done = false;
  const exited = new Promise<{ code: number | null; signal: NodeJS.Signals | null }>((resolve) => {
    child.once("error", (err) => {
      console.error(`${name}: could not start ${cmd}: ${err.message}`);
      done = true;
      resolve({ code: 127, signal: null });
    });
    child.once("exit", (code, signal) => {
      done = true;
      resolve({ code, signal });
    });
  });
  const managed: ManagedChild = {
    name,
    child,
    exited,
    get done() {
      return done;
    },
    async stop(graceMs = 10_000) {
      if (!done && child.pid) {
        signalGroup(child.pid, "SIGTERM");
        const timer = sleep(graceMs).then(() => "timeout" as const);
        if ((await Promise.race([exited, timer])) === "timeout") {
          console.error(`${name}: did not stop within ${graceMs / 1000} s; killing it`);
          signalGroup(child.pid, "SIGKILL");
          await exited;
        }
      }
      // The leader may be gone while members of its group linger.
      if (child.pid) signalGroup(child.pid, "SIGKILL");
    },
  };
  live.add(managed);
  const record = trackDir && child.pid ? path.join(trackDir, `${process.pid}-${child.pid}`) : undefined;
  if (record) fs.writeFileSync(record, `${name}\n`);
  void exited.then(() => {
    live.delete(managed);
    if (record) fs.rmSync(record, { force: true });
  });
  return managed;
}

function signalGroup(pid: number, signal: NodeJS.Signals): void {
  try {
    process.kill(-pid, signal);
  } catch {
    // already gone
  }
}

/** Runs a command to completion; resolves with its exit code (signals count as failure). */
export async function runToEnd(name: string, cmd: string, args: string[], opts: { cwd: string; env: NodeJS.ProcessEnv }): Promise<number> {
  const managed = spawnManaged(name, cmd, args, opts);
  const { code, signal } = await managed.exited;
  if (signal) return 128 + (signalNumber(signal) ?? 1);
  return code ?? 1;
}

function signalNumber(signal: NodeJS.Signals): number | undefined {
  return ({ SIGHUP: 1, SIGINT: 2, SIGKILL: 9, SIGTERM: 15 } as Record<string, number>)[signal];
}

/** Stops every child still running (in parallel); no new child starts afterwards. */
export async function stopAllChildren(): Promise<void> {
  closing = true;
  await Promise.all([...live].map((c) => c.stop()));
}

/**
 * Waits until an HTTP server answers `url` (with any status: it listens), or the child exits, or
 * time runs out. Returns true when it answered.
 */
export async function waitForHttp(url: string, timeoutMs: number, child?: ManagedChild): Promise<boolean> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (child?.done) return false;
    const status = await probe(url);
    if (status !== undefined) return true;
    await sleep(250);
  }
  return false;
}

function probe(url: string): Promise<number | undefined> {
  return new Promise((resolve) => {
    const req = http.get(url, { timeout: 5000 }, (res) => {
      res.resume();
      resolve(res.statusCode);
    });
    req.on("timeout", () => req.destroy());
    req.on("error", () => resolve(undefined));
  });
}

/** Formats milliseconds as "12.3 s". */
export function seconds(ms: number): string {
  return `${(ms / 1000).toFixed(1)} s`;
}
