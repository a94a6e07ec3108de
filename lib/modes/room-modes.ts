import { enumerateModes } from "./mode-set";
import type { ModeKind, RectRoom, RoomMode } from "./types";
import { checkFrequency, checkRoom, checkSpeedOfSound } from "./validate";

const KINDS: ModeKind[] = ["axial", "axial", "tangential", "oblique"];

/**
 * Axial, tangential or oblique by the number of non-zero indices (1, 2, 3); (0,0,0) counts as axial
 * here but is never listed by roomModes.
 *
 * @example modeKind(1, 1, 0) // "tangential"
 */
export const modeKind = (nx: number, ny: number, nz: number): ModeKind =>
  KINDS[(nx > 0 ? 1 : 0) + (ny > 0 ? 1 : 0) + (nz > 0 ? 1 : 0)]!;

/**
 * Every standing wave of a rigid rectangular room up to a frequency (CONTRACTS.md, lib/modes).
 *
 * f = c/2 * sqrt((nx/Lx)^2 + (ny/Ly)^2 + (nz/Lz)^2) (Rayleigh's equation; Kuttruff, Room Acoustics),
 * for every (nx, ny, nz) != (0, 0, 0) with f <= maxFrequencyHz (inclusive), ascending by frequency
 * (modes of equal frequency ordered by nx, ny, nz).
 *
 * @param room dimensions, m, each finite in (0, 100]
 * @param options.maxFrequencyHz highest frequency listed, Hz, in [1, 1000]
 * @param options.speedOfSound m/s, in [200, 500], default 343
 * @returns the modes, Hz
 * @throws TypeError / RangeError naming the field for bad arguments, or when the list would exceed
 *   200 000 modes
 * @example
 * roomModes({ lengthM: 5, widthM: 4, heightM: 3 }, { maxFrequencyHz: 40 })
 * // [{ nx: 1, ny: 0, nz: 0, frequencyHz: 34.3, kind: "axial" }]
 */
export function roomModes(room: RectRoom, options: { maxFrequencyHz: number; speedOfSound?: number }): RoomMode[] {
  checkRoom(room);
  if (typeof options !== "object" || options === null) throw new TypeError("options must be an object { maxFrequencyHz, speedOfSound? }");
  const fMax = checkFrequency(options.maxFrequencyHz, "maxFrequencyHz");
  const c = checkSpeedOfSound(options.speedOfSound);
  const set = enumerateModes(room, fMax, c, false, "maxFrequencyHz");
  const out: RoomMode[] = new Array(set.count);
  for (let i = 0; i < set.count; i++) {
    const nx = set.nx[i]!, ny = set.ny[i]!, nz = set.nz[i]!;
    out[i] = { nx, ny, nz, frequencyHz: set.frequencyHz[i]!, kind: modeKind(nx, ny, nz) };
  }
  return out;
}
