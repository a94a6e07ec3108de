import type { Complex } from "@/lib/complex";

/**
 * One layer of an absorber stack, listed front to back (a rigid wall is behind the last one).
 * - `porous`: thickness in m, airflow resistivity σ in Pa·s/m², impedance model.
 * - `air`: an air gap, thickness in m.
 * - `resistive-sheet`: a thin limp facing (fabric, tissue), flow resistance R in Pa·s/m, added in series.
 * @example const panel: Layer[] = [{ kind: 'porous', thicknessM: 0.05, flowResistivity: 15_000, model: 'miki' }]
 */
export type Layer =
  | { kind: "porous"; thicknessM: number; flowResistivity: number; model: "delany-bazley" | "miki" }
  | { kind: "air"; thicknessM: number }
  | { kind: "resistive-sheet"; flowResistance: number };

/**
 * Sound incidence: `'normal'` (0°), a single oblique angle in degrees (0 ≤ θ < 90), `'random'`
 * (Paris integral over 0–90°) or `'field'` (0–78°).
 * @example const inc: Incidence = { angleDeg: 45 }
 */
export type Incidence = "normal" | { angleDeg: number } | "random" | "field";

/**
 * Properties of the surrounding air: density ρ₀ in kg/m³ and speed of sound c in m/s.
 * @example const air: AirProperties = { densityKgM3: 1.204, speedOfSound: 343 }
 */
export interface AirProperties {
  densityKgM3: number;
  speedOfSound: number;
}

/** The default air of CONTRACTS.md (20 °C, 101.325 kPa). */
export const DEFAULT_AIR: Readonly<AirProperties> = Object.freeze({ densityKgM3: 1.204, speedOfSound: 343 });

/**
 * One frequency of an absorption spectrum: α (not clamped), the surface impedance Z at the front face
 * in Pa·s/m, and whether every porous layer is inside its model's fitted range at this frequency.
 * @example { frequencyHz: 500, alpha: 0.50, impedance: { re: 252, im: -631 }, withinModelRange: true }
 */
export interface SpectrumPoint {
  frequencyHz: number;
  alpha: number;
  impedance: Complex;
  withinModelRange: boolean;
}

/** Characteristic impedance Zc (Pa·s/m) and complex wavenumber kc (1/m) of a porous material. */
export interface PorousProperties {
  zc: Complex;
  kc: Complex;
}
