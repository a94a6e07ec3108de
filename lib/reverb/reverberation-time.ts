import { checkNumber, checkNumbers, REVERB_LIMITS } from "./validate";

/** A room surface: area in m² and α per band, aligned with `bandsHz`. */
export interface Surface {
  areaM2: number;
  alpha: number[];
}

/** Arguments of {@link reverberationTime}. */
export interface ReverberationInput {
  volumeM3: number;
  surfaces: readonly Surface[];
  bandsHz: readonly number[];
  formula: "sabine" | "eyring";
  speedOfSound?: number;
  /** intensity attenuation m of the air per band, 1/m */
  airAttenuation?: readonly number[];
  /** added absorption area per band (treatment, objects), m² */
  extraAbsorptionM2?: readonly number[];
}

/** Checked inputs reduced to per-band totals. */
export interface BandTotals {
  /** total surface S, m² */
  surfaceM2: number;
  /** A per band = Σ Sᵢαᵢ + extra, m² */
  absorptionM2: number[];
  /** m per band, 1/m */
  airAttenuation: number[];
  speedOfSound: number;
}

/**
 * Validates {@link ReverberationInput} and sums it per band. RangeError/TypeError name the field.
 */
export function bandTotals(input: ReverberationInput): BandTotals {
  if (typeof input !== "object" || input === null) throw new TypeError("input must be an object");
  const L = REVERB_LIMITS;
  checkNumber(input.volumeM3, "volumeM3", L.volumeM3.min, L.volumeM3.max);
  if (!Array.isArray(input.bandsHz)) throw new TypeError("bandsHz must be an array");
  const n = input.bandsHz.length;
  if (n === 0 || n > L.maxBands) throw new RangeError(`bandsHz must hold 1…${L.maxBands} bands, got ${n}`);
  input.bandsHz.forEach((f, i) => checkNumber(f, `bandsHz[${i}]`, L.bandHz.min, L.bandHz.max));
  if (input.formula !== "sabine" && input.formula !== "eyring") {
    throw new TypeError(`formula must be 'sabine' or 'eyring', got ${String(input.formula)}`);
  }
  const speedOfSound = checkNumber(input.speedOfSound ?? 343, "speedOfSound", L.speedOfSound.min, L.speedOfSound.max);
  if (!Array.isArray(input.surfaces)) throw new TypeError("surfaces must be an array");
  if (input.surfaces.length === 0 || input.surfaces.length > L.maxSurfaces) {
    throw new RangeError(`surfaces must hold 1…${L.maxSurfaces} surfaces, got ${input.surfaces.length}`);
  }
  const absorptionM2 = new Array<number>(n).fill(0);
  let surfaceM2 = 0;
  input.surfaces.forEach((s, i) => {
    if (typeof s !== "object" || s === null) throw new TypeError(`surfaces[${i}] must be an object`);
    const area = checkNumber(s.areaM2, `surfaces[${i}].areaM2`, L.areaM2.min, L.areaM2.max);
    const alpha = checkNumbers(s.alpha, `surfaces[${i}].alpha`, n, 0, 1);
    surfaceM2 += area;
    for (let b = 0; b < n; b++) absorptionM2[b]! += area * alpha[b]!; // A = Σ Sᵢ αᵢ
  });
  const airAttenuation =
    input.airAttenuation === undefined ? new Array<number>(n).fill(0) : checkNumbers(input.airAttenuation, "airAttenuation", n, 0, 1);
  if (input.extraAbsorptionM2 !== undefined) {
    const extra = checkNumbers(input.extraAbsorptionM2, "extraAbsorptionM2", n, L.extraAbsorptionM2.min, L.extraAbsorptionM2.max);
    for (let b = 0; b < n; b++) absorptionM2[b]! += extra[b]!;
  }
  return { surfaceM2, absorptionM2, airAttenuation: [...airAttenuation], speedOfSound };
}

const K = 24 * Math.LN10; // 60 dB decay: T = 24 ln10 · V / (c · A) — Sabine; REFERENCES.md

/**
 * Reverberation time per band, s.
 *   Sabine: T = 24 ln10 · V / (c (A + 4mV)), A = Σ Sᵢαᵢ + extra
 *   Eyring: T = 24 ln10 · V / (c (−S ln(1 − A/S) + 4mV)), S = Σ Sᵢ, A including the extra area
 * (Sabine; Eyring, IEC 60050 IEV 801-31-09; air term 4mV with m the intensity attenuation, 1/m.)
 * Throws RangeError when a band has no absorption at all (T would be infinite) or, for Eyring, when
 * A ≥ S (ln(1 − A/S) undefined); TypeError/RangeError for malformed input, naming the field.
 * @param input volume m³, surfaces, band centres Hz, formula, c (default 343 m/s), air m per band, extra m²
 * @example reverberationTime({ volumeM3: 100, surfaces: [{ areaM2: 100, alpha: [0.2] }], bandsHz: [500], formula: 'sabine', speedOfSound: 343.2 }) // [0.805]
 */
export function reverberationTime(input: ReverberationInput): number[] {
  const t = bandTotals(input);
  const V = input.volumeM3;
  return t.absorptionM2.map((A, b) => {
    const air = 4 * t.airAttenuation[b]! * V; // 4mV, m²
    let room: number;
    if (input.formula === "sabine") room = A;
    else {
      if (A >= t.surfaceM2) {
        throw new RangeError(
          `band ${input.bandsHz[b]} Hz: absorption ${A.toFixed(2)} m² reaches the surface area ${t.surfaceM2.toFixed(2)} m²; Eyring needs A < S (use 'sabine' or check extraAbsorptionM2)`,
        );
      }
      room = -t.surfaceM2 * Math.log1p(-A / t.surfaceM2); // −S ln(1 − ᾱ) — Eyring
    }
    const total = room + air;
    if (!(total > 0)) throw new RangeError(`band ${input.bandsHz[b]} Hz: no absorption at all, the reverberation time is unbounded`);
    return (K * V) / (t.speedOfSound * total);
  });
}
