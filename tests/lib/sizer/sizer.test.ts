import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { buildQuantities } from "@/lib/build-sheet";
import { schroederFrequency } from "@/lib/modes";
import { airDensity, bandSet, evaluateTarget, predictReverberation, speedOfSound } from "@/lib/reverb";
import { cornerTrapAbsorption, membraneResonanceHz, panelAbsorption, perforatedPanelResonanceHz } from "@/lib/porous";
import {
  DEFAULT_PRICES,
  MEMBRANE_SHEET,
  defaultCatalogue,
  sizeTreatment,
  type Candidate,
  type SizerInput,
  type SizerResult,
} from "@/lib/sizer";

// Demo media room (invented): 5.8 × 4.1 × 2.5 m, drywall walls and ceiling, carpet on pad.
const L = 5.8;
const W = 4.1;
const H = 2.5;
const SURFACES = [
  { areaM2: 2 * (L + W) * H, finish: "painted-drywall-on-studs", label: "walls" },
  { areaM2: L * W, finish: "painted-drywall-on-studs", label: "ceiling" },
  { areaM2: L * W, finish: "carpet-on-pad", label: "floor" },
];
const ALL_CORNERS = ["front-left", "front-right", "rear-left", "rear-right"] as const;
const LIMITS = {
  maxDepthM: 0.7,
  verticalCorners: [...ALL_CORNERS],
  ceilingEdges: [{ edge: "rear" as const, lengthM: 4.1 }, { edge: "left" as const, lengthM: 5.8 }, { edge: "right" as const, lengthM: 5.8 }],
  wallAreaM2: 20,
};
const DEMO: SizerInput = { room: { lengthM: L, widthM: W, heightM: H }, surfaces: SURFACES, target: { kind: "listening-room" }, objective: "cost", limits: LIMITS };
type ArbValue<A> = A extends fc.Arbitrary<infer T> ? T : never;
const SIZED = [0, 1, 2]; // 63, 125, 250 Hz in the octave set
const AIR = { densityKgM3: airDensity(20), speedOfSound: speedOfSound(20) };
const EXACT = bandSet("octave").exactHz;

function roomRequired(input: SizerInput) {
  const V = input.room.lengthM * input.room.widthM * input.room.heightM;
  return evaluateTarget(
    { volumeM3: V, surfaces: input.surfaces, treatment: input.currentTreatmentM2 ? { extraAbsorptionM2: [...input.currentTreatmentM2] } : undefined },
    input.target,
  ).required;
}

describe("defaultCatalogue", () => {
  it("holds every family: corner traps, wall–ceiling traps, 100–200 mm panels with 0–200 mm gaps, membrane and perforated traps", () => {
    const c = defaultCatalogue();
    expect(new Set(c.map((x) => x.id)).size).toBe(c.length);
    const panels = c.filter((x): x is Extract<Candidate, { kind: "panel" }> => x.kind === "panel");
    expect(Math.min(...panels.map((p) => p.insulationThicknessM))).toBe(0.1);
    expect(Math.max(...panels.map((p) => p.insulationThicknessM))).toBe(0.2);
    expect(new Set(panels.map((p) => p.airGapM))).toEqual(new Set([0, 0.1, 0.2]));
    expect(c.some((x) => x.kind === "corner-trap" && x.orientation === "floor-to-ceiling")).toBe(true);
    expect(c.some((x) => x.kind === "corner-trap" && x.orientation === "wall-ceiling")).toBe(true);
    expect(c.some((x) => x.kind === "membrane-trap" && x.perforation)).toBe(true);
  });

  it("membrane traps are tuned to 63, 80, 100, 125 Hz by f₀ = 60/√(m·d) (Everest & Pohlmann, handbook rule) within the 1 mm rounding (2 %)", () => {
    const m = MEMBRANE_SHEET.thicknessM * MEMBRANE_SHEET.densityKgM3;
    const membranes = defaultCatalogue().filter((x): x is Extract<Candidate, { kind: "membrane-trap" }> => x.kind === "membrane-trap" && !x.perforation);
    expect(membranes).toHaveLength(4);
    for (const [i, hz] of [63, 80, 100, 125].entries()) {
      expect(Math.abs(membraneResonanceHz({ massKgM2: m, cavityDepthM: membranes[i]!.cavityDepthM }) / hz - 1)).toBeLessThan(0.02);
    }
  });

  it("perforated traps are tuned by f₀ = (c/2π)√(ε/(t′D)) (Everest & Pohlmann) within the 0.0001 rounding of ε (1 %)", () => {
    const perforated = defaultCatalogue().filter((x): x is Extract<Candidate, { kind: "membrane-trap" }> => x.kind === "membrane-trap" && x.perforation !== undefined);
    for (const [i, hz] of [80, 100, 125].entries()) {
      const p = perforated[i]!;
      const f = perforatedPanelResonanceHz({ openAreaRatio: p.perforation!.openAreaRatio, plateThicknessM: p.sheet.thicknessM, holeDiameterM: p.perforation!.holeDiameterM, cavityDepthM: p.cavityDepthM });
      expect(Math.abs(f / hz - 1)).toBeLessThan(0.01);
    }
  });
});

