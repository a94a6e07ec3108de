/** Throws TypeError unless a number, RangeError unless finite and within [min, max], naming the field. */
export function checkNumber(value: unknown, field: string, min: number, max: number): number {
  if (typeof value !== "number") throw new TypeError(`${field} must be a number, got ${typeof value}`);
  if (!Number.isFinite(value) || value < min || value > max) throw new RangeError(`${field} must be within ${min}…${max}, got ${value}`);
  return value;
}

/** As {@link checkNumber}, and an integer. */
export function checkInteger(value: unknown, field: string, min: number, max: number): number {
  checkNumber(value, field, min, max);
  if (!Number.isInteger(value)) throw new RangeError(`${field} must be an integer, got ${value}`);
  return value as number;
}

/** Tolerance for comparing lengths in metres (a tenth of a micrometre). */
export const LENGTH_EPS_M = 1e-7;
