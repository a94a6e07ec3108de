import { checkNumber } from "./validate";
import { roundToUnits } from "./rounding";

/** ISO 11654 reference curve at 250/500/1000/2000/4000 Hz, in hundredths (ISO 11654:1997 §5). */
export const ISO11654_REFERENCE_CURVE = Object.freeze([80, 100, 100, 100, 90]);

/** Octave centres of the practical coefficients, Hz. */
export const ISO11654_OCTAVES_HZ = Object.freeze([250, 500, 1000, 2000, 4000]);

/** Sound absorption class of ISO 11654 Annex B. */
export type AbsorptionClass = "A" | "B" | "C" | "D" | "E" | "not classified";

/** Result of {@link weightedAbsorption}: values in steps of 0.05. */
export interface WeightedAbsorption {
  /** αp at 250, 500, 1000, 2000, 4000 Hz */
  practical: number[];
  alphaW: number;
  /** shape indicators among 'L', 'M', 'H' in that order, '' when none */
  indicators: string;
  absorptionClass: AbsorptionClass;
}

/** αp in integer hundredths: mean to two decimals, then nearest 0.05, capped at 1.00, floored at 0. */
function practicalHundredths(a: number, b: number, c: number): number {
  const twoDecimals = roundToUnits((a + b + c) / 3, 0.01); // ISO 11654 §4.1: mean to two decimal places
  const steps = Math.sign(twoDecimals) * Math.floor(Math.abs(twoDecimals) / 5 + 0.5); // then in steps of 0.05
  return Math.min(100, Math.max(0, steps * 5)); // capped at 1.00 (§4.1); a model's negative α counts as 0
}

/**
 * ISO 11654 practical sound absorption coefficient αp of one octave from its three one-third-octave
 * values: arithmetic mean to two decimals, rounded in steps of 0.05, capped at 1.00 (ISO 11654 §4.1).
 * Values below 0 (possible from a model outside its range) give 0.
 * @param thirds the three one-third-octave α of the octave
 * @example practicalAbsorption([0.30, 0.32, 0.35]) // 0.30
 */
export function practicalAbsorption(thirds: readonly number[]): number {
  if (!Array.isArray(thirds) || thirds.length !== 3) throw new RangeError("thirds must hold exactly 3 values");
  thirds.forEach((v, i) => checkNumber(v, `thirds[${i}]`, -10, 10));
  return practicalHundredths(thirds[0]!, thirds[1]!, thirds[2]!) / 100;
}

const CLASSES: [number, AbsorptionClass][] = [
  [90, "A"],
  [80, "B"],
  [60, "C"],
  [30, "D"],
  [15, "E"],
];

/**
 * ISO 11654 single-number rating from the 15 one-third-octave absorption coefficients 200…5000 Hz:
 * practical coefficients αp (250…4000 Hz), weighted αw, shape indicators and absorption class.
 * Works in integer hundredths. The reference curve 0.80/1.00/1.00/1.00/0.90 is moved down in 0.05
 * steps until the sum of unfavourable deviations (αp below the curve) is ≤ 0.10 (inclusive); αw is the
 * moved curve at 500 Hz; an indicator L (250 Hz), M (500 or 1000 Hz) or H (2000 or 4000 Hz) marks αp
 * exceeding the moved curve by ≥ 0.25. The moved curve may go below 0 at 250 Hz. (ISO 11654:1997.)
 * Throws RangeError/TypeError naming `thirdOctaveAlpha` for anything but 15 finite numbers.
 * @param thirdOctaveAlpha α at 200, 250, 315, … 5000 Hz (15 values)
 * @example weightedAbsorption([0.35,0.35,0.35, 0.7,0.7,0.7, 0.95,0.95,0.95, 1,1,1, 1,1,1])
 *   // { practical: [0.35, 0.7, 0.95, 1, 1], alphaW: 0.65, indicators: 'MH', absorptionClass: 'C' }
 */
export function weightedAbsorption(thirdOctaveAlpha: readonly number[]): WeightedAbsorption {
  if (!Array.isArray(thirdOctaveAlpha)) throw new TypeError("thirdOctaveAlpha must be an array of 15 numbers");
  if (thirdOctaveAlpha.length !== 15) {
    throw new RangeError(`thirdOctaveAlpha must hold 15 values (200…5000 Hz), got ${thirdOctaveAlpha.length}`);
  }
  thirdOctaveAlpha.forEach((v, i) => checkNumber(v, `thirdOctaveAlpha[${i}]`, -10, 10));
  const ap: number[] = [];
  for (let o = 0; o < 5; o++) {
    ap.push(practicalHundredths(thirdOctaveAlpha[3 * o]!, thirdOctaveAlpha[3 * o + 1]!, thirdOctaveAlpha[3 * o + 2]!));
  }
  let shift = 0;
  for (; shift > -100; shift -= 5) {
    let unfavourable = 0;
    for (let i = 0; i < 5; i++) unfavourable += Math.max(0, ISO11654_REFERENCE_CURVE[i]! + shift - ap[i]!);
    if (unfavourable <= 10) break; // ISO 11654 §5: sum of unfavourable deviations ≤ 0.10
  }
  const curve = ISO11654_REFERENCE_CURVE.map((v) => v + shift);
  const exceeds = (i: number) => ap[i]! - curve[i]! >= 25; // ISO 11654 §6: shape indicators at ≥ 0.25
  const indicators = (exceeds(0) ? "L" : "") + (exceeds(1) || exceeds(2) ? "M" : "") + (exceeds(3) || exceeds(4) ? "H" : "");
  const alphaWHundredths = curve[1]!;
  const absorptionClass = CLASSES.find(([min]) => alphaWHundredths >= min)?.[1] ?? "not classified"; // ISO 11654 Annex B
  return { practical: ap.map((v) => v / 100), alphaW: alphaWHundredths / 100, indicators, absorptionClass };
}
