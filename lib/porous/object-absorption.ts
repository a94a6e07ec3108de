import { spectrumUnchecked } from "./absorption-spectrum";
import { gaussLegendre } from "./gauss-legendre";
import { LIMITS } from "./limits";
import { DEFAULT_AIR, type AirProperties, type Layer } from "./types";
import { checkAir, checkFrequencies, checkLayers, checkNumber } from "./validate";

/** Per-band absorption area of an object. */
export interface ObjectAbsorptionBand {
  frequencyHz: number;
  /** random-incidence α of the build over its face (Paris), as modelled */
  alpha: number;
  /** Sabine absorption area of all `count` objects, m² (a model α below 0, outside its fitted range, counts as 0) */
  absorptionAreaM2: number;
  withinModelRange: boolean;
}

/** Statement of how the finite size is treated, shown with every result. */
export const EDGE_EFFECT_NOT_INCLUDED =
  "not included: the diffraction edge (size) effect, by which reverberation-room measurements of finite panels read higher than an infinite layer (most at low and mid frequencies), is not modelled; results are the infinite-layer α times the counted area";

/**
 * Sabine absorption area (m²) per band of `count` flat panels of face `widthM × heightM` built as
 * `layers` (front to back, on the wall or spaced off it by an air layer), at random incidence.
 * A = count · α_random · (face area + exposed side area), the sides (perimeter × porous thickness)
 * counted only when `exposedSides` is true, at the face's α (common practice). The diffraction edge
 * effect is flagged as not included ({@link EDGE_EFFECT_NOT_INCLUDED}).
 * @param panel face size in m (0.05…10), build, count (1…1000), exposedSides (default false)
 * @example panelAbsorption({ widthM: 0.6, heightM: 1.2, layers: [{ kind: 'porous', thicknessM: 0.05, flowResistivity: 15_000, model: 'delany-bazley' }], frequenciesHz: [500] }).bands[0].absorptionAreaM2 // ≈ 0.46
 */
export function panelAbsorption(
  panel: {
    widthM: number;
    heightM: number;
    layers: readonly Layer[];
    frequenciesHz: readonly number[];
    count?: number;
    exposedSides?: boolean;
  },
  air: AirProperties = DEFAULT_AIR,
): { faceAreaM2: number; sideAreaM2: number; edgeEffect: string; bands: ObjectAbsorptionBand[] } {
  checkNumber(panel.widthM, "widthM", 0.05, 10);
  checkNumber(panel.heightM, "heightM", 0.05, 10);
  const count = checkNumber(panel.count ?? 1, "count", 1, 1000);
  if (!Number.isInteger(count)) throw new RangeError(`count must be an integer, got ${count}`);
  checkLayers(panel.layers);
  checkFrequencies(panel.frequenciesHz);
  checkAir(air);
  const faceAreaM2 = panel.widthM * panel.heightM;
  const porousThickness = panel.layers.reduce((t, l) => t + (l.kind === "porous" ? l.thicknessM : 0), 0);
  const sideAreaM2 = panel.exposedSides ? 2 * (panel.widthM + panel.heightM) * porousThickness : 0;
  const bands = spectrumUnchecked(panel.layers, panel.frequenciesHz, "random", air).map((p) => ({
    frequencyHz: p.frequencyHz,
    alpha: p.alpha,
    absorptionAreaM2: count * Math.max(0, p.alpha) * (faceAreaM2 + sideAreaM2), // Sabine area A = Σ S·α; a model dip below 0 counts as 0
    withinModelRange: p.withinModelRange,
  }));
  return {
    faceAreaM2,
    sideAreaM2,
    edgeEffect: panel.exposedSides
      ? `exposed sides counted at the face's α (common practice); diffraction edge effect ${EDGE_EFFECT_NOT_INCLUDED}`
      : EDGE_EFFECT_NOT_INCLUDED,
    bands,
  };
}

/** A porous corner trap of right-isosceles triangular section, filled with one porous material. */
export interface CornerTrap {
  /** perpendicular depth from the face to the corner, m (0.05…1) */
  depthM: number;
  /** run length: room height for a floor-to-ceiling trap, or the run along a wall–ceiling edge, m */
  lengthM: number;
  orientation: "floor-to-ceiling" | "wall-ceiling";
  flowResistivity: number;
  model: "delany-bazley" | "miki";
  /** optional fabric facing, flow resistance Pa·s/m */
  facingFlowResistance?: number;
  count?: number;
}

const STRIP_NODES = 24;

/**
 * Corner trap → Sabine absorption area per band. The trap's face is the hypotenuse (width 2·depth,
 * legs depth·√2 along the two surfaces); the fill behind a point of the face is D − |u| deep, u from
 * the face centre, so its thickness is spread evenly over (0, D). The face α is the mean random-incidence
 * α of rigid-backed strips of those thicknesses (24-point Gauss–Legendre over the depth): a locally
 * reacting strip approximation (our method, stated; the slanted back walls are treated as parallel).
 * Rule-of-thumb limits stated with the result (common practice): useful down to about c/(4·depth);
 * the corner's modal pressure maxima help a corner trap more than this area figure shows (not modelled);
 * the diffraction edge effect is not included.
 * @example cornerTrapAbsorption({ depthM: 0.6, lengthM: 2.4, orientation: 'floor-to-ceiling', flowResistivity: 10_000, model: 'miki', frequenciesHz: [125] }).faceAreaM2 // 2.88
 */
