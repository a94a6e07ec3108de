import { flatnessFromSpectra } from "./flatness-kernel";
import { LIMITS } from "./limits";
import { enumerateModes } from "./mode-set";
import { pairSpectra } from "./pair-spectra";
import { withScratch } from "./scratch";
import type { Point3, ProgressOptions, RectRoom, SoundSource } from "./types";
import {
  checkFrequencies, checkFrequency, checkInteger, checkNumber, checkPoint, checkRoom, checkRt60, checkSources, checkSpeedOfSound,
} from "./validate";

/** Result of a flatness map (CONTRACTS.md). */
export interface FlatnessMapResult {
  /** Cell-centre x, m: x_i = (i + 0.5) Lx / gridX. */
  xM: number[];
  /** Cell-centre y, m: y_j = (j + 0.5) Ly / gridY. */
  yM: number[];
  /** Population std-dev of the level over frequenciesHz, dB, index ix * gridY + iy. */
  stdDevDb: Float64Array;
}

/** Grid and sum options shared by flatnessMap and multiSourceFlatnessMap. */
export interface FlatnessGridOptions extends ProgressOptions {
  /** Listening height z of every receiver, m, 0 <= heightM <= room.heightM. */
  heightM: number;
  /** Cells along x (length) and y (width), integers 1..400. */
  gridX: number;
  gridY: number;
  /** 1..2000 frequencies, Hz, each in [1, 1000]. */
  frequenciesHz: number[];
  /** s, in [0.05, 10]. */
  rt60Seconds: number;
  /** m/s, default 343. */
  speedOfSound?: number;
  /** Modes up to this frequency enter the sum, Hz (required). */
  maxModeFrequencyHz: number;
}

function checkGridOptions(room: RectRoom, o: FlatnessGridOptions) {
  const z0 = checkNumber(o.heightM, "heightM", 0, room.heightM, "m");
  const gridX = checkInteger(o.gridX, "gridX", 1, LIMITS.maxGrid);
  const gridY = checkInteger(o.gridY, "gridY", 1, LIMITS.maxGrid);
  const freqs = checkFrequencies(o.frequenciesHz, "frequenciesHz");
  const t60 = checkRt60(o.rt60Seconds);
  const c = checkSpeedOfSound(o.speedOfSound);
  const fMax = checkFrequency(o.maxModeFrequencyHz, "maxModeFrequencyHz");
  if (o.onProgress !== undefined && typeof o.onProgress !== "function") throw new TypeError("onProgress must be a function");
  return { z0, gridX, gridY, freqs, t60, c, fMax };
}

/**
 * Flatness map for several sources driven together (each with optional delay and polarity): the
 * population standard deviation over frequency of the level of the summed modal response, at the cell
 * centres of a gridX x gridY grid at one listening height. Same sum and layout as flatnessMap.
 *
 * @param room dimensions, m
 * @param options see FlatnessGridOptions; `sources`: 1..16 sources inside the room
 * @returns { xM, yM, stdDevDb } with stdDevDb[ix * gridY + iy] in dB
 * @throws TypeError / RangeError naming the field; an Error named "AbortError" when options.signal is aborted
 * @example
 * multiSourceFlatnessMap(room, { sources: [{ position: [0, 0, 0] }, { position: [7.2, 5.1, 0] }], heightM: 1.1,
 *   gridX: 72, gridY: 51, frequenciesHz: logSpacedFrequencies(20, 120, 96), rt60Seconds: 0.4, maxModeFrequencyHz: 200 })
 *   .stdDevDb[0] // 6.07 dB in the corner cell
 */
export function multiSourceFlatnessMap(room: RectRoom, options: FlatnessGridOptions & { sources: SoundSource[] }): FlatnessMapResult {
  checkRoom(room);
  if (typeof options !== "object" || options === null) throw new TypeError("options must be an object");
  const sources = checkSources(options.sources, "sources", room);
  const { z0, gridX, gridY, freqs, t60, c, fMax } = checkGridOptions(room, options);
  const set = enumerateModes(room, fMax, c, true, "maxModeFrequencyHz");
  let NY = 1;
  for (let n = 0; n < set.count; n++) NY = Math.max(NY, set.ny[n]! + 1);
  const work = gridX * gridY * freqs.length * ((NY + 1) / 2);
  if (work > LIMITS.maxFlatnessWork)
    throw new RangeError(`gridX, gridY: ${gridX} x ${gridY} cells, ${freqs.length} frequencies and modes up to ${fMax} Hz need about ${work.toExponential(1)} operations; the limit is ${LIMITS.maxFlatnessWork.toExponential(0)}`);
  const stdDevDb = withScratch((take) => flatnessFromSpectra(pairSpectra(room, set, sources, z0, freqs, t60, take), gridX, gridY, options, take));
  return {
    xM: Array.from({ length: gridX }, (_, i) => ((i + 0.5) * room.lengthM) / gridX),
    yM: Array.from({ length: gridY }, (_, j) => ((j + 0.5) * room.widthM) / gridY),
    stdDevDb,
  };
}

/**
 * Flatness map of one source (CONTRACTS.md): receivers at the cell centres x_i = (i + 0.5) Lx/gridX,
 * y_j = (j + 0.5) Ly/gridY, z = heightM; stdDevDb[ix * gridY + iy] is the population standard deviation
 * of modalResponse's level over frequenciesHz, dB. Optional `onProgress(fraction)` and `signal`
 * ({ aborted }) let a Web Worker report progress and cancel.
 *
 * @param room dimensions, m
 * @param options source [x, y, z] in m inside the room, heightM m, gridX/gridY 1..400,
 *   frequenciesHz 1..2000 values in [1, 1000] Hz, rt60Seconds [0.05, 10] s, speedOfSound m/s (343),
 *   maxModeFrequencyHz Hz (required)
 * @throws TypeError / RangeError naming the field; an Error named "AbortError" when cancelled
 * @example
 * flatnessMap({ lengthM: 7.2, widthM: 5.1, heightM: 2.7 }, { source: [0.3, 0.3, 0.3], heightM: 1.2,
 *   gridX: 120, gridY: 90, frequenciesHz: logSpacedFrequencies(15, 250, 400), rt60Seconds: 0.5,
 *   maxModeFrequencyHz: 400 }).stdDevDb[0] // 6.80 dB at the cell nearest the origin
 */
export function flatnessMap(room: RectRoom, options: FlatnessGridOptions & { source: Point3 }): FlatnessMapResult {
  checkRoom(room);
  if (typeof options !== "object" || options === null) throw new TypeError("options must be an object");
  checkPoint(options.source, "source", room);
  return multiSourceFlatnessMap(room, { ...options, sources: [{ position: options.source }] });
}
