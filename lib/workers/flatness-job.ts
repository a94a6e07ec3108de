/**
 * The flatness-map job of the room workspace, as a pure function: what the Web Worker runs
 * (flatness.worker.ts) and what a unit test can call directly. No DOM, React or Next imports.
 *
 * Two maps over the floor plan, both the population standard deviation of the level over 20–120 Hz
 * (lib/modes multiSourceFlatnessMap; the seat-ranking band of lib/analysis):
 * - "seats": the current bass sources play together; each cell is a listener at `heightM`. A flat
 *   (low) cell is a good place to sit with the subwoofers where they are now.
 * - "subwoofer": one subwoofer at `heightM` in each cell, heard at the main seat. The modal sum is
 *   symmetric in source and receiver (each mode enters as the product ψn(rs) ψn(rr), CONTRACTS.md), so
 *   this equals a source at the seat heard over the grid, which is what is summed.
 */
import { logSpacedFrequencies, multiSourceFlatnessMap, type Point3, type SoundSource } from "@/lib/modes";

export type FlatnessMode = "seats" | "subwoofer";

/** Input of one flatness job; SI units. */
export interface FlatnessJobInput {
  mode: FlatnessMode;
  room: { lengthM: number; widthM: number; heightM: number };
  /** "seats": the sources playing the bass; ignored for "subwoofer" */
  sources: { xM: number; yM: number; zM: number; delayMs: number; polarity: 1 | -1 }[];
  /** "subwoofer": the seat where the response is judged */
  seat: { xM: number; yM: number; zM: number } | null;
  /** height of the grid: ear height ("seats") or the subwoofer's driver height ("subwoofer"), m */
  heightM: number;
  /** cells along the length; the width gets the same cell size */
  gridX: number;
  rt60Seconds: number;
  speedOfSound: number;
}

/** Result: cell centres (m) and the standard deviation per cell, dB, index ix * yM.length + iy. */
export interface FlatnessJobResult {
  mode: FlatnessMode;
  xM: number[];
  yM: number[];
  stdDevDb: Float64Array;
  minDb: number;
  maxDb: number;
  /** cell of the lowest spread (the flattest place) */
  best: { xM: number; yM: number; stdDevDb: number };
  frequencyBandHz: { lowHz: number; highHz: number };
  elapsedMs: number;
}

/** Band over which the spread is taken, Hz (as lib/analysis SPREAD_BAND_HZ). */
export const FLATNESS_BAND_HZ = Object.freeze({ lowHz: 20, highHz: 120 });
/** Frequencies in the band, log-spaced (about 48 per octave over 20–120 Hz, common practice). */
export const FLATNESS_POINTS = 120;
/** Modes up to this frequency enter the sum, Hz: well above the band's top (common practice). */
export const FLATNESS_MAX_MODE_HZ = 300;

const clamp = (v: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, v));

/**
 * Runs one flatness map.
 * @param input see {@link FlatnessJobInput}
 * @param onProgress fraction done (0…1]
 * @param signal cancellation flag checked between rows (the worker is simply terminated on Cancel)
 * @throws RangeError from lib/modes for inputs outside its domain; TypeError when a map needs a seat or a source and has none
 * @example runFlatnessJob({ mode: 'seats', room: { lengthM: 5.8, widthM: 4.1, heightM: 2.5 }, sources: [{ xM: 0.3, yM: 0.3, zM: 0.3, delayMs: 0, polarity: 1 }], seat: null, heightM: 1.1, gridX: 58, rt60Seconds: 0.5, speedOfSound: 343 }).stdDevDb.length // 58 × 41
 */
export function runFlatnessJob(input: FlatnessJobInput, onProgress?: (fraction: number) => void, signal?: { readonly aborted: boolean }): FlatnessJobResult {
  const t0 = typeof performance !== "undefined" ? performance.now() : Date.now();
  const { room } = input;
  const gridX = clamp(Math.round(input.gridX), 4, 200);
  const gridY = clamp(Math.round((gridX * room.widthM) / room.lengthM), 4, 200);
  const inside = (p: { xM: number; yM: number; zM: number }): Point3 => [clamp(p.xM, 0, room.lengthM), clamp(p.yM, 0, room.widthM), clamp(p.zM, 0, room.heightM)];
  let sources: SoundSource[];
  if (input.mode === "seats") {
    if (input.sources.length === 0) throw new TypeError("sources: the seat map needs at least one source that plays the bass");
    sources = input.sources.map((s) => ({ position: inside(s), delayMs: s.delayMs, polarity: s.polarity }));
  } else {
    if (!input.seat) throw new TypeError("seat: the subwoofer map needs a main seat");
    sources = [{ position: inside(input.seat) }];
  }
  const map = multiSourceFlatnessMap(room, {
    sources,
    heightM: clamp(input.heightM, 0, room.heightM),
    gridX,
    gridY,
    frequenciesHz: logSpacedFrequencies(FLATNESS_BAND_HZ.lowHz, FLATNESS_BAND_HZ.highHz, FLATNESS_POINTS),
    rt60Seconds: clamp(input.rt60Seconds, 0.05, 10),
    speedOfSound: input.speedOfSound,
    maxModeFrequencyHz: FLATNESS_MAX_MODE_HZ,
    onProgress,
    signal,
  });
  let minDb = Infinity, maxDb = -Infinity, bestI = 0;
  map.stdDevDb.forEach((v, i) => {
    if (v < minDb) { minDb = v; bestI = i; }
    if (v > maxDb) maxDb = v;
  });
  const bx = Math.floor(bestI / gridY), by = bestI % gridY;
  const t1 = typeof performance !== "undefined" ? performance.now() : Date.now();
  return {
    mode: input.mode,
    xM: map.xM,
    yM: map.yM,
    stdDevDb: map.stdDevDb,
    minDb,
    maxDb,
    best: { xM: map.xM[bx]!, yM: map.yM[by]!, stdDevDb: minDb },
    frequencyBandHz: { ...FLATNESS_BAND_HZ },
    elapsedMs: t1 - t0,
  };
}
