/**
 * Argument checks for the public functions. Documented behaviour: a value of the wrong type throws a
 * `TypeError`, a number out of range (or NaN/Infinity) throws a `RangeError`; every message starts
 * with the field's path as it appears in the JSON request bodies of schemas.ts, e.g.
 * `RangeError: room.lengthM must be a finite number in (0, 100] m (got -5)`.
 */
import { LIMITS } from "./limits";
import type { Point3, RectRoom, SoundSource } from "./types";

const show = (v: unknown): string => (typeof v === "number" ? String(v) : typeof v);

/** A finite number in [min, max] (or (min, max] when `openMin`), else TypeError/RangeError. */
export function checkNumber(value: unknown, field: string, min: number, max: number, unit: string, openMin = false): number {
  if (typeof value !== "number") throw new TypeError(`${field} must be a number${unit ? ` in ${unit}` : ""} (got ${show(value)})`);
  const inRange = Number.isFinite(value) && (openMin ? value > min : value >= min) && value <= max;
  if (!inRange) {
    const range = `${openMin ? "(" : "["}${min}, ${max}]`;
    throw new RangeError(`${field} must be a finite number in ${range}${unit ? ` ${unit}` : ""} (got ${show(value)})`);
  }
  return value;
}

/** An integer in [min, max]. */
export function checkInteger(value: unknown, field: string, min: number, max: number): number {
  checkNumber(value, field, min, max, "");
  if (!Number.isInteger(value)) throw new RangeError(`${field} must be an integer in [${min}, ${max}] (got ${show(value)})`);
  return value as number;
}

/** Finite positive dimensions up to LIMITS.maxDimensionM. */
export function checkRoom(room: unknown): RectRoom {
  if (typeof room !== "object" || room === null) throw new TypeError(`room must be an object { lengthM, widthM, heightM } (got ${room === null ? "null" : typeof room})`);
  const r = room as Record<string, unknown>;
  for (const k of ["lengthM", "widthM", "heightM"]) checkNumber(r[k], `room.${k}`, 0, LIMITS.maxDimensionM, "m", true);
  return room as RectRoom;
}

/** A point [x, y, z] inside the room, walls included (0 <= x <= lengthM etc.). */
export function checkPoint(p: unknown, field: string, room: RectRoom): Point3 {
  if (!Array.isArray(p) || p.length !== 3) throw new TypeError(`${field} must be an array [x, y, z] of three numbers in m`);
  const dims = [room.lengthM, room.widthM, room.heightM];
  const names = ["x", "y", "z"];
  for (let a = 0; a < 3; a++) {
    const v: unknown = p[a];
    if (typeof v !== "number") throw new TypeError(`${field}[${a}] must be a number in m (got ${show(v)})`);
    if (!(Number.isFinite(v) && v >= 0 && v <= dims[a]!))
      throw new RangeError(`${field}[${a}] must lie inside the room: 0 <= ${names[a]} <= ${dims[a]} m (got ${show(v)})`);
  }
  return p as Point3;
}

/** A non-empty list of at most LIMITS.maxFrequencies frequencies, each in [1, 1000] Hz. */
export function checkFrequencies(list: unknown, field: string): ArrayLike<number> {
  const ok = Array.isArray(list) || list instanceof Float64Array || list instanceof Float32Array;
  if (!ok) throw new TypeError(`${field} must be an array of frequencies in Hz`);
  const a = list as ArrayLike<number>;
  if (a.length < 1 || a.length > LIMITS.maxFrequencies)
    throw new RangeError(`${field} must hold 1 to ${LIMITS.maxFrequencies} frequencies (got ${a.length})`);
  for (let i = 0; i < a.length; i++) checkNumber(a[i], `${field}[${i}]`, LIMITS.minFrequencyHz, LIMITS.maxFrequencyHz, "Hz");
  return a;
}

export const checkFrequency = (v: unknown, field: string): number =>
  checkNumber(v, field, LIMITS.minFrequencyHz, LIMITS.maxFrequencyHz, "Hz");

export const checkRt60 = (v: unknown, field = "rt60Seconds"): number =>
  checkNumber(v, field, LIMITS.minRt60Seconds, LIMITS.maxRt60Seconds, "s");

/** Speed of sound, m/s; `undefined` means the contract's default 343 m/s. */
export const checkSpeedOfSound = (v: unknown, field = "speedOfSound"): number =>
  v === undefined ? 343 : checkNumber(v, field, LIMITS.minSpeedOfSound, LIMITS.maxSpeedOfSound, "m/s");

/** 1 to LIMITS.maxSources sources, each inside the room with a valid delay and polarity. */
export function checkSources(list: unknown, field: string, room: RectRoom): SoundSource[] {
  if (!Array.isArray(list)) throw new TypeError(`${field} must be an array of sources { position, delayMs?, polarity? }`);
  if (list.length < 1 || list.length > LIMITS.maxSources)
    throw new RangeError(`${field} must hold 1 to ${LIMITS.maxSources} sources (got ${list.length})`);
  list.forEach((s: unknown, i) => {
    if (typeof s !== "object" || s === null) throw new TypeError(`${field}[${i}] must be an object { position, delayMs?, polarity? }`);
    const src = s as Record<string, unknown>;
    checkPoint(src.position, `${field}[${i}].position`, room);
    if (src.delayMs !== undefined) checkNumber(src.delayMs, `${field}[${i}].delayMs`, 0, LIMITS.maxDelayMs, "ms");
    if (src.polarity !== undefined && src.polarity !== 1 && src.polarity !== -1)
      throw new RangeError(`${field}[${i}].polarity must be 1 or -1 (got ${show(src.polarity)})`);
  });
  return list as SoundSource[];
}

/** Throws the conventional AbortError when a cancellation flag is set. */
export function throwIfAborted(signal: { readonly aborted: boolean } | undefined): void {
  if (signal?.aborted) {
    const e = new Error("The computation was cancelled");
    e.name = "AbortError";
    throw e;
  }
}