export function cornerTrapAbsorption(
  trap: CornerTrap & { frequenciesHz: readonly number[] },
  air: AirProperties = DEFAULT_AIR,
): {
  faceWidthM: number;
  legM: number;
  faceAreaM2: number;
  volumeM3: number;
  usefulDownToHz: number;
  limits: string[];
  edgeEffect: string;
  bands: ObjectAbsorptionBand[];
} {
  const depth = checkNumber(trap.depthM, "depthM", 0.05, LIMITS.thicknessM.max);
  const length = checkNumber(trap.lengthM, "lengthM", 0.1, 20);
  if (trap.orientation !== "floor-to-ceiling" && trap.orientation !== "wall-ceiling") {
    throw new TypeError(`orientation must be 'floor-to-ceiling' or 'wall-ceiling', got ${String(trap.orientation)}`);
  }
  const count = checkNumber(trap.count ?? 1, "count", 1, 100);
  if (!Number.isInteger(count)) throw new RangeError(`count must be an integer, got ${count}`);
  const facing = trap.facingFlowResistance;
  const front: Layer[] = facing === undefined ? [] : [{ kind: "resistive-sheet", flowResistance: facing }];
  // validates σ, model and facing through the ordinary layer checks
  checkLayers([...front, { kind: "porous", thicknessM: depth, flowResistivity: trap.flowResistivity, model: trap.model }]);
  checkFrequencies(trap.frequenciesHz);
  checkAir(air);

  const { nodes, weights } = gaussLegendre(STRIP_NODES);
  const alpha = new Float64Array(trap.frequenciesHz.length);
  const inRange = new Array<boolean>(trap.frequenciesHz.length).fill(true);
  for (let i = 0; i < nodes.length; i++) {
    const t = (depth / 2) * (1 + nodes[i]!); // strip thickness in (0, D)
    const layers: Layer[] = [...front, { kind: "porous", thicknessM: t, flowResistivity: trap.flowResistivity, model: trap.model }];
    const s = spectrumUnchecked(layers, trap.frequenciesHz, "random", air);
    for (let f = 0; f < s.length; f++) {
      alpha[f]! += (weights[i]! / 2) * s[f]!.alpha; // mean over thickness: (1/D)∫ α(t) dt
      if (!s[f]!.withinModelRange) inRange[f] = false;
    }
  }
  const faceWidthM = 2 * depth; // hypotenuse of the right-isosceles section
  const faceAreaM2 = faceWidthM * length;
  const usefulDownToHz = air.speedOfSound / (4 * depth); // quarter-wave depth rule (common practice)
  return {
    faceWidthM,
    legM: depth * Math.SQRT2,
    faceAreaM2,
    volumeM3: depth * depth * length,
    usefulDownToHz,
    limits: [
      `common practice: a porous trap works down to roughly where its depth reaches a quarter wavelength, here about ${Math.round(usefulDownToHz)} Hz; below that its absorption falls away`,
      "common practice: corners hold pressure maxima of all room modes, so a corner trap couples to them better than this area figure suggests; that gain is not modelled",
      "common practice: a dense fill (σ well above ~20 kPa·s/m²) reflects at its face and does less at low frequency than a lighter one of the same depth",
      "safety: a full-height trap is heavy and can topple, and a wall–ceiling trap hangs over people: fix it to the structure; mind wiring and pipes before drilling",
    ],
    edgeEffect: EDGE_EFFECT_NOT_INCLUDED,
    bands: Array.from(alpha, (a, f) => ({
      frequencyHz: trap.frequenciesHz[f]!,
      alpha: a,
      absorptionAreaM2: count * Math.max(0, a) * faceAreaM2, // Sabine area A = S·α over the face; a dip below 0 counts as 0
      withinModelRange: inRange[f]!,
    })),
  };
}

/**
 * Absorption area (m²) per frequency of one treatment object — a panel set or a corner trap — as
 * described by `absorberObjectSchema`.
 * @example objectAbsorptionAreaM2({ kind: 'panel', widthM: 0.6, heightM: 1.2, layers, count: 2 }, [500]) // [≈ 0.92]
 */
export function objectAbsorptionAreaM2(
  object:
    | ({ kind: "panel" } & { widthM: number; heightM: number; layers: readonly Layer[]; count?: number; exposedSides?: boolean })
    | ({ kind: "corner-trap" } & CornerTrap),
  frequenciesHz: readonly number[],
  air: AirProperties = DEFAULT_AIR,
): number[] {
  if (object.kind === "panel") return panelAbsorption({ ...object, frequenciesHz }, air).bands.map((b) => b.absorptionAreaM2);
  if (object.kind === "corner-trap") return cornerTrapAbsorption({ ...object, frequenciesHz }, air).bands.map((b) => b.absorptionAreaM2);
  throw new TypeError(`object.kind must be 'panel' or 'corner-trap', got ${String((object as { kind: unknown }).kind)}`);
}
