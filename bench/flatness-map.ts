/**
 * Benchmark: flatnessMap (lib/modes) against a vectorised numpy evaluation of the same modal sum,
 * measured in the same run with identical inputs. Run: npx tsx bench/flatness-map.ts
 *
 * Targets (issue 3): TS median < 80 ms and <= 0.4 x the numpy median. Both maps must agree.
 */
import { execFileSync } from "node:child_process";
import { mkdirSync, readFileSync, writeFileSync } from "node:fs";
import { availableParallelism, loadavg } from "node:os";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { flatnessMap, logSpacedFrequencies, roomModes } from "../lib/modes/index";

const here = dirname(fileURLToPath(import.meta.url));
const outDir = join(here, "out");
mkdirSync(outDir, { recursive: true });

const room = { lengthM: 7.2, widthM: 5.1, heightM: 2.7 };
const options = {
  source: [0.4, 0.35, 0.3] as [number, number, number],
  heightM: 1.2,
  gridX: 120,
  gridY: 90,
  frequenciesHz: logSpacedFrequencies(15, 250, 400),
  rt60Seconds: 0.5,
  speedOfSound: 343,
  maxModeFrequencyHz: 400,
};
const TS_RUNS = 15;
const NUMPY_RUNS = 5;

const median = (v: number[]) => {
  const s = [...v].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m]! : (s[m - 1]! + s[m]!) / 2;
};

// TypeScript: warm-up, then timed runs.
for (let i = 0; i < 3; i++) flatnessMap(room, options);
const tsTimes: number[] = [], tsCpu: number[] = [];
let ts = flatnessMap(room, options);
const loadBefore = loadavg()[0]!;
for (let i = 0; i < TS_RUNS; i++) {
  const c0 = process.cpuUsage();
  const t0 = performance.now();
  ts = flatnessMap(room, options);
  tsTimes.push(performance.now() - t0);
  const c = process.cpuUsage(c0);
  tsCpu.push((c.user + c.system) / 1000);
}

// numpy: same inputs, in a child process; OPENBLAS_CORETYPE / OPENBLAS_L2_SIZE unset for it only.
const input = join(outDir, "flatness-input.json");
const output = join(outDir, "flatness-numpy.bin");
writeFileSync(input, JSON.stringify({ room, ...options, numpyRuns: NUMPY_RUNS }));
const env = { ...process.env };
const removed = ["OPENBLAS_CORETYPE", "OPENBLAS_L2_SIZE"].filter((k) => k in env);
for (const k of removed) delete env[k];
const py = JSON.parse(execFileSync("python3", [join(here, "flatness_numpy.py"), input, output], { env, encoding: "utf8" }).trim().split("\n").pop()!) as {
  timesMs: number[]; modes: number; numpy: string; blas: unknown;
};
const buf = readFileSync(output);
const np = new Float64Array(buf.buffer.slice(buf.byteOffset, buf.byteOffset + buf.byteLength));

let maxDiff = 0;
for (let i = 0; i < np.length; i++) maxDiff = Math.max(maxDiff, Math.abs(np[i]! - ts.stdDevDb[i]!));
const modesTs = roomModes(room, { maxFrequencyHz: options.maxModeFrequencyHz }).length + 1; // + the (0,0,0) term

const tsMedian = median(tsTimes), npMedian = median(py.timesMs);
const ratio = tsMedian / npMedian;
const f = (v: number) => v.toFixed(1);
console.log(`flatnessMap: ${room.lengthM} x ${room.widthM} x ${room.heightM} m, grid ${options.gridX} x ${options.gridY}, ${options.frequenciesHz.length} frequencies 15-250 Hz, modes <= ${options.maxModeFrequencyHz} Hz: ${modesTs} terms (numpy ${py.modes})`);
console.log(`node ${process.version}; numpy ${py.numpy}; BLAS ${JSON.stringify(py.blas)}; unset for numpy: ${removed.length ? removed.join(", ") : "(neither was set)"}`);
console.log(`load average before the runs: ${loadBefore.toFixed(2)} on ${availableParallelism()} cores (others' work inflates wall-clock times)`);
console.log(`TS    runs (ms): ${tsTimes.map(f).join(" ")}  median ${f(tsMedian)} ms, min ${f(Math.min(...tsTimes))} ms (process CPU time median ${f(median(tsCpu))} ms)`);
console.log(`numpy runs (ms): ${py.timesMs.map(f).join(" ")}  median ${f(npMedian)} ms, min ${f(Math.min(...py.timesMs))} ms`);
console.log(`ratio TS / numpy = ${ratio.toFixed(3)}; max |std-dev difference| = ${maxDiff.toExponential(2)} dB over ${np.length} cells`);
const okSpeed = tsMedian < 80, okRatio = ratio <= 0.4, okSame = maxDiff < 1e-9 && np.length === ts.stdDevDb.length && py.modes === modesTs;
console.log(`targets: < 80 ms ${okSpeed ? "met" : "MISSED"}; <= 0.4 x numpy ${okRatio ? "met" : "MISSED"}; same map ${okSame ? "yes" : "NO"}`);
if (!okSame) process.exitCode = 1;
