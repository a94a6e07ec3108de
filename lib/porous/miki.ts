import type { AirProperties, PorousProperties } from "./types";

/**
 * Miki coefficients with Y = f/σ: each term is c·Y^(−e).
 * Source: Miki (1990), J. Acoust. Soc. Jpn (E) 11(1):19–24 (converted to f/σ in SI).
 * @example MIKI_COEFFICIENTS.wavenumberImag // { c: 0.16, e: 0.618 }
 */
export const MIKI_COEFFICIENTS = Object.freeze({
  impedanceReal: Object.freeze({ c: 0.0699, e: 0.632 }),
  impedanceImag: Object.freeze({ c: 0.107, e: 0.632 }),
  wavenumberReal: Object.freeze({ c: 0.109, e: 0.618 }),
  wavenumberImag: Object.freeze({ c: 0.16, e: 0.618 }),
});

/**
 * The range Miki states for his fit, 0.01 ≤ f/σ ≤ 1.0 (Miki 1990, as published; f in Hz, σ in Pa·s/m²).
 * @example MIKI_RANGE.min // 0.01
 */
export const MIKI_RANGE = Object.freeze({ min: 0.01, max: 1 });

/**
 * Characteristic impedance Zc (Pa·s/m) and wavenumber kc (1/m) after Miki, e^{+jωt} convention.
 * Arguments are not checked here (hot path).
 * @param frequencyHz f in Hz; @param flowResistivity σ in Pa·s/m²; @param air ρ₀ (kg/m³), c (m/s)
 * @example miki(2000, 2000, { densityKgM3: 1.204, speedOfSound: 343 }).zc // { re: 441.84, im: -44.19 }
 */
export function miki(frequencyHz: number, flowResistivity: number, air: AirProperties): PorousProperties {
  const rho0c = air.densityKgM3 * air.speedOfSound;
  const k0 = (2 * Math.PI * frequencyHz) / air.speedOfSound;
  const Y = frequencyHz / flowResistivity;
  const C = MIKI_COEFFICIENTS;
  const yz = Y ** -C.impedanceReal.e;
  const yk = Y ** -C.wavenumberReal.e;
  return {
    // Zc = ρ₀c(1 + 0.0699 Y^−0.632 − j0.107 Y^−0.632) — Miki (1990) eq. for Zc
    zc: { re: rho0c * (1 + C.impedanceReal.c * yz), im: -rho0c * C.impedanceImag.c * yz },
    // kc = (ω/c)(1 + 0.109 Y^−0.618 − j0.160 Y^−0.618) — Miki (1990) eq. for k
    kc: { re: k0 * (1 + C.wavenumberReal.c * yk), im: -k0 * C.wavenumberImag.c * yk },
  };
}
