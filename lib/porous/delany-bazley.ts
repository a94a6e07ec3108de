import type { AirProperties, PorousProperties } from "./types";

/**
 * Delany–Bazley coefficients in the dimensionless X = ρ₀f/σ form: each term is c·X^(−e).
 * Source: Delany & Bazley (1970), Applied Acoustics 3:105–116; X form per Allard & Champoux (1992),
 * JASA 91:3346.
 * @example DELANY_BAZLEY_COEFFICIENTS.impedanceReal // { c: 0.0571, e: 0.754 }
 */
export const DELANY_BAZLEY_COEFFICIENTS = Object.freeze({
  impedanceReal: Object.freeze({ c: 0.0571, e: 0.754 }),
  impedanceImag: Object.freeze({ c: 0.087, e: 0.732 }),
  wavenumberReal: Object.freeze({ c: 0.0978, e: 0.7 }),
  wavenumberImag: Object.freeze({ c: 0.189, e: 0.595 }),
});

/**
 * The fitted range of the Delany–Bazley model, 0.01 ≤ ρ₀f/σ ≤ 1.0 (Delany & Bazley 1970).
 * @example DELANY_BAZLEY_RANGE.max // 1
 */
export const DELANY_BAZLEY_RANGE = Object.freeze({ min: 0.01, max: 1 });

/**
 * The Delany–Bazley parameter X = ρ₀f/σ (dimensionless).
 * @param frequencyHz f in Hz; @param flowResistivity σ in Pa·s/m²; @param densityKgM3 ρ₀ in kg/m³
 * @example delanyBazleyParameter(1000, 12_040, 1.204) // 0.1
 */
export function delanyBazleyParameter(frequencyHz: number, flowResistivity: number, densityKgM3: number): number {
  return (densityKgM3 * frequencyHz) / flowResistivity;
}

/**
 * Characteristic impedance Zc (Pa·s/m) and wavenumber kc (1/m) of a fibrous material after
 * Delany & Bazley, sign convention e^{+jωt} (negative imaginary parts).
 * Arguments are not checked here (hot path): use {@link absorptionSpectrum} for checked input.
 * @param frequencyHz f in Hz; @param flowResistivity σ in Pa·s/m²; @param air ρ₀ (kg/m³) and c (m/s)
 * @example delanyBazley(500, 10_000, { densityKgM3: 1.204, speedOfSound: 343 }).zc // ≈ { re: 609.2, im: -281.0 }
 */
export function delanyBazley(frequencyHz: number, flowResistivity: number, air: AirProperties): PorousProperties {
  const rho0c = air.densityKgM3 * air.speedOfSound;
  const k0 = (2 * Math.PI * frequencyHz) / air.speedOfSound;
  const X = delanyBazleyParameter(frequencyHz, flowResistivity, air.densityKgM3);
  const C = DELANY_BAZLEY_COEFFICIENTS;
  return {
    // Zc = ρ₀c(1 + 0.0571 X^−0.754 − j0.087 X^−0.732) — Delany & Bazley (1970), X form
    zc: { re: rho0c * (1 + C.impedanceReal.c * X ** -C.impedanceReal.e), im: -rho0c * C.impedanceImag.c * X ** -C.impedanceImag.e },
    // kc = (ω/c)(1 + 0.0978 X^−0.700 − j0.189 X^−0.595) — Delany & Bazley (1970), X form
    kc: { re: k0 * (1 + C.wavenumberReal.c * X ** -C.wavenumberReal.e), im: -k0 * C.wavenumberImag.c * X ** -C.wavenumberImag.e },
  };
}
