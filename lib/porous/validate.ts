import { LIMITS } from "./limits";
import type { AirProperties, Incidence, Layer } from "./types";

/** Throws a TypeError unless `value` is a number, a RangeError unless it is finite and in [min, max]. */
export function checkNumber(value: unknown, field: string, min: number, max: number): number {
  if (typeof value !== "number") throw new TypeError(`${field} must be a number, got ${typeof value}`);
  if (!Number.isFinite(value) || value < min || value > max) {
    throw new RangeError(`${field} must be within ${min}…${max}, got ${value}`);
  }
  return value;
}

/** Throws unless `value` is an array (TypeError) of at most `maxLength` items (RangeError). */
export function checkArray(value: unknown, field: string, maxLength: number): unknown[] {
  if (!Array.isArray(value)) throw new TypeError(`${field} must be an array`);
  if (value.length > maxLength) throw new RangeError(`${field} must have at most ${maxLength} items, got ${value.length}`);
  return value;
}

/**
 * Checks a layer stack against {@link LIMITS}: 1…12 layers, known kinds and models, bounded values,
 * and no resistive sheet directly on the rigid wall (there it would carry no flow).
 */
export function checkLayers(layers: unknown): asserts layers is Layer[] {
  const list = checkArray(layers, "layers", LIMITS.maxLayers);
  if (list.length === 0) throw new RangeError("layers must hold at least one layer");
  list.forEach((raw, i) => {
    const field = `layers[${i}]`;
    if (typeof raw !== "object" || raw === null) throw new TypeError(`${field} must be an object`);
    const layer = raw as Record<string, unknown>;
    switch (layer.kind) {
      case "porous":
        checkNumber(layer.thicknessM, `${field}.thicknessM`, LIMITS.thicknessM.min, LIMITS.thicknessM.max);
        checkNumber(layer.flowResistivity, `${field}.flowResistivity`, LIMITS.flowResistivity.min, LIMITS.flowResistivity.max);
        if (layer.model !== "delany-bazley" && layer.model !== "miki") {
          throw new TypeError(`${field}.model must be 'delany-bazley' or 'miki', got ${String(layer.model)}`);
        }
        break;
      case "air":
        checkNumber(layer.thicknessM, `${field}.thicknessM`, LIMITS.thicknessM.min, LIMITS.thicknessM.max);
        break;
      case "resistive-sheet":
        checkNumber(layer.flowResistance, `${field}.flowResistance`, LIMITS.flowResistance.min, LIMITS.flowResistance.max);
        if (i === list.length - 1) {
          throw new RangeError(`${field}: a resistive sheet cannot sit directly on the rigid wall (put a porous or air layer behind it)`);
        }
        break;
      default:
        throw new TypeError(`${field}.kind must be 'porous', 'air' or 'resistive-sheet', got ${String(layer.kind)}`);
    }
  });
}

/** Checks frequencies (Hz) against {@link LIMITS}. */
export function checkFrequencies(frequenciesHz: unknown, field = "frequenciesHz"): asserts frequenciesHz is number[] {
  const list = checkArray(frequenciesHz, field, LIMITS.maxFrequencies);
  list.forEach((f, i) => checkNumber(f, `${field}[${i}]`, LIMITS.frequencyHz.min, LIMITS.frequencyHz.max));
}

/** Checks an incidence value. */
export function checkIncidence(incidence: unknown): asserts incidence is Incidence {
  if (incidence === "normal" || incidence === "random" || incidence === "field") return;
  if (typeof incidence === "object" && incidence !== null && "angleDeg" in incidence) {
    checkNumber((incidence as { angleDeg: unknown }).angleDeg, "incidence.angleDeg", LIMITS.angleDeg.min, LIMITS.angleDeg.max);
    return;
  }
  throw new TypeError(`incidence must be 'normal', 'random', 'field' or { angleDeg }, got ${JSON.stringify(incidence)}`);
}

/** Checks air properties against {@link LIMITS}. */
export function checkAir(air: unknown): asserts air is AirProperties {
  if (typeof air !== "object" || air === null) throw new TypeError("air must be an object");
  const a = air as Record<string, unknown>;
  checkNumber(a.densityKgM3, "air.densityKgM3", LIMITS.densityKgM3.min, LIMITS.densityKgM3.max);
  checkNumber(a.speedOfSound, "air.speedOfSound", LIMITS.speedOfSound.min, LIMITS.speedOfSound.max);
}
