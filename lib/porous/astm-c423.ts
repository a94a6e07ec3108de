import { checkNumber } from "./validate";
import { roundToUnits } from "./rounding";

function checkList(values: readonly number[], field: string, length: number): void {
  if (!Array.isArray(values)) throw new TypeError(`${field} must be an array of ${length} numbers`);
  if (values.length !== length) throw new RangeError(`${field} must hold ${length} values, got ${values.length}`);
  values.forEach((v, i) => checkNumber(v, `${field}[${i}]`, -10, 10));
}

/**
 * Noise reduction coefficient: mean of α at 250, 500, 1000 and 2000 Hz rounded to the nearest 0.05
 * (ASTM C423; halves round up — from memory).
 * @param alpha α at 250, 500, 1000, 2000 Hz
 * @example noiseReductionCoefficient([0.12, 0.38, 0.80, 0.95]) // 0.55
 */
export function noiseReductionCoefficient(alpha: readonly number[]): number {
  checkList(alpha, "alpha", 4);
  const mean = (alpha[0]! + alpha[1]! + alpha[2]! + alpha[3]!) / 4; // ASTM C423 NRC definition
  return (roundToUnits(mean, 0.05) * 5) / 100;
}

/**
 * Sound absorption average: mean of the 12 one-third-octave α from 200 to 2500 Hz, rounded to the
 * nearest 0.01 (ASTM C423).
 * @param alpha α at 200, 250, … 2500 Hz (12 values)
 * @example soundAbsorptionAverage([0.1,0.2,0.3,0.4,0.5,0.6,0.7,0.8,0.9,1,1.1,1.2]) // 0.65
 */
export function soundAbsorptionAverage(alpha: readonly number[]): number {
  checkList(alpha, "alpha", 12);
  let sum = 0;
  for (const a of alpha) sum += a;
  return roundToUnits(sum / 12, 0.01) / 100; // ASTM C423 SAA definition
}

/**
 * NRC and SAA from the 15 one-third-octave α 200…5000 Hz (the same array {@link weightedAbsorption} takes).
 * @param thirdOctaveAlpha α at 200 … 5000 Hz
 * @example astmC423Ratings(new Array(15).fill(0.5)) // { nrc: 0.5, saa: 0.5 }
 */
export function astmC423Ratings(thirdOctaveAlpha: readonly number[]): { nrc: number; saa: number } {
  checkList(thirdOctaveAlpha, "thirdOctaveAlpha", 15);
  const a = thirdOctaveAlpha;
  return { nrc: noiseReductionCoefficient([a[1]!, a[4]!, a[7]!, a[10]!]), saa: soundAbsorptionAverage(a.slice(0, 12)) };
}
