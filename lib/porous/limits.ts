/**
 * Accepted input ranges of lib/porous, shared by the argument checks of the functions and by the zod
 * schemas (so a route handler and a direct call reject the same things).
 * Thickness 1 mm–1 m, σ 500–500 000 Pa·s/m², frequencies 10–20 000 Hz, angles 0–89.9° (issue 4).
 * @example LIMITS.thicknessM.max // 1
 */
export const LIMITS = Object.freeze({
  thicknessM: { min: 0.001, max: 1 },
  flowResistivity: { min: 500, max: 500_000 },
  /** a facing's flow resistance, Pa·s/m: 0 (acoustically open cloth) … 20 000 (dense felt) */
  flowResistance: { min: 0, max: 20_000 },
  frequencyHz: { min: 10, max: 20_000 },
  angleDeg: { min: 0, max: 89.9 },
  densityKgM3: { min: 0.5, max: 2 },
  speedOfSound: { min: 250, max: 450 },
  maxLayers: 12,
  maxFrequencies: 2000,
});
