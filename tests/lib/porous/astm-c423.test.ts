import { describe, expect, it } from "vitest";
import { astmC423Ratings, noiseReductionCoefficient, soundAbsorptionAverage } from "@/lib/porous";

describe("noiseReductionCoefficient — ASTM C423: mean of α at 250/500/1000/2000 Hz to the nearest 0.05", () => {
  it("[0.30, 0.62, 0.90, 0.98] → 0.70 (mean 0.70)", () => {
    expect(noiseReductionCoefficient([0.3, 0.62, 0.9, 0.98])).toBe(0.7);
  });
  it("[0.12, 0.38, 0.80, 0.95] → 0.55 (mean 0.5625)", () => {
    expect(noiseReductionCoefficient([0.12, 0.38, 0.8, 0.95])).toBe(0.55);
  });
  it("[0.21, 0.44, 0.73, 0.86] → 0.55 (mean 0.56)", () => {
    expect(noiseReductionCoefficient([0.21, 0.44, 0.73, 0.86])).toBe(0.55);
  });
  it("a mean of exactly 0.625 rounds up to 0.65 (halves up — from memory: C423 says 'nearest multiple of 0.05')", () => {
    expect(noiseReductionCoefficient([0.6, 0.65, 0.6, 0.65])).toBe(0.65);
  });
  it("rejects a wrong length with a RangeError", () => {
    expect(() => noiseReductionCoefficient([0.5, 0.5, 0.5])).toThrow(RangeError);
  });
});

describe("soundAbsorptionAverage — ASTM C423: mean of the 12 one-third-octave bands 200…2500 Hz to the nearest 0.01", () => {
  it("0.10, 0.20, … 1.20 → mean 0.65", () => {
    expect(soundAbsorptionAverage(Array.from({ length: 12 }, (_, i) => (i + 1) / 10))).toBe(0.65);
  });
  it("twelve values of 0.333 → 0.33; twelve of 0.336 → 0.34", () => {
    expect(soundAbsorptionAverage(new Array(12).fill(0.333))).toBe(0.33);
    expect(soundAbsorptionAverage(new Array(12).fill(0.336))).toBe(0.34);
  });
});

describe("astmC423Ratings(thirdOctaveAlpha 200…5000)", () => {
  it("picks 250/500/1000/2000 (indices 1, 4, 7, 10) for NRC and the first 12 bands for SAA", () => {
    const a = Array.from({ length: 15 }, (_, i) => i / 20); // 0.00 … 0.70
    const r = astmC423Ratings(a);
    expect(r.nrc).toBe(noiseReductionCoefficient([a[1]!, a[4]!, a[7]!, a[10]!]));
    expect(r.nrc).toBe(0.3); // (0.05 + 0.20 + 0.35 + 0.50)/4 = 0.275 → 0.30 (halves up)
    expect(r.saa).toBe(0.28); // mean of 0.00 … 0.55 = 0.275 → 0.28
  });
});
