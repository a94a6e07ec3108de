import { checkNumber, checkRt60 } from "./validate";
import { LIMITS } from "./limits";

/**
 * Schroeder (crossover) frequency: above it modes overlap and the room behaves statistically.
 *
 * fs = 2000 sqrt(T/V), T in s, V in m^3 (Schroeder & Kuttruff 1962; Schroeder 1996, JASA "The
 * Schroeder frequency revisited"; REFERENCES.md)
 *
 * @param rt60Seconds reverberation time, s, in [0.05, 10]
 * @param volumeM3 room volume, m^3, finite in (0, 10^6]
 * @returns Hz
 * @throws RangeError/TypeError naming the argument
 * @example schroederFrequency(0.5, 100) // 141.42
 */
export function schroederFrequency(rt60Seconds: number, volumeM3: number): number {
  checkRt60(rt60Seconds, "rt60Seconds");
  checkNumber(volumeM3, "volumeM3", 0, LIMITS.maxDimensionM ** 3, "m^3", true);
  // Schroeder & Kuttruff (1962): fs = 2000 sqrt(T/V)
  return 2000 * Math.sqrt(rt60Seconds / volumeM3);
}
