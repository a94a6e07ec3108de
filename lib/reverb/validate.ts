/** Throws TypeError unless a number, RangeError unless finite and within [min, max]. */
export function checkNumber(value: unknown, field: string, min: number, max: number): number {
  if (typeof value !== "number") throw new TypeError(`${field} must be a number, got ${typeof value}`);
  if (!Number.isFinite(value) || value < min || value > max) throw new RangeError(`${field} must be within ${min}…${max}, got ${value}`);
  return value;
}

/** Throws unless `value` is an array of `length` numbers within [min, max]. */
export function checkNumbers(value: unknown, field: string, length: number, min: number, max: number): number[] {
  if (!Array.isArray(value)) throw new TypeError(`${field} must be an array`);
  if (value.length !== length) throw new RangeError(`${field} must hold ${length} values (one per band), got ${value.length}`);
  value.forEach((v, i) => checkNumber(v, `${field}[${i}]`, min, max));
  return value as number[];
}

/** Accepted ranges of lib/reverb inputs (shared with the zod schemas). */
export const REVERB_LIMITS = Object.freeze({
  volumeM3: { min: 1, max: 100_000 },
  areaM2: { min: 0.001, max: 100_000 },
  bandHz: { min: 10, max: 20_000 },
  maxBands: 64,
  maxSurfaces: 200,
  speedOfSound: { min: 250, max: 450 },
  temperatureC: { min: -20, max: 50 },
  relativeHumidityPct: { min: 0, max: 100 },
  pressureKPa: { min: 50, max: 110 },
  extraAbsorptionM2: { min: 0, max: 100_000 },
  reverberationS: { min: 0.01, max: 30 },
});
