import { enumerateModes } from "./mode-set";
import { angular, dampingConstant, inverseNorms, levelDb, modeShapes, sourceGains } from "./modal-sum";
import type { Point3, RectRoom, SoundSource } from "./types";
import { LIMITS } from "./limits";
import { checkFrequencies, checkFrequency, checkPoint, checkRoom, checkRt60, checkSources, checkSpeedOfSound } from "./validate";

/** Options of multiSourceResponse. */
export interface MultiSourceResponseOptions {
  /** 1..16 sources driven by the same signal (each with optional delay and polarity). */
  sources: SoundSource[];
  /** 1..400 receiver positions (seats), m, inside the room. */
  receivers: Point3[];
  /** 1..2000 frequencies, Hz, each in [1, 1000]. */
  frequenciesHz: number[];
  /** Reverberation time, s, in [0.05, 10]. */
  rt60Seconds: number;
  /** m/s, default 343. */
  speedOfSound?: number;
  /** Modes up to this frequency enter the sum, Hz (required). */
  maxModeFrequencyHz: number;
}

/** Checks the options of the modal-sum functions and prepares the mode set (internal). */
export function prepareResponse(room: RectRoom, o: MultiSourceResponseOptions) {
  checkRoom(room);
  if (typeof o !== "object" || o === null) throw new TypeError("options must be an object");
  const sources = checkSources(o.sources, "sources", room);
  if (!Array.isArray(o.receivers)) throw new TypeError("receivers must be an array of [x, y, z] positions");
  if (o.receivers.length < 1 || o.receivers.length > LIMITS.maxReceivers)
    throw new RangeError(`receivers must hold 1 to ${LIMITS.maxReceivers} positions (got ${o.receivers.length})`);
  o.receivers.forEach((r, i) => checkPoint(r, `receivers[${i}]`, room));
  const freqs = checkFrequencies(o.frequenciesHz, "frequenciesHz");
  const t60 = checkRt60(o.rt60Seconds);
  const c = checkSpeedOfSound(o.speedOfSound);
  const fMax = checkFrequency(o.maxModeFrequencyHz, "maxModeFrequencyHz");
  const set = enumerateModes(room, fMax, c, true, "maxModeFrequencyHz");
  const work = set.count * freqs.length * (sources.length + o.receivers.length);
  if (work > LIMITS.maxResponseWork)
    throw new RangeError(`maxModeFrequencyHz: ${set.count} modes x ${freqs.length} frequencies x ${sources.length + o.receivers.length} sources and receivers exceed ${LIMITS.maxResponseWork.toExponential(0)} terms; lower maxModeFrequencyHz or use fewer frequencies or seats`);
  return { sources, receivers: o.receivers, freqs, t60, c, set };
}

/**
 * Levels at several seats for several sources driven together: the complex modal sum of CONTRACTS.md
 * at each receiver, with each source's contribution multiplied by polarity * e^{-j omega tau}.
 *
 * H(omega) = omega sum_n [sum_s p_s e^{-j omega tau_s} psi_n(r_s)] psi_n(r) / (Lambda_n (omega^2 - omega_n^2 - 2j delta omega_n))
 * (CONTRACTS.md modal sum, superposed over sources); level = 20 log10 |H|, floored at LEVEL_FLOOR_DB.
 *
 * @param room dimensions, m
 * @returns one array of levels (dB, one per frequency) per receiver, in the receivers' order
 * @throws TypeError / RangeError naming the field (e.g. "sources[1].delayMs ...")
 * @example
 * multiSourceResponse({ lengthM: 5, widthM: 4, heightM: 3 }, {
 *   sources: [{ position: [0, 0, 0] }, { position: [5, 0, 0], delayMs: 1.5, polarity: -1 }],
 *   receivers: [[2.5, 2.2, 1.1]], frequenciesHz: [30, 40, 50], rt60Seconds: 0.4, maxModeFrequencyHz: 200,
 * }) // [[-53.35, -48.30, -74.66]] dB
 */
export function multiSourceResponse(room: RectRoom, options: MultiSourceResponseOptions): number[][] {
  const { sources, receivers, freqs, t60, set } = prepareResponse(room, options);
  const M = set.count, nf = freqs.length, S = sources.length, R = receivers.length;
  const omega = angular(freqs);
  const delta = dampingConstant(t60);
  const lamInv = inverseNorms(set);
  const psiS = sources.map((s) => modeShapes(room, set, s.position));
  const psiR = receivers.map((r) => modeShapes(room, set, r));
  const gains = sourceGains(sources, omega);
  const wn = new Float64Array(M);
  for (let n = 0; n < M; n++) wn[n] = 2 * Math.PI * set.frequencyHz[n]!;
  const tRe = new Float64Array(M), tIm = new Float64Array(M);
  const out = receivers.map(() => new Array<number>(nf));
  for (let f = 0; f < nf; f++) {
    const w = omega[f]!;
    for (let n = 0; n < M; n++) {
      // 1/(a - j b) = (a + j b)/(a^2 + b^2), a = omega^2 - omega_n^2, b = 2 delta omega_n (CONTRACTS.md denominator)
      const a = w * w - wn[n]! * wn[n]!, b = 2 * delta * wn[n]!;
      const s = lamInv[n]! / (a * a + b * b);
      let sr = 0, si = 0;
      for (let k = 0; k < S; k++) {
        sr += gains.re[k * nf + f]! * psiS[k]![n]!;
        si += gains.im[k * nf + f]! * psiS[k]![n]!;
      }
      // (sr + j si)(a + j b) s
      tRe[n] = (sr * a - si * b) * s;
      tIm[n] = (sr * b + si * a) * s;
    }
    for (let r = 0; r < R; r++) {
      const psi = psiR[r]!;
      let hr = 0, hi = 0;
      for (let n = 0; n < M; n++) { hr += psi[n]! * tRe[n]!; hi += psi[n]! * tIm[n]!; }
      hr *= w; hi *= w;
      out[r]![f] = levelDb(hr * hr + hi * hi);
    }
  }
  return out;
}
