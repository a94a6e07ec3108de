import type { EvaluatedCandidate, SizerObjective } from "./types";

/** What the search needs per sized band. */
export interface SearchProblem {
  /** area to add per sized band, m² */
  needM2: number[];
  /** most area that may be added per sized band before the time falls below the band's lower edge (Infinity: no cap) */
  maxAddM2: number[];
  /** candidate indices per slot, in search order; the last slot is solved in closed form */
  slots: { candidates: { index: number; unit: number[] }[]; kind: "vertical-corner" | "ceiling-edge" | "wall" }[];
  candidates: readonly EvaluatedCandidate[];
  wallAreaM2: number;
  budget: number;
  maxItems: number;
  objective: SizerObjective;
}

/** The best set found. */
export interface SearchResult {
  chosen: { index: number; count: number }[];
  addedM2: number[];
  score: number[];
  nodes: number;
  combinations: number;
}

const EPS = 1e-9;

export const SEARCH_METHOD =
  "exact branch-and-bound over one build per placement (floor-to-ceiling corners, wall–ceiling edges, wall resonators, wall porous panels) × its count, within every limit; score compared lexicographically: first the shortfall Σ max(0, need − added)/need over the 63–250 Hz bands, then the objective (least depth: largest projection, then count, then cost; least count: count, cost, projection; least cost: cost, count, projection). A branch is cut when even the most every later placement could add leaves a larger shortfall, or when its depth, count and cost already match or exceed the best set's (all three only grow as items are added). The last placement's count is solved in closed form (the fewest units that clear the remaining need, capped by the limits). Optimal within that space; not searched: two different builds in the same placement, mixed orientations and partial corner heights.";

/** Lexicographic compare with a tolerance: −1, 0 or 1. */
function compare(a: readonly number[], b: readonly number[]): number {
  for (let i = 0; i < a.length; i++) {
    const x = a[i]!;
    const y = b[i]!;
    if (x === y) continue;
    if (!Number.isFinite(x) || !Number.isFinite(y)) return x < y ? -1 : 1; // the starting score is Infinity
    const tol = EPS * Math.max(1, Math.abs(x), Math.abs(y));
    if (x - y < -tol) return -1;
    if (x - y > tol) return 1;
  }
  return 0;
}

/**
 * Branch-and-bound search for the set of (build × count) that best meets the need (see {@link SEARCH_METHOD}).
 * Deterministic: slots, candidates and counts are visited in a fixed order and ties keep the first set found.
 */
