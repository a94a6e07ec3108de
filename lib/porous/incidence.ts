import { gaussLegendre } from "./gauss-legendre";

/** Gauss–Legendre order of the angle integrals (CONTRACTS.md asks for ≥ 96 open nodes). */
export const ANGLE_NODES = 96;

/** Upper limit of field incidence, 78° (Allard & Atalla 2009 [from memory, high]). */
export const FIELD_INCIDENCE_MAX_DEG = 78;

/** Precomputed angles (rad), their sin and cos, and integration weights (Σ weight·α = the average). */
export interface AngleGrid {
  theta: Float64Array;
  sinTheta: Float64Array;
  cosTheta: Float64Array;
  weight: Float64Array;
}

function buildGrid(topRad: number, normalise: boolean): AngleGrid {
  const { nodes, weights } = gaussLegendre(ANGLE_NODES);
  const n = nodes.length;
  const grid: AngleGrid = {
    theta: new Float64Array(n),
    sinTheta: new Float64Array(n),
    cosTheta: new Float64Array(n),
    weight: new Float64Array(n),
  };
  let total = 0;
  for (let i = 0; i < n; i++) {
    const t = (topRad / 2) * (1 + nodes[i]!); // map [−1, 1] → [0, top]: open, never 0 or top
    grid.theta[i] = t;
    grid.sinTheta[i] = Math.sin(t);
    grid.cosTheta[i] = Math.cos(t);
    // Paris weight sin 2θ dθ — Paris (1928); Allard & Atalla 2009, ch. 11 [from memory, high]
    grid.weight[i] = (topRad / 2) * weights[i]! * Math.sin(2 * t);
    total += grid.weight[i]!;
  }
  if (normalise) for (let i = 0; i < n; i++) grid.weight[i]! /= total;
  return grid;
}

let randomGrid: AngleGrid | undefined;
let fieldGrid: AngleGrid | undefined;

/** The cached 0–90° Paris grid (weights sum to 1 up to rounding). */
export function randomIncidenceGrid(): AngleGrid {
  return (randomGrid ??= buildGrid(Math.PI / 2, false));
}

/** The cached 0–78° field-incidence grid (weights normalised by ∫ sin 2θ dθ over 0–78°). */
export function fieldIncidenceGrid(): AngleGrid {
  return (fieldGrid ??= buildGrid((FIELD_INCIDENCE_MAX_DEG * Math.PI) / 180, true));
}

/**
 * Random-incidence (diffuse-field) absorption by the Paris formula α = ∫₀^{π/2} α(θ) sin 2θ dθ,
 * evaluated with 96-node Gauss–Legendre (open: θ never hits 0 or 90°).
 * @param alphaAt α at angle θ (radians)
 * @example parisRandomIncidence(() => 0.4) // 0.4
 */
export function parisRandomIncidence(alphaAt: (thetaRad: number) => number): number {
  const g = randomIncidenceGrid();
  let sum = 0;
  for (let i = 0; i < g.theta.length; i++) sum += g.weight[i]! * alphaAt(g.theta[i]!);
  return sum;
}

/**
 * Field-incidence absorption ∫₀^{78°} α sin 2θ dθ / ∫₀^{78°} sin 2θ dθ (96-node Gauss–Legendre).
 * @param alphaAt α at angle θ (radians)
 * @example fieldIncidenceAverage(() => 0.4) // 0.4
 */
export function fieldIncidenceAverage(alphaAt: (thetaRad: number) => number): number {
  const g = fieldIncidenceGrid();
  let sum = 0;
  for (let i = 0; i < g.theta.length; i++) sum += g.weight[i]! * alphaAt(g.theta[i]!);
  return sum;
}
