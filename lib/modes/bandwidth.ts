import { checkRt60 } from "./validate";

/**
 * Half-power (3 dB) bandwidth of one room mode from the reverberation time, Hz.
 *
 * B = ln(10^6) / (2 pi T) ~= 2.2 / T (Schroeder 1996, JASA; REFERENCES.md). It equals delta/pi with the
 * modal sum's damping constant delta = 3 ln 10 / T (CONTRACTS.md).
 *
 * @param rt60Seconds reverberation time, s, in [0.05, 10]
 * @returns Hz
 * @example modalBandwidthHz(0.5) // 4.40
 */
export function modalBandwidthHz(rt60Seconds: number): number {
  checkRt60(rt60Seconds, "rt60Seconds");
  // Schroeder (1996): B = ln(10^6)/(2 pi T)
  return Math.log(1e6) / (2 * Math.PI * rt60Seconds);
}