describe("sizeTreatment — candidates come from the engines", () => {
  const r = sizeTreatment(DEMO);

  it("a floor-to-ceiling corner trap's unit area equals lib/porous cornerTrapAbsorption over the room height at the room's air (1e-12)", () => {
    const e = r.candidates.find((c) => c.id === "corner-450-gf16")!;
    const direct = cornerTrapAbsorption({ depthM: 0.45, lengthM: H, orientation: "floor-to-ceiling", flowResistivity: 5000, model: "miki", frequenciesHz: EXACT }, AIR);
    e.unitAbsorptionM2.forEach((a, b) => expect(a).toBeCloseTo(direct.bands[b]!.absorptionAreaM2, 12));
    expect(e.projectionM).toBeCloseTo(0.45 * Math.SQRT2, 12); // leg D√2 along each wall
  });

  it("a panel with an air gap equals lib/porous panelAbsorption of [porous, air] (1e-12); its cost is the build-sheet quantities at the prices", () => {
    const e = r.candidates.find((c) => c.id === "panel-100-gap-100")!;
    const direct = panelAbsorption({ widthM: 0.6, heightM: 1.2, layers: [{ kind: "porous", thicknessM: 0.1, flowResistivity: 10_000, model: "miki" }, { kind: "air", thicknessM: 0.1 }], frequenciesHz: EXACT }, AIR);
    e.unitAbsorptionM2.forEach((a, b) => expect(a).toBeCloseTo(direct.bands[b]!.absorptionAreaM2, 12));
    const q = buildQuantities(e.build, { lumber: { thicknessM: 0.019, widthM: 0.2 }, fabric: { wrapM: 0.05 } });
    const P = DEFAULT_PRICES;
    expect(e.unitCost).toBeCloseTo(q.frameVolumeM3 * P.lumberPerM3 + q.insulationVolumeM3 * P.insulationPerM3 + q.fabricAreaM2 * P.fabricPerM2 + q.screws * P.screwEach + q.cleats * P.cleatEach, 9);
    expect(e.unitWeightKg).toBeCloseTo(q.weightKg, 12);
  });
});

