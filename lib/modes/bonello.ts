import { modalBandwidthHz } from "./bandwidth";
import { enumerateModes } from "./mode-set";
import { thirdOctaveBands, type ThirdOctaveBand } from "./third-octave";
import type { RectRoom } from "./types";
import { checkFrequency, checkRoom, checkRt60, checkSpeedOfSound } from "./validate";

/** One band of Bonello's check. */
export interface BonelloBand extends ThirdOctaveBand {
  /** Modes with lowerHz <= f < upperHz. */
  modeCount: number;
  /** Modes in the band that coincide with a neighbour in the same band. */
  coincidentModes: number;
  /** False when the band holds fewer modes than the band below (leading empty bands excepted). */
  countOk: boolean;
  /** False when the band has coincident modes but fewer than 5 modes. */
  coincidenceOk: boolean;
}

export interface BonelloResult {
  bands: BonelloBand[];
  /** Nominal frequencies of bands holding fewer modes than the band below. */
  decreasingBandsHz: number[];
  /** Nominal frequencies of bands with coincident modes and fewer than 5 modes. */
  coincidenceFailuresHz: number[];
  passes: boolean;
  /** Plain words for an engineer's screen. */
  verdict: string;
}

/**
 * Bonello's criterion for the distribution of room modes (Bonello 1981, J. Audio Eng. Soc. 29:597-606;
 * rule as recorded in REFERENCES.md, from memory): counted per one-third-octave band, the number of
 * modes must not decrease from one band to the next, and a band may hold coincident modes only if it
 * holds at least 5 modes.
 *
 * Coincident: without `rt60Seconds`, modes of equal frequency (within 1e-9 relative, i.e. degenerate);
 * with it, neighbours closer than the modal bandwidth 2.2/T. Bands below the first band that holds a
 * mode are not compared (a run of empty bands at the bottom is no decrease).
 *
 * @param room dimensions, m
 * @param options.lowestBandHz nominal centre of the first band, Hz, default 20
 * @param options.highestBandHz nominal centre of the last band, Hz, default 200
 * @param options.rt60Seconds optional, s: widens "coincident" to the modal bandwidth
 * @param options.speedOfSound m/s, default 343
 * @example bonelloCheck({ lengthM: 3, widthM: 3, heightM: 3 }).passes // false (triple modes at 57.2 Hz)
 */
export function bonelloCheck(
  room: RectRoom,
  options: { lowestBandHz?: number; highestBandHz?: number; rt60Seconds?: number; speedOfSound?: number } = {},
): BonelloResult {
  checkRoom(room);
  const low = checkFrequency(options.lowestBandHz ?? 20, "lowestBandHz");
  const high = checkFrequency(options.highestBandHz ?? 200, "highestBandHz");
  if (high < low) throw new RangeError(`highestBandHz must be >= lowestBandHz (got ${high} < ${low})`);
  const c = checkSpeedOfSound(options.speedOfSound);
  const tolHz = options.rt60Seconds === undefined ? 0 : modalBandwidthHz(checkRt60(options.rt60Seconds));
  const raw = thirdOctaveBands(low, high);
  const modes = enumerateModes(room, raw[raw.length - 1]!.upperHz, c, false, "highestBandHz");
  const f = modes.frequencyHz;
  const coincide = (a: number, b: number) => (tolHz > 0 ? Math.abs(b - a) < tolHz : Math.abs(b - a) <= 1e-9 * b);

  let seenMode = false;
  let previous = 0;
  const bands: BonelloBand[] = raw.map((b) => {
    const inBand: number[] = [];
    for (let i = 0; i < modes.count; i++) if (f[i]! >= b.lowerHz && f[i]! < b.upperHz) inBand.push(f[i]!);
    let coincidentModes = 0;
    for (let i = 0; i < inBand.length; i++) {
      const near = (i > 0 && coincide(inBand[i - 1]!, inBand[i]!)) || (i + 1 < inBand.length && coincide(inBand[i]!, inBand[i + 1]!));
      if (near) coincidentModes++;
    }
    const countOk = !seenMode || inBand.length >= previous;
    if (inBand.length > 0) seenMode = true;
    previous = inBand.length;
    return { ...b, modeCount: inBand.length, coincidentModes, countOk, coincidenceOk: coincidentModes === 0 || inBand.length >= 5 };
  });
  const decreasingBandsHz = bands.filter((b) => !b.countOk).map((b) => b.nominalHz);
  const coincidenceFailuresHz = bands.filter((b) => !b.coincidenceOk).map((b) => b.nominalHz);
  const passes = decreasingBandsHz.length === 0 && coincidenceFailuresHz.length === 0;
  const what = tolHz > 0 ? `closer than the ${tolHz.toFixed(1)} Hz modal bandwidth` : "at the same frequency";
  const parts: string[] = [];
  if (decreasingBandsHz.length) parts.push(`fewer modes than the band below in the ${decreasingBandsHz.join(", ")} Hz band(s)`);
  if (coincidenceFailuresHz.length) parts.push(`modes ${what} in sparse band(s) (${coincidenceFailuresHz.join(", ")} Hz, fewer than 5 modes)`);
  const verdict = passes
    ? `Meets Bonello's criterion from ${raw[0]!.nominalHz} to ${raw[raw.length - 1]!.nominalHz} Hz: the mode count never falls from one third-octave band to the next, and modes ${what} only share bands of 5 or more.`
    : `Does not meet Bonello's criterion: ${parts.join("; ")}.`;
  return { bands, decreasingBandsHz, coincidenceFailuresHz, passes, verdict };
}
