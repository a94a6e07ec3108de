import { DELANY_BAZLEY_RANGE, delanyBazley, delanyBazleyParameter } from "./delany-bazley";
import { MIKI_RANGE, miki } from "./miki";
import type { AirProperties, Layer } from "./types";

const STRIDE = 6; // kind, d (or R), Re(Zc·kc), Im(Zc·kc), Re(kc²), Im(kc²)
const KIND_MEDIUM = 0;
const KIND_SHEET = 1;

/**
 * A layer stack reduced to numbers at one frequency, so the angle loop does no allocation and no
 * powers. Build it with {@link createStackBuffer} and fill it with {@link prepareStack}.
 */
export interface PreparedStack {
  data: Float64Array;
  count: number;
  /** free-air wavenumber k₀ = ω/c, 1/m */
  k0: number;
  /** ρ₀c, Pa·s/m */
  rho0c: number;
  /** every porous layer inside its model's fitted range at this frequency */
  withinModelRange: boolean;
}

/**
 * Allocates a reusable buffer for a stack of `layerCount` layers.
 * @example const buf = createStackBuffer(3)
 */
export function createStackBuffer(layerCount: number): PreparedStack {
  return { data: new Float64Array(layerCount * STRIDE), count: layerCount, k0: 0, rho0c: 0, withinModelRange: true };
}

/**
 * Fills `out` with the per-layer constants of `layers` at `frequencyHz` (unchecked: the caller has
 * validated the stack). Air layers: Zc = ρ₀c, kc = k₀ (CONTRACTS.md).
 * @example prepareStack(layers, 500, { densityKgM3: 1.204, speedOfSound: 343 }, createStackBuffer(layers.length))
 */
export function prepareStack(layers: readonly Layer[], frequencyHz: number, air: AirProperties, out: PreparedStack): PreparedStack {
  const k0 = (2 * Math.PI * frequencyHz) / air.speedOfSound;
  const rho0c = air.densityKgM3 * air.speedOfSound;
  const d = out.data;
  let inRange = true;
  for (let i = 0; i < layers.length; i++) {
    const layer = layers[i]!;
    const o = i * STRIDE;
    if (layer.kind === "resistive-sheet") {
      d[o] = KIND_SHEET;
      d[o + 1] = layer.flowResistance;
      continue;
    }
    d[o] = KIND_MEDIUM;
    d[o + 1] = layer.thicknessM;
    let zcRe = rho0c;
    let zcIm = 0;
    let kcRe = k0;
    let kcIm = 0;
    if (layer.kind === "porous") {
      let p;
      if (layer.model === "delany-bazley") {
        p = delanyBazley(frequencyHz, layer.flowResistivity, air);
        const x = delanyBazleyParameter(frequencyHz, layer.flowResistivity, air.densityKgM3);
        if (x < DELANY_BAZLEY_RANGE.min || x > DELANY_BAZLEY_RANGE.max) inRange = false;
      } else {
        p = miki(frequencyHz, layer.flowResistivity, air);
        const y = frequencyHz / layer.flowResistivity;
        if (y < MIKI_RANGE.min || y > MIKI_RANGE.max) inRange = false;
      }
      zcRe = p.zc.re;
      zcIm = p.zc.im;
      kcRe = p.kc.re;
      kcIm = p.kc.im;
    }
    d[o + 2] = zcRe * kcRe - zcIm * kcIm;
    d[o + 3] = zcRe * kcIm + zcIm * kcRe;
    d[o + 4] = kcRe * kcRe - kcIm * kcIm;
    d[o + 5] = 2 * kcRe * kcIm;
  }
  out.count = layers.length;
  out.k0 = k0;
  out.rho0c = rho0c;
  out.withinModelRange = inRange;
  return out;
}

/** Scratch output of {@link surfaceImpedanceInto}. */
export interface ComplexOut {
  re: number;
  im: number;
}

