import { describe, expect, it } from "vitest";
import {
  DELANY_BAZLEY_COEFFICIENTS,
  MIKI_COEFFICIENTS,
  delanyBazley,
  miki,
} from "@/lib/porous";

describe("DELANY_BAZLEY_COEFFICIENTS — as published", () => {
  it("holds 0.0571/0.754, 0.087/0.732, 0.0978/0.700, 0.189/0.595 (Delany & Bazley 1970, Appl. Acoust. 3:105, X form per Allard & Champoux 1992)", () => {
    expect(DELANY_BAZLEY_COEFFICIENTS).toEqual({
      impedanceReal: { c: 0.0571, e: 0.754 },
      impedanceImag: { c: 0.087, e: 0.732 },
      wavenumberReal: { c: 0.0978, e: 0.7 },
      wavenumberImag: { c: 0.189, e: 0.595 },
    });
  });
});

describe("MIKI_COEFFICIENTS — as published", () => {
  it("holds 0.0699/0.107 at exponent 0.632 and 0.109/0.160 at exponent 0.618 (Miki 1990, J. Acoust. Soc. Jpn (E) 11:19)", () => {
    expect(MIKI_COEFFICIENTS).toEqual({
      impedanceReal: { c: 0.0699, e: 0.632 },
      impedanceImag: { c: 0.107, e: 0.632 },
      wavenumberReal: { c: 0.109, e: 0.618 },
      wavenumberImag: { c: 0.16, e: 0.618 },
    });
  });
});

describe("delanyBazley(frequencyHz, flowResistivity, air)", () => {
  const air = { densityKgM3: 1.204, speedOfSound: 343 };
  it("Zc → rho0 c and kc → omega/c at high rho0 f / sigma (Delany & Bazley 1970: the fit tends to air) — within 0.5 % at X = 1000", () => {
    const f = 10_000;
    const sigma = (air.densityKgM3 * f) / 1000;
    const { zc, kc } = delanyBazley(f, sigma, air);
    const rho0c = air.densityKgM3 * air.speedOfSound;
    expect(Math.abs(zc.re / rho0c - 1)).toBeLessThan(0.005);
    expect(Math.abs(zc.im / rho0c)).toBeLessThan(0.005);
    const k0 = (2 * Math.PI * f) / air.speedOfSound;
    expect(Math.abs(kc.re / k0 - 1)).toBeLessThan(0.005);
    expect(Math.abs(kc.im / k0)).toBeLessThan(0.005);
  });
  it("has negative imaginary parts for Zc and kc (e^{+jωt} convention, CONTRACTS.md)", () => {
    const { zc, kc } = delanyBazley(500, 10_000, air);
    expect(zc.im).toBeLessThan(0);
    expect(kc.im).toBeLessThan(0);
  });
  it("at X = 1 equals rho0 c (1.0571 − 0.087j) exactly (formula evaluated by hand)", () => {
    const f = 1000;
    const sigma = air.densityKgM3 * f;
    const { zc, kc } = delanyBazley(f, sigma, air);
    const rho0c = air.densityKgM3 * air.speedOfSound;
    expect(zc.re).toBeCloseTo(rho0c * 1.0571, 9);
    expect(zc.im).toBeCloseTo(-rho0c * 0.087, 9);
    const k0 = (2 * Math.PI * f) / air.speedOfSound;
    expect(kc.re).toBeCloseTo(k0 * 1.0978, 9);
    expect(kc.im).toBeCloseTo(-k0 * 0.189, 9);
  });
});

describe("miki(frequencyHz, flowResistivity, air)", () => {
  const air = { densityKgM3: 1.204, speedOfSound: 343 };
  it("at f/sigma = 1 equals rho0 c (1.0699 − 0.107j) and k0 (1.109 − 0.160j) (Miki 1990, evaluated by hand)", () => {
    const { zc, kc } = miki(2000, 2000, air);
    const rho0c = air.densityKgM3 * air.speedOfSound;
    const k0 = (2 * Math.PI * 2000) / air.speedOfSound;
    expect(zc.re).toBeCloseTo(rho0c * 1.0699, 9);
    expect(zc.im).toBeCloseTo(-rho0c * 0.107, 9);
    expect(kc.re).toBeCloseTo(k0 * 1.109, 9);
    expect(kc.im).toBeCloseTo(-k0 * 0.16, 9);
  });
  it("Zc → rho0 c at high f/sigma (within 0.5 % at f/sigma = 1000)", () => {
    const { zc } = miki(10_000, 10, air);
    expect(Math.abs(zc.re / (air.densityKgM3 * air.speedOfSound) - 1)).toBeLessThan(0.005);
  });
  it("Miki's real part of Zc stays above rho0 c and Re(kc) above k0 at low f/sigma, where DB's wavenumber fit is known to misbehave (Miki 1990)", () => {
    const { zc, kc } = miki(20, 50_000, air);
    expect(zc.re).toBeGreaterThan(air.densityKgM3 * air.speedOfSound);
    expect(kc.re).toBeGreaterThan((2 * Math.PI * 20) / air.speedOfSound);
  });
});
