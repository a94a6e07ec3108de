/**
 * Rounds a non-negative or negative value to an integer number of `unit`s, halves away from zero,
 * after snapping off binary floating-point noise (so 0.275 stored as 0.27499999999999997 counts as
 * 0.275). Returns integer units: roundToUnits(0.275, 0.01) = 28.
 * @param value the number to round; @param unit the step (e.g. 0.01, 0.05)
 * @example roundToUnits(0.5625, 0.05) // 11 (→ 0.55)
 */
export function roundToUnits(value: number, unit: number): number {
  const scaled = value / unit;
  const snapped = Math.round(scaled * 1e6) / 1e6; // decimals of the inputs reach at most 1e-6 units
  return Math.sign(snapped) * Math.floor(Math.abs(snapped) + 0.5);
}
