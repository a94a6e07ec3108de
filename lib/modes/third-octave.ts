import { checkFrequency } from "./validate";

/** A one-third-octave band: exact mid-band and edge frequencies, Hz, and its nominal label. */
export interface ThirdOctaveBand {
  /** Nominal mid-band frequency used as a label, Hz (IEC 61260-1 / ISO 266 preferred numbers). */
  nominalHz: number;
  /** Exact mid-band frequency fm = 1000 * 10^(3x/30), Hz. */
  centerHz: number;
  /** Lower edge fm * 10^(-1/20), Hz. */
  lowerHz: number;
  /** Upper edge fm * 10^(+1/20), Hz. */
  upperHz: number;
}

// Nominal labels for x = -20 ... 0 (10 Hz ... 1 kHz), IEC 61260-1:2014 Annex E.
const NOMINAL = [10, 12.5, 16, 20, 25, 31.5, 40, 50, 63, 80, 100, 125, 160, 200, 250, 315, 400, 500, 630, 800, 1000];

/**
 * The base-ten one-third-octave bands that cover [lowHz, highHz] (a band is listed when it overlaps
 * the range), ascending.
 *
 * fm = 1000 * G^(x/3) with G = 10^(3/10); edges fm * G^(+-1/6) = fm * 10^(+-1/20) (IEC 61260-1:2014, 5.2-5.4)
 *
 * @param lowHz Hz, in [10, 1000]
 * @param highHz Hz, in [lowHz, 1000]
 * @example thirdOctaveBands(60, 70).map((b) => b.nominalHz) // [63]
 */
export function thirdOctaveBands(lowHz: number, highHz: number): ThirdOctaveBand[] {
  checkFrequency(lowHz, "lowHz");
  checkFrequency(highHz, "highHz");
  if (highHz < lowHz) throw new RangeError(`highHz must be >= lowHz (got ${highHz} < ${lowHz})`);
  const out: ThirdOctaveBand[] = [];
  for (let x = -20; x <= 0; x++) {
    // IEC 61260-1 base-ten mid-band frequency and band edges
    const centerHz = 1000 * Math.pow(10, (3 * x) / 30);
    const lowerHz = centerHz * Math.pow(10, -1 / 20);
    const upperHz = centerHz * Math.pow(10, 1 / 20);
    if (upperHz > lowHz && lowerHz <= highHz) out.push({ nominalHz: NOMINAL[x + 20]!, centerHz, lowerHz, upperHz });
  }
  return out;
}
