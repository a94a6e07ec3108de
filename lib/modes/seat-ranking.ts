import { populationStdDev } from "./deviation";
import { logSpacedFrequencies } from "./frequencies";
import { multiSourceResponse } from "./multi-source-response";
import type { RectRoom, SoundSource } from "./types";
import { checkFrequency, checkInteger, checkNumber, checkRoom } from "./validate";

/** One candidate seat and its flatness. */
export interface SeatScore {
  /** Seat position along the length, m. */
  xM: number;
  /** Population std-dev of the level over the band, dB (lower is flatter). */
  stdDevDb: number;
}

export interface SeatRanking {
  /** The candidates in the order given (or front to back). */
  positions: SeatScore[];
  /** Indices into positions, flattest first (ties keep the front-to-back order). */
  ranking: number[];
  best: SeatScore;
  worst: SeatScore;
  /** Frequencies the scores were taken over, Hz. */
  frequenciesHz: number[];
  /** Plain words for an engineer's screen. */
  verdict: string;
}

/** Options of rankSeatPositions. */
export interface SeatRankingOptions {
  /** 1..16 sources (subwoofers), each with optional delayMs and polarity. */
  sources: SoundSource[];
  /** Seat position across the width, m (0..widthM). */
  seatYM: number;
  /** Ear height, m (0..heightM). */
  earHeightM: number;
  /** Candidate positions along the length, m (0..lengthM), 1..400 of them; or use candidateCount. */
  candidateXM?: number[];
  /** When candidateXM is absent: this many positions at cell centres (i + 0.5) Lx / n, 1..400 (default 20). */
  candidateCount?: number;
  /** Band the flatness is judged over, Hz (default 20..120 Hz). */
  bandHz?: { lowHz: number; highHz: number };
  /** Log-spaced frequencies across the band, 2..2000 (default 96). */
  frequencyCount?: number;
  rt60Seconds: number;
  speedOfSound?: number;
  /** Modes up to this frequency enter the sum, Hz (default twice the band's top, at most 1000). */
  maxModeFrequencyHz?: number;
}

/**
 * Ranks candidate seat positions along the room's length by how flat the bass is there: the
 * population standard deviation of the summed modal response level (multiSourceResponse) over
 * log-spaced frequencies in a band, e.g. 20-120 Hz. Flatness as the standard deviation of the level is
 * common practice for comparing seats and subwoofer layouts.
 *
 * @param room dimensions, m
 * @returns the scores in the candidates' order, the ranking (flattest first), best and worst, a verdict
 * @throws TypeError / RangeError naming the field
 * @example
 * rankSeatPositions({ lengthM: 6, widthM: 4.2, heightM: 2.8 }, { sources: [{ position: [0, 0, 0] }],
 *   seatYM: 2.1, earHeightM: 1.1, candidateCount: 12, rt60Seconds: 0.4 }).best // { xM: 5.75, stdDevDb: 5.16 }
 */
export function rankSeatPositions(room: RectRoom, options: SeatRankingOptions): SeatRanking {
  checkRoom(room);
  if (typeof options !== "object" || options === null) throw new TypeError("options must be an object");
  const y = checkNumber(options.seatYM, "seatYM", 0, room.widthM, "m");
  const z = checkNumber(options.earHeightM, "earHeightM", 0, room.heightM, "m");
  let xs: number[];
  if (options.candidateXM !== undefined) {
    if (!Array.isArray(options.candidateXM)) throw new TypeError("candidateXM must be an array of positions in m");
    checkInteger(options.candidateXM.length, "candidateXM.length", 1, 400);
    xs = options.candidateXM.map((x, i) => checkNumber(x, `candidateXM[${i}]`, 0, room.lengthM, "m"));
  } else {
    const n = checkInteger(options.candidateCount ?? 20, "candidateCount", 1, 400);
    xs = Array.from({ length: n }, (_, i) => ((i + 0.5) * room.lengthM) / n);
  }
  const low = checkFrequency(options.bandHz?.lowHz ?? 20, "bandHz.lowHz");
  const high = checkFrequency(options.bandHz?.highHz ?? 120, "bandHz.highHz");
  if (!(high > low)) throw new RangeError(`bandHz.highHz must be above bandHz.lowHz (got ${high} <= ${low})`);
  const count = checkInteger(options.frequencyCount ?? 96, "frequencyCount", 2, 2000);
  const freqs = logSpacedFrequencies(low, high, count);
  const levels = multiSourceResponse(room, {
    sources: options.sources,
    receivers: xs.map((x) => [x, y, z]),
    frequenciesHz: freqs,
    rt60Seconds: options.rt60Seconds,
    speedOfSound: options.speedOfSound,
    maxModeFrequencyHz: options.maxModeFrequencyHz ?? Math.min(1000, 2 * high),
  });
  const positions = xs.map((xM, i) => ({ xM, stdDevDb: populationStdDev(levels[i]!) }));
  const ranking = positions.map((_, i) => i).sort((a, b) => positions[a]!.stdDevDb - positions[b]!.stdDevDb || a - b);
  const best = positions[ranking[0]!]!, worst = positions[ranking[ranking.length - 1]!]!;
  const verdict =
    `Across ${low}-${high} Hz the best seat along the length is at x = ${best.xM.toFixed(2)} m ` +
    `(level varies by ${best.stdDevDb.toFixed(1)} dB std-dev); the worst is at x = ${worst.xM.toFixed(2)} m ` +
    `(${worst.stdDevDb.toFixed(1)} dB).`;
  return { positions, ranking, best, worst, frequenciesHz: freqs, verdict };
}
