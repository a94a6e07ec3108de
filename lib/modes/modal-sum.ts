/**
 * Building blocks of the modal sum (internal), exactly as CONTRACTS.md writes it:
 *   psi_n(r) = cos(nx pi x/Lx) cos(ny pi y/Ly) cos(nz pi z/Lz)
 *   Lambda_n = e(nx) e(ny) e(nz), e(0) = 1, e(k > 0) = 1/2
 *   delta = 3 ln 10 / T60, omega_n = 2 pi f_n
 *   H(omega) = omega * sum_n psi_n(rs) psi_n(rr) / (Lambda_n (omega^2 - omega_n^2 - 2j delta omega_n))
 * including the (0,0,0) term. Several sources add with a polarity p and a delay tau each:
 * p e^{-j omega tau} (time convention e^{+j omega t}).
 */
import type { ModeSet } from "./mode-set";
import type { Point3, RectRoom, SoundSource } from "./types";

/** Damping constant delta = 3 ln 10 / T60, 1/s (60 dB energy decay in T60: e^{-2 delta T} = 10^-6). */
export const dampingConstant = (rt60Seconds: number): number => (3 * Math.LN10) / rt60Seconds;

/** psi_n at a point for every mode of the set (CONTRACTS.md mode shape). */
export function modeShapes(room: RectRoom, set: ModeSet, p: Point3): Float64Array {
  const out = new Float64Array(set.count);
  const kx = (Math.PI * p[0]) / room.lengthM, ky = (Math.PI * p[1]) / room.widthM, kz = (Math.PI * p[2]) / room.heightM;
  for (let i = 0; i < set.count; i++) out[i] = Math.cos(set.nx[i]! * kx) * Math.cos(set.ny[i]! * ky) * Math.cos(set.nz[i]! * kz);
  return out;
}

/** 1 / Lambda_n for every mode: Lambda_n = e(nx) e(ny) e(nz), e(0) = 1, e(k > 0) = 1/2 (CONTRACTS.md). */
export function inverseNorms(set: ModeSet): Float64Array {
  const out = new Float64Array(set.count);
  for (let i = 0; i < set.count; i++) out[i] = (set.nx[i]! ? 2 : 1) * (set.ny[i]! ? 2 : 1) * (set.nz[i]! ? 2 : 1);
  return out;
}

/** Per source and frequency the complex gain p e^{-j omega tau}; layout [s * nf + f]. */
export function sourceGains(sources: SoundSource[], omega: Float64Array): { re: Float64Array; im: Float64Array } {
  const nf = omega.length;
  const re = new Float64Array(sources.length * nf), im = new Float64Array(sources.length * nf);
  sources.forEach((s, k) => {
    const p = s.polarity ?? 1, tau = (s.delayMs ?? 0) / 1000;
    for (let f = 0; f < nf; f++) {
      // e^{-j omega tau} for a delay tau under the e^{+j omega t} convention
      re[k * nf + f] = p * Math.cos(omega[f]! * tau);
      im[k * nf + f] = -p * Math.sin(omega[f]! * tau);
    }
  });
  return { re, im };
}

/** Angular frequencies 2 pi f, rad/s. */
export function angular(frequenciesHz: ArrayLike<number>): Float64Array {
  const w = new Float64Array(frequenciesHz.length);
  for (let i = 0; i < w.length; i++) w[i] = 2 * Math.PI * frequenciesHz[i]!;
  return w;
}

/** Power |H|^2 below which a level is reported as LEVEL_FLOOR_DB (|H| = 1e-15). */
export const POWER_FLOOR = 1e-30;

/** 20 log10 |H| from |H|^2, floored at LEVEL_FLOOR_DB = -300 dB. */
export const levelDb = (power: number): number => 10 * Math.log10(power > POWER_FLOOR ? power : POWER_FLOOR);
