/** Nominal octave-band centres used for reverberation, 63…8000 Hz. */
export const OCTAVE_BANDS_HZ = Object.freeze([63, 125, 250, 500, 1000, 2000, 4000, 8000]);

/** Nominal one-third-octave centres covering the same range, 50…10 000 Hz (24 bands). */
export const THIRD_OCTAVE_BANDS_HZ = Object.freeze([
  50, 63, 80, 100, 125, 160, 200, 250, 315, 400, 500, 630, 800, 1000, 1250, 1600, 2000, 2500, 3150, 4000, 5000, 6300, 8000, 10_000,
]);

/** Which band set. */
export type BandSet = "octave" | "third-octave";

/**
 * Exact mid-band frequency of the band whose nominal centre is `nominalHz`, base-ten system:
 * fm = 1000·G^(x/b), G = 10^(3/10), b = 1 (octave) or 3 (one-third octave) (IEC 61260-1:2014).
 * @param nominalHz a nominal centre (e.g. 63, 125, 8000); @param bandsPerOctave 1 or 3
 * @example exactMidBandHz(63, 1) // 63.096
 */
export function exactMidBandHz(nominalHz: number, bandsPerOctave: 1 | 3): number {
  if (!(typeof nominalHz === "number" && Number.isFinite(nominalHz) && nominalHz > 0)) {
    throw new RangeError(`nominalHz must be a positive number, got ${nominalHz}`);
  }
  if (bandsPerOctave !== 1 && bandsPerOctave !== 3) throw new RangeError(`bandsPerOctave must be 1 or 3, got ${bandsPerOctave}`);
  const G = 10 ** (3 / 10); // octave ratio, IEC 61260-1 base-ten
  const x = Math.round((bandsPerOctave * Math.log(nominalHz / 1000)) / Math.log(G));
  return 1000 * G ** (x / bandsPerOctave); // IEC 61260-1 eq. for fm
}

/**
 * Nominal and exact mid-band frequencies of a band set.
 * @example bandSet('octave').exactHz[0] // 63.0957…
 */
export function bandSet(set: BandSet): { nominalHz: readonly number[]; exactHz: number[] } {
  if (set === "octave") return { nominalHz: OCTAVE_BANDS_HZ, exactHz: OCTAVE_BANDS_HZ.map((f) => exactMidBandHz(f, 1)) };
  if (set === "third-octave") {
    return { nominalHz: THIRD_OCTAVE_BANDS_HZ, exactHz: THIRD_OCTAVE_BANDS_HZ.map((f) => exactMidBandHz(f, 3)) };
  }
  throw new TypeError(`band set must be 'octave' or 'third-octave', got ${String(set)}`);
}
