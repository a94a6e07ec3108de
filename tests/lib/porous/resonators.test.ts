import { describe, expect, it } from "vitest";
import {
  helmholtzResonanceHz,
  membraneAbsorberEstimate,
  membraneResonanceHz,
  perforatedPanelAbsorberEstimate,
  perforatedPanelResonanceHz,
  resonatorAbsorptionEstimate,
} from "@/lib/porous";

const AIR20 = { densityKgM3: 1.204, speedOfSound: 343.2 }; // REFERENCES.md: air at 20 °C

describe("membraneResonanceHz — Everest & Pohlmann, Master Handbook of Acoustics: f ≈ 60/√(m·d)", () => {
  it("m = 10 kg/m², d = 0.1 m → 60 Hz; m = 5, d = 0.05 → 120 Hz (by hand)", () => {
    expect(membraneResonanceHz({ massKgM2: 10, cavityDepthM: 0.1 })).toBeCloseTo(60, 12);
    expect(membraneResonanceHz({ massKgM2: 5, cavityDepthM: 0.05 })).toBeCloseTo(120, 12);
  });
  it("the handbook constant 60 equals (c/2π)√ρ₀ at 20 °C within 0.5 % (REFERENCES.md: Panel absorber)", () => {
    expect(Math.abs((AIR20.speedOfSound / (2 * Math.PI)) * Math.sqrt(AIR20.densityKgM3) - 60) / 60).toBeLessThan(0.005);
  });
  it("rejects a zero or NaN mass/depth with a RangeError naming the field", () => {
    expect(() => membraneResonanceHz({ massKgM2: 0, cavityDepthM: 0.1 })).toThrow(/massKgM2/);
    expect(() => membraneResonanceHz({ massKgM2: 10, cavityDepthM: Number.NaN })).toThrow(/cavityDepthM/);
  });
});

describe("helmholtzResonanceHz — f = (c/2π)√(S/(l′V)), l′ = l + 1.7a (Kinsler et al. [from memory, high])", () => {
  it("S = π·(5 mm)², l = 20 mm, V = 1 L, c = 343 → 90.6 Hz (±0.1, by hand: l′ = 28.5 mm)", () => {
    const f = helmholtzResonanceHz({ neckAreaM2: Math.PI * 0.005 ** 2, neckLengthM: 0.02, volumeM3: 0.001 });
    const expected = (343 / (2 * Math.PI)) * Math.sqrt((Math.PI * 0.005 ** 2) / (0.0285 * 0.001));
    expect(f).toBeCloseTo(expected, 9);
    expect(Math.abs(f - 90.6)).toBeLessThan(0.1);
  });
  it("a perforated panel equals one Helmholtz cell per hole (cell volume = hole area/ε · D) when 1.7a = 0.8d… to within 6 % (the two end corrections differ: 0.85 vs 0.8 per diameter)", () => {
    const eps = 0.05;
    const dHole = 0.008;
    const S = Math.PI * (dHole / 2) ** 2;
    const cell = helmholtzResonanceHz({ neckAreaM2: S, neckLengthM: 0.006, volumeM3: (S / eps) * 0.1 });
    const panel = perforatedPanelResonanceHz({ openAreaRatio: eps, plateThicknessM: 0.006, holeDiameterM: dHole, cavityDepthM: 0.1 });
    expect(Math.abs(cell / panel - 1)).toBeLessThan(0.06);
  });
});

describe("perforatedPanelResonanceHz — Everest & Pohlmann: f = (c/2π)√(ε/(t′D)), t′ = t + 0.8d", () => {
  it("ε 5 %, t 6 mm, d 8 mm, D 100 mm, c 343 → 346.7 Hz (±0.5, by hand)", () => {
    const f = perforatedPanelResonanceHz({ openAreaRatio: 0.05, plateThicknessM: 0.006, holeDiameterM: 0.008, cavityDepthM: 0.1 });
    expect(Math.abs(f - 346.7)).toBeLessThan(0.5);
  });
  it("rises as √ε: four times the open area doubles f₀", () => {
    const base = { plateThicknessM: 0.006, holeDiameterM: 0.008, cavityDepthM: 0.1 };
    const r = perforatedPanelResonanceHz({ ...base, openAreaRatio: 0.2 }) / perforatedPanelResonanceHz({ ...base, openAreaRatio: 0.05 });
    expect(r).toBeCloseTo(2, 12);
  });
});