/**
 * Surface impedance Z (Pa·s/m, normal direction) at the front of a prepared stack on a rigid wall,
 * for a plane wave at angle θ given by sin θ; written into `out` (no allocation).
 * Extended reaction: kx = k₀ sin θ, kz = √(kc² − kx²) with Im kz ≤ 0, Zn = Zc·kc/kz
 * (Allard & Atalla 2009, ch. 3 & 11 [from memory, high]; CONTRACTS.md).
 * cot(kz d) enters as −j cot z = (1 + E)/(1 − E), E = e^{−2jz}, |E| ≤ 1: it never overflows.
 *   rigid backing  Z = −j Zn cot(kz d)                          = Zn (1 + E)/(1 − E)
 *   over Zb        Z = Zn(−j Zb cot + Zn)/(Zb − j Zn cot)       = Zn (Zb(1+E) + Zn(1−E)) / (Zb(1−E) + Zn(1+E))
 *   sheet          Z = R + Zb
 * @example surfaceImpedanceInto(prepared, 0, { re: 0, im: 0 }) // normal incidence
 */
export function surfaceImpedanceInto(s: PreparedStack, sinTheta: number, out: ComplexOut): ComplexOut {
  const d = s.data;
  const kx = s.k0 * sinTheta;
  const kx2 = kx * kx;
  let zRe = 0;
  let zIm = 0;
  let rigid = true;
  for (let i = s.count - 1; i >= 0; i--) {
    const o = i * STRIDE;
    if (d[o] === KIND_SHEET) {
      zRe += d[o + 1]!; // resistive sheet in series — CONTRACTS.md, Z = R + Zb
      continue;
    }
    const thickness = d[o + 1]!;
    // kz = √(kc² − kx²), principal root then flipped so that Im kz ≤ 0
    const qRe = d[o + 4]! - kx2;
    const qIm = d[o + 5]!;
    const r = Math.hypot(qRe, qIm);
    let kzRe = Math.sqrt(Math.max(0, (r + qRe) / 2));
    let kzIm = Math.sqrt(Math.max(0, (r - qRe) / 2));
    if (qIm < 0) kzIm = -kzIm;
    if (kzIm > 0) {
      kzRe = -kzRe;
      kzIm = -kzIm;
    }
    // Zn = Zc·kc / kz
    const den = kzRe * kzRe + kzIm * kzIm;
    const znRe = (d[o + 2]! * kzRe + d[o + 3]! * kzIm) / den;
    const znIm = (d[o + 3]! * kzRe - d[o + 2]! * kzIm) / den;
    // E = e^{−2j kz d} = e^{2 Im(kz) d} (cos 2Re(kz)d − j sin 2Re(kz)d)
    const mag = Math.exp(2 * kzIm * thickness);
    const ph = 2 * kzRe * thickness;
    const eRe = mag * Math.cos(ph);
    const eIm = -mag * Math.sin(ph);
    const pRe = 1 + eRe; // 1 + E
    const pIm = eIm;
    const mRe = 1 - eRe; // 1 − E
    const mIm = -eIm;
    let nRe: number;
    let nIm: number;
    let dRe: number;
    let dIm: number;
    if (rigid) {
      nRe = pRe;
      nIm = pIm;
      dRe = mRe;
      dIm = mIm;
      rigid = false;
    } else {
      // numerator Zb(1+E) + Zn(1−E), denominator Zb(1−E) + Zn(1+E)
      nRe = zRe * pRe - zIm * pIm + znRe * mRe - znIm * mIm;
      nIm = zRe * pIm + zIm * pRe + znRe * mIm + znIm * mRe;
      dRe = zRe * mRe - zIm * mIm + znRe * pRe - znIm * pIm;
      dIm = zRe * mIm + zIm * mRe + znRe * pIm + znIm * pRe;
    }
    const dd = dRe * dRe + dIm * dIm;
    const qqRe = (nRe * dRe + nIm * dIm) / dd;
    const qqIm = (nIm * dRe - nRe * dIm) / dd;
    zRe = znRe * qqRe - znIm * qqIm;
    zIm = znRe * qqIm + znIm * qqRe;
  }
  out.re = zRe;
  out.im = zIm;
  return out;
}

/**
 * α = 1 − |R|², R = (Z cos θ − ρ₀c)/(Z cos θ + ρ₀c) (CONTRACTS.md; plane-wave reflection), not clamped.
 * @example alphaFromImpedance(415, 0, 1, 415) // 1
 */
export function alphaFromImpedance(zRe: number, zIm: number, cosTheta: number, rho0c: number): number {
  const aRe = zRe * cosTheta;
  const aIm = zIm * cosTheta;
  const nRe = aRe - rho0c;
  const dRe = aRe + rho0c;
  return 1 - (nRe * nRe + aIm * aIm) / (dRe * dRe + aIm * aIm);
}
