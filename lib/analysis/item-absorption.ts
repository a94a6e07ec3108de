import {
  cornerTrapAbsorption,
  panelAbsorption,
  perforationEffectiveLengthM,
  resonatorAbsorptionEstimate,
  type AbsorberObject,
  type AirProperties,
} from "@/lib/porous";
import type { ItemSpec } from "@/lib/schemas/workspace";

/** One item's absorption per frequency. */
export interface ItemAbsorption {
  absorptionM2: number[];
  withinModelRange: boolean[];
  estimate: boolean;
  resonanceHz: number | null;
  usefulDownToHz: number | null;
  limits: string[];
}

/**
 * The lib/porous object of a panel or corner-trap item (what lib/reverb's treatment.objects takes),
 * or null for the resonators, which lib/reverb does not model and which enter as extra area.
 */
export function absorberObject(spec: ItemSpec, count: number): AbsorberObject | null {
  if (spec.kind === "porous-panel") return { kind: "panel", widthM: spec.widthM, heightM: spec.heightM, layers: spec.layers, count, exposedSides: spec.exposedSides };
  if (spec.kind === "corner-trap")
    return {
      kind: "corner-trap",
      depthM: spec.depthM,
      lengthM: spec.lengthM,
      orientation: spec.orientation,
      flowResistivity: spec.flowResistivity,
      model: spec.model,
      count,
      ...(spec.facingFlowResistance !== undefined && { facingFlowResistance: spec.facingFlowResistance }),
    };
  return null;
}

/**
 * Sabine absorption area (m²) of `count` units of an item at each frequency.
 * - porous panel: lib/porous panelAbsorption (random incidence, infinite-layer α × face area);
 * - corner trap: lib/porous cornerTrapAbsorption;
 * - membrane: count · w·h · α of lib/porous resonatorAbsorptionEstimate (mass m over a closed cavity);
 * - perforated panel: the same estimate with the acoustic mass m = ρ₀·t′/ε, t′ = t + 0.8 d
 *   (Everest & Pohlmann, Master Handbook of Acoustics, perforated panel absorbers [from memory]).
 * The resonator α is a normal-incidence estimate used as if it were random-incidence (stated in `limits`).
 * @example itemAbsorption({ kind: 'membrane', massKgM2: 10, cavityDepthM: 0.1, resistanceRatio: 1, widthM: 1, heightM: 1 }, 2, [60], air).absorptionM2 // [2]
 */
export function itemAbsorption(spec: ItemSpec, count: number, frequenciesHz: readonly number[], air: AirProperties): ItemAbsorption {
  if (spec.kind === "porous-panel") {
    const r = panelAbsorption({ widthM: spec.widthM, heightM: spec.heightM, layers: spec.layers, frequenciesHz, count, exposedSides: spec.exposedSides }, air);
    return { absorptionM2: r.bands.map((b) => b.absorptionAreaM2), withinModelRange: r.bands.map((b) => b.withinModelRange), estimate: false, resonanceHz: null, usefulDownToHz: null, limits: [r.edgeEffect] };
  }
  if (spec.kind === "corner-trap") {
    const o = absorberObject(spec, count) as Extract<AbsorberObject, { kind: "corner-trap" }>;
    const r = cornerTrapAbsorption({ ...o, frequenciesHz }, air);
    return { absorptionM2: r.bands.map((b) => b.absorptionAreaM2), withinModelRange: r.bands.map((b) => b.withinModelRange), estimate: false, resonanceHz: null, usefulDownToHz: r.usefulDownToHz, limits: [...r.limits, r.edgeEffect] };
  }
  const massPerAreaKgM2 =
    spec.kind === "membrane" ? spec.massKgM2 : (air.densityKgM3 * perforationEffectiveLengthM(spec.plateThicknessM, spec.holeDiameterM)) / spec.openAreaRatio; // m = ρ₀ t′/ε
  const e = resonatorAbsorptionEstimate({ massPerAreaKgM2, cavityDepthM: spec.cavityDepthM, resistanceRatio: spec.resistanceRatio, frequenciesHz }, air);
  const faceM2 = spec.widthM * spec.heightM;
  return {
    absorptionM2: e.points.map((p) => count * faceM2 * Math.max(0, p.alpha)), // Sabine area A = n·S·α
    withinModelRange: e.points.map(() => e.lumpedCavityValid),
    estimate: true,
    resonanceHz: e.resonanceHz,
    usefulDownToHz: null,
    limits: [e.method, "the normal-incidence estimate is used as a random-incidence α (our simplification, stated)"],
  };
}
