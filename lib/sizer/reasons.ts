import type { RequiredAbsorptionBand } from "@/lib/reverb";
import type { BindingLimit, EvaluatedCandidate, ProposedItem, SizerBand, SizerInput, SizerResult } from "./types";

const WORDS = ["no", "one", "two", "three", "four", "five", "six", "seven", "eight", "nine", "ten", "eleven", "twelve"];

/** A count in words up to twelve, digits above. @example describeCount(4) // "four" */
export function describeCount(n: number): string {
  return WORDS[n] ?? String(n);
}

const m2 = (x: number) => `${x.toFixed(1)} m²`;
/** A shortfall never prints as "0.0 m²": small ones keep two decimals, tiny ones say so. */
const shortfall = (x: number) => (x >= 0.05 ? m2(x) : x >= 0.005 ? `${x.toFixed(2)} m²` : "under 0.01 m²");
const s = (x: number) => `${x.toFixed(2)} s`;
const mm = (x: number) => `${Math.round(x * 1000)} mm`;

/** Plain-words reasons for the proposal and, when the aim is not reached, which limits bind. */
export function explain(ctx: {
  input: SizerInput;
  evaluated: readonly EvaluatedCandidate[];
  items: readonly ProposedItem[];
  bands: readonly SizerBand[];
  sizedIdx: readonly number[];
  need: readonly RequiredAbsorptionBand[];
  reached: boolean;
  totals: SizerResult["totals"];
  maxAddM2: readonly number[];
  budget: number;
  maxItems: number;
}): { reasons: string[]; binding: SizerResult["binding"] } {
  const { input, evaluated, items, bands, sizedIdx, reached, totals } = ctx;
  const reasons: string[] = [];
  for (const b of sizedIdx) {
    const band = bands[b]!;
    const hz = `${band.nominalHz} Hz`;
    if (band.neededM2 <= 1e-9) {
      reasons.push(`the ${hz} band already meets the aim (${s(band.beforeS)} against ${s(band.targetS)})${band.addedM2 > 0.05 ? `; the proposal still adds about ${m2(band.addedM2)} there, taking it to ${s(band.afterS)}` : ""}`);
      continue;
    }
    const parts = items
      .filter((it) => it.addedM2[b]! > 0.005)
      .map((it) => `${describeCount(it.count)} of "${it.name}" ${it.count === 1 ? "adds" : "add"} about ${m2(it.addedM2[b]!)}`);
    const head = `the ${hz} band needs about ${m2(band.neededM2)} more absorption area (to bring ${s(band.beforeS)} to ${s(band.targetS)})`;
    if (items.length === 0) reasons.push(`${head}; nothing within the limits can be added`);
    else {
      const tail = band.missingM2 > 1e-9 ? `, ${m2(band.missingM2)} short` : "";
      reasons.push(`${head}; the proposal adds about ${m2(band.addedM2)} there${tail}${parts.length ? `: ${parts.join(", ")}` : ""}`);
    }
  }
  if (items.length > 0) {
    const why =
      input.objective === "cost"
        ? `the least materials cost (${totals.cost.toFixed(2)})`
        : input.objective === "count"
          ? `the fewest items (${totals.count})`
          : `the least depth (deepest item ${mm(totals.maxProjectionM)} from the wall)`;
    reasons.push(`${reached ? "of the sets that reach the aim" : "of the sets that come closest to the aim"}, this one has ${why}`);
  }

  const binding: { limit: BindingLimit; message: string }[] = [];
  if (!reached) {
    const L = input.limits;
    const excluded = evaluated.filter((e) => !e.allowed);
    if (excluded.length > 0) {
      binding.push({ limit: "depth", message: `the depth limit of ${mm(L.maxDepthM)} rules out ${excluded.length} of the ${evaluated.length} builds (the shallowest ruled out stands ${mm(Math.min(...excluded.map((e) => e.projectionM)))} from the wall)` });
    }
    const allowed = evaluated.filter((e) => e.allowed);
    const has = (p: string) => allowed.some((e) => e.placement === p);
    if (has("vertical-corner") && totals.verticalCorners >= L.verticalCorners.length) {
      binding.push({ limit: "vertical-corners", message: L.verticalCorners.length === 0 ? "no floor-to-ceiling corner is free" : `all ${L.verticalCorners.length} free floor-to-ceiling corners are used` });
    }
    const edgeCap = Math.max(0, ...allowed.filter((e) => e.placement === "ceiling-edge").map((e) => e.capacity));
    if (has("ceiling-edge") && totals.ceilingSegments >= edgeCap) {
      binding.push({ limit: "ceiling-edges", message: edgeCap === 0 ? "no wall–ceiling edge is free" : `the free wall–ceiling edges hold ${edgeCap} segments, all used` });
    }
    const wallFaces = allowed.filter((e) => e.placement === "wall").map((e) => e.wallAreaM2);
    if (wallFaces.length > 0 && L.wallAreaM2 - totals.wallAreaM2 < Math.min(...wallFaces) - 1e-9) {
      binding.push({ limit: "wall-area", message: `the free wall area (${m2(L.wallAreaM2)}) is used up: ${m2(totals.wallAreaM2)} taken` });
    }
    const cheapest = Math.min(...allowed.map((e) => e.unitCost));
    if (Number.isFinite(ctx.budget) && allowed.length > 0 && ctx.budget - totals.cost < cheapest) {
      binding.push({ limit: "budget", message: `the budget of ${ctx.budget.toFixed(2)} leaves ${(ctx.budget - totals.cost).toFixed(2)}, less than the cheapest build (${cheapest.toFixed(2)})` });
    }
    if (totals.count >= ctx.maxItems) binding.push({ limit: "max-items", message: `the limit of ${ctx.maxItems} items is reached` });
    sizedIdx.forEach((b, j) => {
      const cap = ctx.maxAddM2[j]!;
      if (!Number.isFinite(cap)) return;
      const smallest = Math.min(...allowed.map((e) => e.unitAbsorptionM2[b]!).filter((a) => a > 0));
      if (Number.isFinite(smallest) && bands[b]!.addedM2 + smallest > cap + 1e-9) {
        binding.push({ limit: "over-damping", message: `adding more would take the ${bands[b]!.nominalHz} Hz band below the target's lower edge (${s(bands[b]!.lowerS)})` });
      }
    });
    if (binding.length === 0) {
      const short = sizedIdx.filter((b) => bands[b]!.missingM2 > 1e-9).map((b) => `${bands[b]!.nominalHz} Hz`);
      binding.push({ limit: "catalogue", message: `the allowed builds add too little at ${short.join(", ")} for any count within the limits` });
    }
    const missing = sizedIdx.filter((b) => bands[b]!.missingM2 > 1e-9).map((b) => `${shortfall(bands[b]!.missingM2)} at ${bands[b]!.nominalHz} Hz`);
    reasons.push(`the aim is not reached: still missing ${missing.join(", ")}; limiting: ${binding.map((x) => x.message).join("; ")}`);
  }
  return { reasons, binding };
}
