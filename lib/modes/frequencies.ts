import { checkFrequency, checkInteger } from "./validate";
import { LIMITS } from "./limits";

/**
 * `count` frequencies spaced evenly on a logarithmic axis from lowHz to highHz inclusive, Hz.
 *
 * f_i = lowHz * (highHz/lowHz)^(i/(count - 1)) (geometric sequence)
 *
 * @param lowHz first frequency, Hz, in [1, 1000]
 * @param highHz last frequency, Hz, in [lowHz, 1000]
 * @param count 1..2000 (one value gives [lowHz])
 * @example logSpacedFrequencies(20, 80, 3) // [20, 40, 80]
 */
export function logSpacedFrequencies(lowHz: number, highHz: number, count: number): number[] {
  checkFrequency(lowHz, "lowHz");
  checkFrequency(highHz, "highHz");
  if (highHz < lowHz) throw new RangeError(`highHz must be >= lowHz (got ${highHz} < ${lowHz})`);
  checkInteger(count, "count", 1, LIMITS.maxFrequencies);
  if (count === 1) return [lowHz];
  const out = new Array<number>(count);
  for (let i = 0; i < count; i++) out[i] = lowHz * Math.pow(highHz / lowHz, i / (count - 1));
  out[count - 1] = highHz;
  return out;
}
