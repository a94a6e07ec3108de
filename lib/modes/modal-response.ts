import { multiSourceResponse } from "./multi-source-response";
import type { Point3, RectRoom } from "./types";

/** Options of modalResponse (CONTRACTS.md). */
export interface ModalResponseOptions {
  /** Source position [x, y, z], m, inside the room (walls included). */
  source: Point3;
  /** Receiver position [x, y, z], m, inside the room. */
  receiver: Point3;
  /** 1..2000 frequencies, Hz, each in [1, 1000]. */
  frequenciesHz: number[];
  /** Reverberation time, s, in [0.05, 10]: sets the modal damping delta = 3 ln 10 / T60. */
  rt60Seconds: number;
  /** m/s, in [200, 500], default 343. */
  speedOfSound?: number;
  /** Every mode with f_n <= this enters the sum (and the (0,0,0) term), Hz; required. */
  maxModeFrequencyHz: number;
}

/**
 * Level of the modal sum between a source and a receiver, dB, one value per frequency (CONTRACTS.md):
 *
 * H(omega) = omega sum_n psi_n(rs) psi_n(rr) / (Lambda_n (omega^2 - omega_n^2 - 2j delta omega_n)),
 * delta = 3 ln 10 / T60, the (0,0,0) term included; level = 20 log10 |H| (absolute offset free:
 * compare after removing the mean). An exact null (|H| < 1e-15) is reported as LEVEL_FLOOR_DB (-300 dB).
 *
 * @param room dimensions, m
 * @returns levels, dB, aligned with frequenciesHz
 * @throws TypeError / RangeError naming the field, e.g. "receiver[2] must lie inside the room: 0 <= z <= 3 m (got 3.2)"
 * @example
 * modalResponse({ lengthM: 5, widthM: 4, heightM: 3 },
 *   { source: [0, 0, 0], receiver: [5, 4, 3], frequenciesHz: [34.3], rt60Seconds: 0.5, maxModeFrequencyHz: 200 })
 * // [-22.39] dB at the first length mode (compare levels with each other: the offset is free)
 */
export function modalResponse(room: RectRoom, options: ModalResponseOptions): number[] {
  if (typeof options !== "object" || options === null) throw new TypeError("options must be an object");
  const { source, receiver, ...rest } = options;
  if (!Array.isArray(source)) throw new TypeError("source must be an array [x, y, z] of three numbers in m");
  if (!Array.isArray(receiver)) throw new TypeError("receiver must be an array [x, y, z] of three numbers in m");
  try {
    return multiSourceResponse(room, { ...rest, sources: [{ position: source }], receivers: [receiver] })[0]!;
  } catch (e) {
    // Report the field names of this function's own options.
    if (e instanceof Error) e.message = e.message.replace(/^sources\[0\]\.position/, "source").replace(/^receivers\[0\]/, "receiver");
    throw e;
  }
}