describe("sizeTreatment — the demo media room, listening-room target", () => {
  const results = (["depth", "count", "cost"] as const).map((objective) => sizeTreatment({ ...DEMO, objective }));

  it("reaches the target at 63–250 Hz with added area ≥ lib/reverb requiredAbsorption per band, for every objective", () => {
    const required = roomRequired(DEMO);
    for (const r of results) {
      expect(r.reached).toBe(true);
      for (const b of SIZED) expect(r.addedM2[b]!).toBeGreaterThanOrEqual(required[b]!.addM2 - 1e-9);
      expect(r.binding).toEqual([]);
    }
  });

  it("after-times equal lib/reverb predictReverberation with the added area as extra treatment (1e-12), and sized bands are not over-damped", () => {
    for (const r of results) {
      const p = predictReverberation({ volumeM3: L * W * H, surfaces: SURFACES, treatment: { extraAbsorptionM2: r.addedM2 } });
      r.bands.forEach((b, i) => expect(b.afterS).toBeCloseTo(p.bands[i]!.timeS, 12));
      for (const b of SIZED) expect(r.bands[b]!.afterS).toBeGreaterThanOrEqual(r.bands[b]!.lowerS - 1e-9);
    }
  });

  it("each objective wins on its own measure: least depth, fewest items, least cost", () => {
    const [depth, count, cost] = results as [SizerResult, SizerResult, SizerResult];
    expect(depth.totals.maxProjectionM).toBeLessThanOrEqual(Math.min(count.totals.maxProjectionM, cost.totals.maxProjectionM) + 1e-12);
    expect(count.totals.count).toBeLessThanOrEqual(Math.min(depth.totals.count, cost.totals.count));
    expect(cost.totals.cost).toBeLessThanOrEqual(Math.min(depth.totals.cost, count.totals.cost) + 1e-9);
  });

  it("gives plain-words reasons with the computed figures, and the Schroeder caveat with fs = 2000·√(T/V) (Schroeder 1996)", () => {
    const r = results[2]!;
    const b63 = r.bands[0]!;
    expect(r.reasons[0]).toContain(`the 63 Hz band needs about ${b63.neededM2.toFixed(1)} m² more absorption area`);
    expect(r.reasons[0]).toContain(`the proposal adds about ${b63.addedM2.toFixed(1)} m² there`);
    const t = (r.bands[3]!.afterS + r.bands[4]!.afterS) / 2;
    expect(r.schroederFrequencyHz).toBeCloseTo(schroederFrequency(t, L * W * H), 12);
    expect(r.caveat).toContain(`${Math.round(r.schroederFrequencyHz)} Hz`);
    expect(r.caveat).toMatch(/rough/);
  });

  it("places floor-to-ceiling traps in distinct free corners and wall–ceiling segments within each edge's length", () => {
    for (const r of results) {
      const corners = r.items.filter((i) => i.placement === "vertical-corner").flatMap((i) => i.where);
      expect(new Set(corners).size).toBe(corners.length);
      for (const it of r.items.filter((i) => i.placement === "ceiling-edge")) {
        const used = it.where.reduce((s, w) => s + Number(/: (\d+) ×/.exec(w)![1]), 0);
        expect(used).toBe(it.count);
      }
    }
  });

  it("modal response at the seat: with more damping the spread over 20 Hz…fs does not grow", () => {
    const r = sizeTreatment({ ...DEMO, seat: { source: [0.3, 0.3, 0.3], receiver: [3.5, 2.05, 1.1] } });
    expect(r.modal!.beforeDb).toHaveLength(r.modal!.frequenciesHz.length);
    expect(r.modal!.afterSpreadDb).toBeLessThanOrEqual(r.modal!.beforeSpreadDb + 1e-9);
  });
});

