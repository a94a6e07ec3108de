/**
 * Benchmark: absorptionSpectrum (lib/porous) at random incidence for a 3-layer stack (fabric facing,
 * 50 mm porous, 100 mm air gap) at the 31 one-third-octave frequencies 20 Hz…20 kHz (IEC 61260-1
 * exact mid-band). Reports the median of repeated runs. Run: npx tsx bench/absorption.ts
 */
import { absorptionSpectrum, type Layer } from "../lib/porous/index";

const layers: Layer[] = [
  { kind: "resistive-sheet", flowResistance: 150 },
  { kind: "porous", thicknessM: 0.05, flowResistivity: 15_000, model: "delany-bazley" },
  { kind: "air", thicknessM: 0.1 },
];
const frequenciesHz = Array.from({ length: 31 }, (_, i) => 1000 * 10 ** ((3 / 10) * ((i - 17) / 3))); // 20 Hz … 20 kHz
const RUNS = 201;

const median = (v: number[]) => {
  const s = [...v].sort((a, b) => a - b);
  return s[s.length >> 1]!;
};

let sink = 0;
for (let i = 0; i < 50; i++) sink += absorptionSpectrum(layers, { frequenciesHz, incidence: "random" })[10]!.alpha; // warm-up
const times: number[] = [];
for (let i = 0; i < RUNS; i++) {
  const t0 = performance.now();
  const out = absorptionSpectrum(layers, { frequenciesHz, incidence: "random" });
  times.push(performance.now() - t0);
  sink += out[10]!.alpha;
}
const m = median(times);
console.log(
  `absorptionSpectrum, 3 layers, random incidence (96 angles), 31 third-octave frequencies: median ${m.toFixed(3)} ms ` +
    `over ${RUNS} runs (min ${Math.min(...times).toFixed(3)} ms); ≈ ${Math.round(1000 / m)} spectra/s  [checksum ${sink.toFixed(3)}]`,
);
