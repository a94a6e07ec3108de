import { asymptoticModeCount, modalDensity } from "./mode-count";
import { roomModes } from "./room-modes";
import type { RectRoom } from "./types";
import { checkFrequencies, checkSpeedOfSound } from "./validate";

export interface ModeCountRow {
  frequencyHz: number;
  /** Exact number of modes with f <= frequencyHz (roomModes). */
  countedModes: number;
  /** Kuttruff's asymptotic N(f). */
  asymptoticModes: number;
  /** countedModes / asymptoticModes. */
  ratio: number;
  /** Modal density dN/df at frequencyHz, modes per Hz (Kuttruff). */
  modalDensityPerHz: number;
}

/**
 * The room's exact mode count against the asymptotic count N(f) (Kuttruff, Room Acoustics) and the
 * modal density dN/df at chosen frequencies, with a plain-words verdict. Fewer modes than N(f) at low
 * frequencies means sparse bass.
 *
 * @param room dimensions, m
 * @param options.frequenciesHz 1..2000 frequencies, Hz, each in [1, 1000]
 * @param options.speedOfSound m/s, default 343
 * @example modeCountCheck({ lengthM: 5, widthM: 4, heightM: 3 }, { frequenciesHz: [100] }).rows[0]
 * // { frequencyHz: 100, countedModes: 13, asymptoticModes: 14.25, ratio: 0.91, modalDensityPerHz: 0.33 }
 */
export function modeCountCheck(room: RectRoom, options: { frequenciesHz: number[]; speedOfSound?: number }): { rows: ModeCountRow[]; verdict: string } {
  const freqs = Array.from(checkFrequencies(options?.frequenciesHz, "frequenciesHz")).sort((a, b) => a - b);
  const c = checkSpeedOfSound(options.speedOfSound);
  const modes = roomModes(room, { maxFrequencyHz: freqs[freqs.length - 1]!, speedOfSound: c });
  let k = 0;
  const rows = freqs.map((f) => {
    while (k < modes.length && modes[k]!.frequencyHz <= f) k++;
    const asymptoticModes = asymptoticModeCount(room, f, c);
    return { frequencyHz: f, countedModes: k, asymptoticModes, ratio: k / asymptoticModes, modalDensityPerHz: modalDensity(room, f, c) };
  });
  const text = rows.map((r) => `${r.countedModes} up to ${r.frequencyHz} Hz (expected ${r.asymptoticModes.toFixed(1)})`).join(", ");
  const sparse = rows.filter((r) => r.ratio < 0.8).map((r) => `${r.frequencyHz} Hz`);
  const top = rows[rows.length - 1]!;
  const verdict = `Mode count: ${text}; near ${top.frequencyHz} Hz a new mode arrives about every ${(1 / top.modalDensityPerHz).toFixed(1)} Hz. ` +
    (sparse.length ? `Noticeably fewer modes than a room of this size averages at ${sparse.join(", ")}: expect uneven bass there.` : "The count follows the average for a room of this size.");
  return { rows, verdict };
}