describe("sizeTreatment — limits", () => {
  it("max depth 50 mm → no porous trap fits (only the 43 mm membrane trap): not reached, the depth limit named", () => {
    const r = sizeTreatment({ ...DEMO, limits: { ...LIMITS, maxDepthM: 0.05 } });
    expect(r.reached).toBe(false);
    expect(r.items.map((i) => i.candidateId)).toEqual(["membrane-125"]); // 34 mm cavity + 9 mm board
    expect(r.binding.map((b) => b.limit)).toContain("depth");
    expect(r.reasons.at(-1)).toMatch(/depth limit of 50 mm rules out 23 of the 24 builds/);
  });

  it("max depth 30 mm → no build at all: nothing proposed, times unchanged", () => {
    const r = sizeTreatment({ ...DEMO, limits: { ...LIMITS, maxDepthM: 0.03 } });
    expect(r.reached).toBe(false);
    expect(r.items).toEqual([]);
    expect(r.reasons.at(-1)).toMatch(/depth limit of 30 mm rules out 24 of the 24 builds/);
    r.bands.forEach((b) => expect(b.afterS).toBe(b.beforeS));
  });

  it("no corners, no edges, 1.5 m² of wall: not reached, says which limits bind and how much area is missing per band", () => {
    const r = sizeTreatment({ ...DEMO, limits: { maxDepthM: 0.7, verticalCorners: [], ceilingEdges: [], wallAreaM2: 1.5 } });
    expect(r.reached).toBe(false);
    expect(r.binding.map((b) => b.limit)).toEqual(expect.arrayContaining(["vertical-corners", "ceiling-edges", "wall-area"]));
    expect(r.totals.count).toBe(2); // two 0.72 m² faces fit 1.5 m²
    const b63 = r.bands[0]!;
    expect(b63.missingM2).toBeCloseTo(b63.neededM2 - b63.addedM2, 12);
    expect(r.reasons.at(-1)).toContain(`${b63.missingM2.toFixed(1)} m² at 63 Hz`);
  });

  it("a zero budget buys nothing and names the budget", () => {
    const r = sizeTreatment({ ...DEMO, limits: { ...LIMITS, budget: 0 } });
    expect(r.items).toEqual([]);
    expect(r.binding.map((b) => b.limit)).toContain("budget");
  });

  it("a room already at the target gets nothing: need 0 in every sized band", () => {
    const r = sizeTreatment({ ...DEMO, target: { kind: "small-room", lowerS: 0.2, upperS: 1.5 } }); // aim 0.85 s, above 0.68 s at 250 Hz
    expect(r.reached).toBe(true);
    expect(r.items).toEqual([]);
    expect(r.reasons[0]).toMatch(/already meets the aim/);
  });

  it("counts the scenario's current treatment: with it the need is smaller by exactly that area (Sabine, 1e-9)", () => {
    const extra = [2, 2, 2, 2, 2, 2, 2, 2];
    const a = sizeTreatment({ ...DEMO, formula: "sabine" });
    const b = sizeTreatment({ ...DEMO, formula: "sabine", currentTreatmentM2: extra });
    for (const i of SIZED) expect(b.bands[i]!.neededM2).toBeCloseTo(a.bands[i]!.neededM2 - 2, 9);
  });

  it("rejects bad input naming the field", () => {
    expect(() => sizeTreatment({ ...DEMO, limits: { ...LIMITS, maxDepthM: -1 } })).toThrow(/limits\.maxDepthM/);
    expect(() => sizeTreatment({ ...DEMO, limits: { ...LIMITS, verticalCorners: ["front-left", "front-left"] } })).toThrow(/verticalCorners/);
    expect(() => sizeTreatment({ ...DEMO, objective: "volume" as never })).toThrow(/objective/);
    expect(() => sizeTreatment({ ...DEMO, currentTreatmentM2: [1, 2] })).toThrow(/currentTreatmentM2/);
  });
});

