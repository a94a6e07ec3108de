import { describe, expect, it } from "vitest";
import { resistivityFromFibres, sheetFlowResistance } from "@/lib/porous";

describe("resistivityFromFibres(bulkDensityKgM3, fibreDiameterM) — Bies & Hansen (1980) [from memory, moderate]", () => {
  it("evaluates 3.18e-9 ρ^1.53 / d² (by hand: ρ = 32, d = 7 µm → 13 035 Pa·s/m², ±1)", () => {
    expect(Math.abs(resistivityFromFibres(32, 7e-6) - (3.18e-9 * 32 ** 1.53) / 49e-12)).toBeLessThan(1e-6);
    expect(Math.abs(resistivityFromFibres(32, 7e-6) - 13_035)).toBeLessThan(1);
  });
  it("scales as ρ^1.53 and 1/d² (doubling ρ multiplies σ by 2^1.53 = 2.888)", () => {
    expect(resistivityFromFibres(64, 7e-6) / resistivityFromFibres(32, 7e-6)).toBeCloseTo(2 ** 1.53, 12);
    expect(resistivityFromFibres(32, 14e-6) / resistivityFromFibres(32, 7e-6)).toBeCloseTo(0.25, 12);
  });
  it("gives the order of magnitude typical of 16–48 kg/m³ glass-fibre blankets, 3–40 kPa·s/m² (from memory)", () => {
    for (const rho of [16, 24, 32, 48]) {
      const s = resistivityFromFibres(rho, 7e-6);
      expect(s).toBeGreaterThan(3000);
      expect(s).toBeLessThan(40_000);
    }
  });
  it("rejects NaN, zero and out-of-range arguments with RangeErrors naming the field", () => {
    expect(() => resistivityFromFibres(Number.NaN, 7e-6)).toThrow(/bulkDensityKgM3/);
    expect(() => resistivityFromFibres(32, 0)).toThrow(/fibreDiameterM/);
    expect(() => resistivityFromFibres(32, 1e-3)).toThrow(RangeError);
  });
});

describe("sheetFlowResistance(flowResistivity, thicknessM)", () => {
  it("is σ·t (ISO 9053 definition): 200 000 Pa·s/m² × 1 mm = 200 Pa·s/m", () => {
    expect(sheetFlowResistance(200_000, 0.001)).toBeCloseTo(200, 10);
  });
});