export function searchTreatment(p: SearchProblem): SearchResult {
  const nb = p.needM2.length;
  const cands = p.candidates;
  const slots = p.slots;
  // most area each slot and all later slots could add per band (ignores budget and shared wall area: optimistic)
  const optimistic: number[][] = Array.from({ length: slots.length + 1 }, () => new Array<number>(nb).fill(0));
  for (let s = slots.length - 1; s >= 0; s--) {
    for (let b = 0; b < nb; b++) {
      let best = 0;
      for (const c of slots[s]!.candidates) {
        const cap = slotCapacity(p, c.index, p.wallAreaM2);
        best = Math.max(best, cap * c.unit[b]!);
      }
      optimistic[s]![b] = optimistic[s + 1]![b]! + best;
    }
  }
  // per band, over slots s…end: the lowest cost per m² and the largest area of one unit (for the
  // lower bounds on the cost and count still needed to close a gap)
  const costPerM2: number[][] = Array.from({ length: slots.length + 1 }, () => new Array<number>(nb).fill(Infinity));
  const unitMax: number[][] = Array.from({ length: slots.length + 1 }, () => new Array<number>(nb).fill(0));
  for (let s = slots.length - 1; s >= 0; s--) {
    for (let b = 0; b < nb; b++) {
      let r = costPerM2[s + 1]![b]!;
      let u = unitMax[s + 1]![b]!;
      for (const c of slots[s]!.candidates) {
        if (c.unit[b]! <= 0) continue;
        r = Math.min(r, cands[c.index]!.unitCost / c.unit[b]!);
        u = Math.max(u, c.unit[b]!);
      }
      costPerM2[s]![b] = r;
      unitMax[s]![b] = u;
    }
  }
  const shortfall = (added: readonly number[]) => {
    let s = 0;
    for (let b = 0; b < nb; b++) if (p.needM2[b]! > EPS) s += Math.max(0, p.needM2[b]! - added[b]!) / p.needM2[b]!;
    return s;
  };
  const metrics = (count: number, cost: number, depth: number) =>
    p.objective === "depth" ? [depth, count, cost] : p.objective === "count" ? [count, cost, depth] : [cost, count, depth];

  let best: number[] = [Infinity, Infinity, Infinity, Infinity];
  let bestChosen: { index: number; count: number }[] = [];
  let bestAdded: number[] = new Array<number>(nb).fill(0);
  let nodes = 0;
  let combinations = 0;
  const chosen: { index: number; count: number }[] = [];
  const added = new Array<number>(nb).fill(0);

  const consider = (count: number, cost: number, depth: number) => {
    combinations++;
    const score = [shortfall(added), ...metrics(count, cost, depth)];
    if (compare(score, best) < 0) {
      best = score;
      bestChosen = chosen.map((c) => ({ ...c }));
      bestAdded = [...added];
    }
  };

  // largest k ≤ kMax that keeps every band within its over-damping cap
  const capByDamping = (unit: readonly number[], kMax: number) => {
    let k = kMax;
    for (let b = 0; b < nb; b++) {
      if (unit[b]! <= 0 || !Number.isFinite(p.maxAddM2[b]!)) continue;
      k = Math.min(k, Math.floor((p.maxAddM2[b]! - added[b]!) / unit[b]! + EPS));
    }
    return Math.max(0, k);
  };

  const visit = (s: number, count: number, cost: number, depth: number, wallLeft: number) => {
    nodes++;
    const lb = new Array<number>(nb);
    for (let b = 0; b < nb; b++) lb[b] = added[b]! + optimistic[s]![b]!;
    const lbShort = shortfall(lb);
    let lbCount = count;
    let lbCost = cost;
    if (lbShort <= EPS && best[0]! <= EPS) {
      // any completion that beats a set reaching the aim must reach it too: it needs at least
      // max_b gap_b / (largest unit area) more items and max_b gap_b · (lowest cost per m²) more cost
      let extraCount = 0;
      let extraCost = 0;
      for (let b = 0; b < nb; b++) {
        const gap = p.needM2[b]! - added[b]!;
        if (gap <= EPS) continue;
        if (unitMax[s]![b]! > 0) extraCount = Math.max(extraCount, Math.ceil(gap / unitMax[s]![b]! - EPS));
        if (Number.isFinite(costPerM2[s]![b]!)) extraCost = Math.max(extraCost, gap * costPerM2[s]![b]!);
      }
      lbCount += extraCount;
      lbCost += extraCost * (1 - 1e-12);
    }
    if (compare([lbShort, ...metrics(lbCount, lbCost, depth)], best) >= 0) return;
    if (s === slots.length) {
      consider(count, cost, depth);
      return;
    }
    const last = s === slots.length - 1;
    for (const c of slots[s]!.candidates) {
      const e = cands[c.index]!;
      let kMax = Math.min(slotCapacity(p, c.index, wallLeft), p.maxItems - count);
      if (e.unitCost > 0) kMax = Math.min(kMax, Math.floor((p.budget - cost) / e.unitCost + EPS));
      kMax = capByDamping(c.unit, kMax);
      if (kMax <= 0) continue;
      const d = Math.max(depth, e.projectionM);
      if (last) {
        // closed form: the fewest units that clear every band this build helps, capped by kMax
        let kNeed = 0;
        for (let b = 0; b < nb; b++) {
          const gap = p.needM2[b]! - added[b]!;
          if (gap > EPS && c.unit[b]! > EPS) kNeed = Math.max(kNeed, Math.ceil(gap / c.unit[b]! - EPS));
        }
        const k = Math.min(kMax, kNeed);
        if (k <= 0) continue;
        apply(c.unit, k, +1);
        chosen.push({ index: c.index, count: k });
        consider(count + k, cost + k * e.unitCost, d);
        chosen.pop();
        apply(c.unit, k, -1);
        continue;
      }
      for (let k = 1; k <= kMax; k++) {
        apply(c.unit, k, +1);
        chosen.push({ index: c.index, count: k });
        visit(s + 1, count + k, cost + k * e.unitCost, d, wallLeft - k * e.wallAreaM2);
        chosen.pop();
        const met = p.needM2.every((n, b) => added[b]! >= n - EPS);
        apply(c.unit, k, -1);
        if (met) break; // more of this build cannot lower the shortfall and only raises count and cost
      }
    }
    if (last) consider(count, cost, depth); // none in the last slot
    else visit(s + 1, count, cost, depth, wallLeft); // none in this slot
  };

  function apply(unit: readonly number[], k: number, sign: 1 | -1) {
    for (let b = 0; b < nb; b++) added[b]! += sign * k * unit[b]!;
  }

  visit(0, 0, 0, 0, p.wallAreaM2);
  return { chosen: bestChosen, addedM2: bestAdded, score: best, nodes, combinations };
}

function slotCapacity(p: SearchProblem, index: number, wallLeft: number): number {
  const e = p.candidates[index]!;
  if (e.placement === "wall") return e.wallAreaM2 > 0 ? Math.floor(wallLeft / e.wallAreaM2 + EPS) : 0;
  return e.capacity;
}