describe("sizeTreatment — the search is exact over its space (independent brute force)", () => {
  // small catalogue so that every (build × count) per placement can be enumerated directly
  const catalogue = defaultCatalogue().filter((c) => ["corner-350-mw35", "corner-450-gf16", "edge-250-mw35", "membrane-80", "panel-100-gap-0", "panel-200-gap-100"].includes(c.id));
  const input: SizerInput = {
    ...DEMO,
    catalogue,
    target: { kind: "small-room", lowerS: 0.2, upperS: 0.3 },
    limits: { maxDepthM: 0.7, verticalCorners: ["front-left", "rear-right"], ceilingEdges: [{ edge: "rear", lengthM: 4.1 }], wallAreaM2: 6, budget: 900 },
  };

  for (const objective of ["depth", "count", "cost"] as const) {
    it(`${objective}: no set in the space beats the proposal`, () => {
      const r = sizeTreatment({ ...input, objective });
      const need = SIZED.map((b) => r.bands[b]!.neededM2);
      const c = r.candidates;
      const by = (p: string, kind?: string) => c.map((e, i) => ({ e, i })).filter(({ e }) => e.placement === p && (kind === undefined || (kind === "res" ? e.kind === "membrane-trap" : e.kind === "panel")));
      const options = (list: { e: (typeof c)[number]; i: number }[], max: (e: (typeof c)[number]) => number) => [
        { i: -1, k: 0 },
        ...list.flatMap(({ e, i }) => Array.from({ length: Math.max(0, max(e)) }, (_, k) => ({ i, k: k + 1 }))),
      ];
      const score = (sets: { i: number; k: number }[]) => {
        const added = SIZED.map((b) => sets.reduce((s, x) => s + (x.i < 0 ? 0 : x.k * c[x.i]!.unitAbsorptionM2[b]!), 0));
        const short = SIZED.reduce((s, _, j) => s + (need[j]! > 1e-9 ? Math.max(0, need[j]! - added[j]!) / need[j]! : 0), 0);
        const count = sets.reduce((s, x) => s + x.k, 0);
        const cost = sets.reduce((s, x) => s + (x.i < 0 ? 0 : x.k * c[x.i]!.unitCost), 0);
        const depth = Math.max(0, ...sets.filter((x) => x.i >= 0).map((x) => c[x.i]!.projectionM));
        const m = objective === "depth" ? [depth, count, cost] : objective === "count" ? [count, cost, depth] : [cost, count, depth];
        return { key: [short, ...m], cost, wall: sets.reduce((s, x) => s + (x.i < 0 ? 0 : x.k * c[x.i]!.wallAreaM2), 0), added };
      };
      const lexLess = (a: number[], b: number[]) => {
        for (let i = 0; i < a.length; i++) if (Math.abs(a[i]! - b[i]!) > 1e-9 * Math.max(1, Math.abs(b[i]!))) return a[i]! < b[i]!;
        return false;
      };
      const mine = score(r.items.map((it) => ({ i: c.findIndex((e) => e.id === it.candidateId), k: it.count })));
      // the over-damping cap: no band below its lower edge (0.2 s) — check with lib/reverb directly
      const underLower = (added: number[]) => {
        const p = predictReverberation({ volumeM3: L * W * H, surfaces: SURFACES, treatment: { extraAbsorptionM2: EXACT.map((_, b) => (b < 3 ? added[b]! : 0)) } });
        return SIZED.some((b) => p.bands[b]!.timeS < 0.2 - 1e-9);
      };
      let better = 0;
      for (const v of options(by("vertical-corner"), (e) => e.capacity)) {
        for (const e of options(by("ceiling-edge"), (x) => x.capacity)) {
          for (const res of options(by("wall", "res"), (x) => Math.floor(6 / x.wallAreaM2 + 1e-9))) {
            for (const pan of options(by("wall", "panel"), (x) => Math.floor(6 / x.wallAreaM2 + 1e-9))) {
              const s = score([v, e, res, pan]);
              if (s.cost > 900 + 1e-9 || s.wall > 6 + 1e-9) continue;
              if (lexLess(s.key, mine.key) && !underLower(s.added)) better++;
            }
          }
        }
      }
      expect(r.items.length).toBeGreaterThan(0);
      expect(better).toBe(0);
      expect(r.totals.cost).toBeLessThanOrEqual(900 + 1e-9);
    });
  }
});

