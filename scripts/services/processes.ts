// Child processes for the start and test scripts. Each child gets its own process group, so that
// stopping it also stops whatever it spawned (Next's build workers), and so that a Ctrl-C is handled
// once, by the script, which then stops everything in order.
import { type ChildProcess, spawn } from "node:child_process";
import http from "node:http";
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
  void exited.then(() => live.delete(managed));
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
