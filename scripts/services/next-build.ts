// Decides whether `next build` can be skipped: the build folder records a fingerprint (SHA-256 over
// the content of every file that can change the build, the installed dependency tree and the
// environment given to the build). Only an identical fingerprint skips the build; when git is not
// available the build always runs.
import { spawnSync } from "node:child_process";
import { createHash } from "node:crypto";
import fs from "node:fs";
import path from "node:path";

const STAMP = "eigenroom-build.json";

/** Files that cannot change what `next build` produces. */
function irrelevant(file: string): boolean {
  return (
    file.startsWith("tests/") ||
    file.startsWith("bench/") ||
    file.startsWith("scripts/") ||
    file.startsWith(".ci/") ||
    file.startsWith(".data/") ||
    file.endsWith(".md")
  );
}

/** The fingerprint of the current sources, or undefined when it cannot be computed reliably. */
export function buildFingerprint(root: string, env: Record<string, string | undefined>): string | undefined {
  const listed = spawnSync("git", ["ls-files", "-z", "--cached", "--others", "--exclude-standard"], { cwd: root, encoding: "buffer", maxBuffer: 64 * 1024 * 1024 });
  if (listed.status !== 0 || !listed.stdout) return undefined;
  const files = new Set(
    listed.stdout
      .toString("utf8")
      .split("\0")
      .filter((f) => f && !irrelevant(f)),
  );
  // Ignored by git but read by the build.
  for (const name of fs.readdirSync(root)) if (name.startsWith(".env")) files.add(name);
  files.add("node_modules/.package-lock.json");

  const hash = createHash("sha256");
  for (const file of [...files].sort()) {
    hash.update(file).update("\0");
    try {
      hash.update(fs.readFileSync(path.join(root, file)));
    } catch {
      hash.update("(missing)");
    }
    hash.update("\0");
  }
  const envKeys = Object.keys(env).sort();
  for (const key of envKeys) hash.update(`${key}=${env[key] ?? ""}\0`);
  for (const key of Object.keys(process.env).filter((k) => k.startsWith("NEXT_PUBLIC_")).sort()) hash.update(`${key}=${process.env[key]}\0`);
  return hash.digest("hex");
}

/** True when `distDir` holds a complete build made from exactly this fingerprint. */
export function buildIsCurrent(root: string, distDir: string, fingerprint: string | undefined): boolean {
  if (!fingerprint) return false;
  const dir = path.join(root, distDir);
  if (!fs.existsSync(path.join(dir, "BUILD_ID"))) return false;
  try {
    const stamp = JSON.parse(fs.readFileSync(path.join(dir, STAMP), "utf8")) as { fingerprint?: string };
    return stamp.fingerprint === fingerprint;
  } catch {
    return false;
  }
}

/** Records that the build in `distDir` was made from `fingerprint` (call after a successful build). */
export function recordBuild(root: string, distDir: string, fingerprint: string | undefined): void {
  const file = path.join(root, distDir, STAMP);
  if (!fingerprint) {
    fs.rmSync(file, { force: true });
    return;
  }
  fs.writeFileSync(file, JSON.stringify({ fingerprint, builtAt: new Date().toISOString() }, null, 2));
}

/** Removes the stamp before a build starts, so an interrupted build is never taken as current. */
export function forgetBuild(root: string, distDir: string): void {
  fs.rmSync(path.join(root, distDir, STAMP), { force: true });
}
