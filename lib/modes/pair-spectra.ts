/**
 * Step 1 of the flatness maps (internal): the modal sum collapsed over nz for receivers at one height.
 */
import type { PairSpectra } from "./flatness-kernel";
import { LIMITS } from "./limits";
import type { ModeSet } from "./mode-set";
import { angular, dampingConstant, inverseNorms, modeShapes, sourceGains } from "./modal-sum";
import type { RectRoom, SoundSource } from "./types";

/**
 * Sums the nz direction of the modal sum for receivers at height z0 (CONTRACTS.md modal sum):
 * B[nx,ny](omega) = omega sum_nz cos(nz pi z0/Lz) S_n(omega) / (Lambda_n (omega^2 - omega_n^2 - 2j delta omega_n)),
 * with S_n(omega) = sum_s p_s e^{-j omega tau_s} psi_n(r_s).
 */
export function pairSpectra(
  room: RectRoom, set: ModeSet, sources: SoundSource[], z0: number, freqs: ArrayLike<number>, t60: number,
  take: (name: string, length: number, zero: boolean) => Float64Array = (_n, len) => new Float64Array(len),
): PairSpectra {
  const nf = freqs.length, M = set.count, S = sources.length;
  const omega = angular(freqs);
  const delta = dampingConstant(t60);
  const lamInv = inverseNorms(set);
  const psiS = sources.map((s) => modeShapes(room, set, s.position));
  const plain = sources.every((s) => !s.delayMs);
  const gains = sourceGains(sources, omega);
  // Pair index of each (nx, ny).
  let NX = 0, NY = 0;
  for (let n = 0; n < M; n++) { NX = Math.max(NX, set.nx[n]! + 1); NY = Math.max(NY, set.ny[n]! + 1); }
  const index = new Int32Array(NX * NY).fill(-1);
  const pnx: number[] = [], pny: number[] = [];
  for (let n = 0; n < M; n++) {
    const key = set.nx[n]! * NY + set.ny[n]!;
    if (index[key]! < 0) { index[key] = pnx.length; pnx.push(set.nx[n]!); pny.push(set.ny[n]!); }
  }
  const pairs = pnx.length;
  if (pairs * nf > LIMITS.maxPairFrequencyProducts || NY * nf > LIMITS.maxRowFrequencyProducts)
    throw new RangeError(
      `maxModeFrequencyHz: this room with ${nf} frequencies and modes up to ${set.frequencyHz[M - 1]!.toFixed(1)} Hz needs ` +
        `${pairs} spectra of ${nf} values and ${NY} rows (limits ${LIMITS.maxPairFrequencyProducts} and ${LIMITS.maxRowFrequencyProducts} values); lower maxModeFrequencyHz or use fewer frequencies`,
    );
  const W = 2 * nf;
  const B = take("B", pairs * W, true);
  const kz = (Math.PI * z0) / room.heightM;
  for (let n = 0; n < M; n++) {
    const o = index[set.nx[n]! * NY + set.ny[n]!]! * W;
    const wn = 2 * Math.PI * set.frequencyHz[n]!;
    const b = 2 * delta * wn;
    const cz = Math.cos(set.nz[n]! * kz) * lamInv[n]!;
    if (plain) {
      let a0 = 0;
      for (let k = 0; k < S; k++) a0 += (sources[k]!.polarity ?? 1) * psiS[k]![n]!;
      const amp = a0 * cz;
      if (amp === 0) continue;
      for (let f = 0; f < nf; f++) {
        const w = omega[f]!;
        // omega * amp / (a - j b) = omega * amp * (a + j b)/(a^2 + b^2), a = omega^2 - omega_n^2
        const a = w * w - wn * wn;
        const s = (amp * w) / (a * a + b * b);
        B[o + 2 * f] = B[o + 2 * f]! + a * s;
        B[o + 2 * f + 1] = B[o + 2 * f + 1]! + b * s;
      }
    } else {
      for (let f = 0; f < nf; f++) {
        const w = omega[f]!;
        let sr = 0, si = 0;
        for (let k = 0; k < S; k++) { sr += gains.re[k * nf + f]! * psiS[k]![n]!; si += gains.im[k * nf + f]! * psiS[k]![n]!; }
        const a = w * w - wn * wn;
        const s = (cz * w) / (a * a + b * b);
        // (sr + j si)(a + j b) s
        B[o + 2 * f] = B[o + 2 * f]! + (sr * a - si * b) * s;
        B[o + 2 * f + 1] = B[o + 2 * f + 1]! + (sr * b + si * a) * s;
      }
    }
  }
  return { pairs, nx: Int32Array.from(pnx), ny: Int32Array.from(pny), nf, B };
}