describe("sizeTreatment — properties on random valid rooms (fast-check)", () => {
  const finishes = ["painted-drywall-on-studs", "plaster-on-masonry", "concrete-block-painted", "wood-floor", "carpet-on-pad", "plywood-panel"];
  const arbInput = fc.record({
    l: fc.double({ min: 3, max: 9, noNaN: true }),
    w: fc.double({ min: 2.5, max: 6, noNaN: true }),
    h: fc.double({ min: 2.2, max: 3.2, noNaN: true }),
    wallFinish: fc.constantFrom(...finishes),
    floorFinish: fc.constantFrom(...finishes),
    objective: fc.constantFrom("depth" as const, "count" as const, "cost" as const),
    maxDepthM: fc.double({ min: 0.05, max: 0.8, noNaN: true }),
    corners: fc.subarray([...ALL_CORNERS]),
    edgeLen: fc.double({ min: 0, max: 6, noNaN: true }),
    wallAreaM2: fc.double({ min: 0, max: 15, noNaN: true }),
    budget: fc.option(fc.double({ min: 0, max: 1500, noNaN: true }), { nil: undefined }),
    maxItems: fc.option(fc.integer({ min: 0, max: 30 }), { nil: undefined }),
    smallRoom: fc.boolean(),
  });
  const toInput = (a: ArbValue<typeof arbInput>): SizerInput => ({
    room: { lengthM: a.l, widthM: a.w, heightM: a.h },
    surfaces: [
      { areaM2: 2 * (a.l + a.w) * a.h, finish: a.wallFinish },
      { areaM2: a.l * a.w, finish: a.wallFinish },
      { areaM2: a.l * a.w, finish: a.floorFinish },
    ],
    target: a.smallRoom ? { kind: "small-room" } : { kind: "listening-room" },
    objective: a.objective,
    limits: {
      maxDepthM: a.maxDepthM,
      verticalCorners: a.corners,
      ceilingEdges: a.edgeLen > 0 ? [{ edge: "left", lengthM: a.edgeLen }] : [],
      wallAreaM2: a.wallAreaM2,
      ...(a.budget !== undefined ? { budget: a.budget } : {}),
      ...(a.maxItems !== undefined ? { maxItems: a.maxItems } : {}),
    },
  });

  it("is reproducible, respects depth, corners, edges, wall area, budget and item limits, and a reached target means added ≥ required", () => {
    fc.assert(
      fc.property(arbInput, (a) => {
        const input = toInput(a);
        const r = sizeTreatment(input);
        expect(sizeTreatment(input)).toEqual(r);
        const lim = input.limits;
        for (const it of r.items) {
          expect(it.projectionM).toBeLessThanOrEqual(lim.maxDepthM + 1e-9);
          expect(it.count).toBeGreaterThan(0);
        }
        expect(r.totals.verticalCorners).toBeLessThanOrEqual(lim.verticalCorners.length);
        expect(r.totals.ceilingSegments).toBeLessThanOrEqual(Math.floor(a.edgeLen / 1.2 + 1e-9));
        expect(r.totals.wallAreaM2).toBeLessThanOrEqual(lim.wallAreaM2 + 1e-9);
        if (lim.budget !== undefined) expect(r.totals.cost).toBeLessThanOrEqual(lim.budget + 1e-9);
        if (lim.maxItems !== undefined) expect(r.totals.count).toBeLessThanOrEqual(lim.maxItems);
        const required = roomRequired(input);
        if (r.reached) for (const b of SIZED) expect(r.addedM2[b]!).toBeGreaterThanOrEqual(required[b]!.addM2 - 1e-9);
        else expect(r.binding.length).toBeGreaterThan(0);
        for (const b of SIZED) {
          const band = r.bands[b]!;
          if (band.beforeS >= band.lowerS) expect(band.afterS).toBeGreaterThanOrEqual(band.lowerS - 1e-9);
        }
        r.bands.forEach((band) => expect(Number.isFinite(band.afterS)).toBe(true));
      }),
      { seed: 606, numRuns: 30 },
    );
  }, 60_000);
});
