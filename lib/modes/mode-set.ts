/**
 * Enumeration of the mode indices of a rectangular room (internal). Shared by roomModes and the
 * modal sums so that both use exactly the same set of modes.
 */
import { asymptoticModeCount } from "./mode-count";
import { LIMITS } from "./limits";
import type { RectRoom } from "./types";

/** Modes as parallel typed arrays, ascending by frequency (ties by nx, then ny, then nz). */
export interface ModeSet {
  count: number;
  nx: Int32Array;
  ny: Int32Array;
  nz: Int32Array;
  frequencyHz: Float64Array;
}

/** Rayleigh's equation f = c/2 sqrt((nx/Lx)^2 + (ny/Ly)^2 + (nz/Lz)^2) (REFERENCES.md; Kuttruff, Room Acoustics). */
export const modeFrequency = (room: RectRoom, c: number, nx: number, ny: number, nz: number): number =>
  (c / 2) * Math.sqrt((nx / room.lengthM) ** 2 + (ny / room.widthM) ** 2 + (nz / room.heightM) ** 2);

/**
 * Every (nx, ny, nz) with f <= maxFrequencyHz; `includeZero` adds the (0,0,0) term of the modal sum.
 * Arguments are assumed checked. Throws a RangeError naming `field` when the set would be too large.
 */
export function enumerateModes(room: RectRoom, maxFrequencyHz: number, c: number, includeZero: boolean, field: string): ModeSet {
  const expected = asymptoticModeCount(room, maxFrequencyHz, c);
  if (expected > LIMITS.maxModes)
    throw new RangeError(`${field} = ${maxFrequencyHz} Hz gives about ${Math.round(expected)} modes in this room; the limit is ${LIMITS.maxModes}`);
  const nxs: number[] = [], nys: number[] = [], nzs: number[] = [], fs: number[] = [];
  // Each index is bounded by its axial mode: n <= 2 L fMax / c (+1 for rounding, checked below).
  const mx = Math.floor((2 * room.lengthM * maxFrequencyHz) / c) + 1;
  const my = Math.floor((2 * room.widthM * maxFrequencyHz) / c) + 1;
  const mz = Math.floor((2 * room.heightM * maxFrequencyHz) / c) + 1;
  for (let nx = 0; nx <= mx; nx++) {
    if (modeFrequency(room, c, nx, 0, 0) > maxFrequencyHz) break;
    for (let ny = 0; ny <= my; ny++) {
      if (modeFrequency(room, c, nx, ny, 0) > maxFrequencyHz) break;
      for (let nz = 0; nz <= mz; nz++) {
        const f = modeFrequency(room, c, nx, ny, nz);
        if (f > maxFrequencyHz) break;
        if (nx === 0 && ny === 0 && nz === 0 && !includeZero) continue;
        nxs.push(nx); nys.push(ny); nzs.push(nz); fs.push(f);
      }
    }
  }
  const order = fs.map((_, i) => i);
  order.sort((a, b) => fs[a]! - fs[b]! || nxs[a]! - nxs[b]! || nys[a]! - nys[b]! || nzs[a]! - nzs[b]!);
  const n = order.length;
  const set: ModeSet = { count: n, nx: new Int32Array(n), ny: new Int32Array(n), nz: new Int32Array(n), frequencyHz: new Float64Array(n) };
  order.forEach((k, i) => {
    set.nx[i] = nxs[k]!; set.ny[i] = nys[k]!; set.nz[i] = nzs[k]!; set.frequencyHz[i] = fs[k]!;
  });
  return set;
}
