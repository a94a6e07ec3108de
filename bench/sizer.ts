/**
 * Benchmark: sizeTreatment (lib/sizer) on the demo media room — 5.8 × 4.1 × 2.5 m, drywall walls and
 * ceiling, carpet on pad, listening-room target, default catalogue (24 builds), all four vertical corners,
 * the rear, left and right wall–ceiling edges and 20 m² of wall free, 700 mm depth limit — for each
 * objective. Each run includes evaluating the catalogue through lib/porous. Target: median < 300 ms.
 * Run: npx tsx bench/sizer.ts
 */
import { sizeTreatment, type SizerInput, type SizerObjective } from "../lib/sizer/index";

const L = 5.8;
const W = 4.1;
const H = 2.5;
const base: Omit<SizerInput, "objective"> = {
  room: { lengthM: L, widthM: W, heightM: H },
  surfaces: [
    { areaM2: 2 * (L + W) * H, finish: "painted-drywall-on-studs", label: "walls" },
    { areaM2: L * W, finish: "painted-drywall-on-studs", label: "ceiling" },
    { areaM2: L * W, finish: "carpet-on-pad", label: "floor" },
  ],
  target: { kind: "listening-room" },
  limits: {
    maxDepthM: 0.7,
    verticalCorners: ["front-left", "front-right", "rear-left", "rear-right"],
    ceilingEdges: [{ edge: "rear", lengthM: 4.1 }, { edge: "left", lengthM: 5.8 }, { edge: "right", lengthM: 5.8 }],
    wallAreaM2: 20,
  },
};
const RUNS = 21;
const median = (v: number[]) => [...v].sort((a, b) => a - b)[v.length >> 1]!;

for (const objective of ["depth", "count", "cost"] as SizerObjective[]) {
  const input = { ...base, objective };
  sizeTreatment(input); // warm-up
  const times: number[] = [];
  let last = sizeTreatment(input);
  for (let i = 0; i < RUNS; i++) {
    const t0 = performance.now();
    last = sizeTreatment(input);
    times.push(performance.now() - t0);
  }
  const m = median(times);
  console.log(
    `sizeTreatment, demo media room, objective ${objective}: median ${m.toFixed(1)} ms over ${RUNS} runs (min ${Math.min(...times).toFixed(1)}, max ${Math.max(...times).toFixed(1)} ms), ` +
      `${last.search.nodes} nodes, ${last.search.combinations} complete sets scored; ${m < 300 ? "meets" : "MISSES"} the 300 ms target`,
  );
  console.log(
    `  → ${last.reached ? "reached" : "not reached"}: ${last.items.map((it) => `${it.count} × ${it.candidateId}`).join(", ")}; ` +
      `${last.totals.count} items, cost ${last.totals.cost.toFixed(2)}, deepest ${Math.round(last.totals.maxProjectionM * 1000)} mm, ${last.totals.weightKg.toFixed(0)} kg`,
  );
  console.log(`  RT before → after (target ${last.bands[0]!.targetS.toFixed(2)} s): ${last.bands.map((b) => `${b.nominalHz} Hz ${b.beforeS.toFixed(2)}→${b.afterS.toFixed(2)} s (${b.verdictAfter})`).join(", ")}`);
}