describe("resonatorAbsorptionEstimate — single-degree-of-freedom absorber (textbook; labelled an estimate)", () => {
  it("is labelled as an estimate and names its method", () => {
    const e = resonatorAbsorptionEstimate({ massPerAreaKgM2: 10, cavityDepthM: 0.1, resistanceRatio: 0.3, frequenciesHz: [60] });
    expect(e.estimate).toBe(true);
    expect(e.method).toMatch(/^estimate:/);
  });
  it("peaks at f₀ with α = 4r′/(1 + r′)² (matched r′ = 1 → 1.0; r′ = 0.25 → 0.64)", () => {
    for (const [r, peak] of [[1, 1], [0.25, 0.64]] as const) {
      const e = resonatorAbsorptionEstimate({ massPerAreaKgM2: 10, cavityDepthM: 0.1, resistanceRatio: r, frequenciesHz: [60] });
      expect(e.peakAlpha).toBeCloseTo(peak, 12);
      const atF0 = resonatorAbsorptionEstimate({ massPerAreaKgM2: 10, cavityDepthM: 0.1, resistanceRatio: r, frequenciesHz: [e.resonanceHz] });
      expect(atF0.points[0]!.alpha).toBeCloseTo(peak, 12);
    }
  });
  it("membrane: lumped f₀ = (c/2π)√(ρ₀/(mD)) agrees with the handbook 60/√(m·d) within 1 % at 20 °C", () => {
    const e = membraneAbsorberEstimate({ massKgM2: 10, cavityDepthM: 0.1, resistanceRatio: 0.2, frequenciesHz: [60] }, AIR20);
    expect(Math.abs(e.resonanceHz / membraneResonanceHz({ massKgM2: 10, cavityDepthM: 0.1 }) - 1)).toBeLessThan(0.01);
  });
  it("perforated: lumped f₀ equals perforatedPanelResonanceHz exactly (same t′ and ε)", () => {
    const geo = { openAreaRatio: 0.05, plateThicknessM: 0.006, holeDiameterM: 0.008, cavityDepthM: 0.1 };
    const e = perforatedPanelAbsorberEstimate({ ...geo, resistanceRatio: 0.5, frequenciesHz: [300] });
    expect(e.resonanceHz).toBeCloseTo(perforatedPanelResonanceHz(geo), 9);
  });
  it("half-power points found numerically lie bandwidthHz = f₀/Q apart (resonance theory; ±0.5 %)", () => {
    const base = { massPerAreaKgM2: 10, cavityDepthM: 0.1, resistanceRatio: 0.3 };
    const e = resonatorAbsorptionEstimate({ ...base, frequenciesHz: [60] });
    const alphaAt = (x: number) => resonatorAbsorptionEstimate({ ...base, frequenciesHz: [x] }).points[0]!.alpha;
    const bisect = (lo: number, hi: number) => {
      // lo and hi straddle the half-power level
      for (let i = 0; i < 60; i++) {
        const mid = (lo + hi) / 2;
        if ((alphaAt(mid) - e.peakAlpha / 2) * (alphaAt(lo) - e.peakAlpha / 2) > 0) lo = mid;
        else hi = mid;
      }
      return (lo + hi) / 2;
    };
    const width = bisect(e.resonanceHz, 200) - bisect(20, e.resonanceHz);
    expect(Math.abs(width / e.bandwidthHz - 1)).toBeLessThan(0.005);
  });
  it("flags a cavity too deep for the lumped model (k₀D ≥ 0.5 at f₀)", () => {
    const shallow = resonatorAbsorptionEstimate({ massPerAreaKgM2: 10, cavityDepthM: 0.1, resistanceRatio: 0.3, frequenciesHz: [60] });
    const deep = resonatorAbsorptionEstimate({ massPerAreaKgM2: 0.2, cavityDepthM: 0.9, resistanceRatio: 0.3, frequenciesHz: [60] });
    expect(shallow.lumpedCavityValid).toBe(true);
    expect(deep.lumpedCavityValid).toBe(false);
  });
});
