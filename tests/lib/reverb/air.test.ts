import { describe, expect, it } from "vitest";
import { airAttenuationDbPerM, airDensity, exactMidBandHz, intensityAttenuationPerM, speedOfSound } from "@/lib/reverb";

describe("airAttenuationDbPerM — ISO 9613-1:1993 Table 1 (20 °C, 50 % RH, 101.325 kPa)", () => {
  // Table 1 values in dB/km at exact mid-band frequencies (REFERENCES.md [pub]). The table is printed to
  // three significant figures, so we compare within 1 % (rounding of the table plus margin); the
  // standard's own stated accuracy of the formula is ±10 %, which this is well inside.
  const table: [number, number][] = [
    [125, 0.445], [250, 1.32], [500, 2.73], [1000, 4.66], [2000, 9.86], [4000, 29.4], [8000, 104],
  ];
  for (const [nominal, dbPerKm] of table) {
    it(`${nominal} Hz (exact ${exactMidBandHz(nominal, 1).toFixed(1)} Hz): ${dbPerKm} dB/km within 1 %`, () => {
      const a = airAttenuationDbPerM(exactMidBandHz(nominal, 1), { temperatureC: 20, relativeHumidityPct: 50 }) * 1000;
      expect(Math.abs(a / dbPerKm - 1)).toBeLessThan(0.01);
    });
  }
  it("rises with frequency and is finite at 0 % RH and at the range ends", () => {
    for (const [t, rh] of [[-20, 0], [50, 100], [20, 0]] as const) {
      const lo = airAttenuationDbPerM(100, { temperatureC: t, relativeHumidityPct: rh });
      const hi = airAttenuationDbPerM(10_000, { temperatureC: t, relativeHumidityPct: rh });
      expect(Number.isFinite(lo) && Number.isFinite(hi)).toBe(true);
      expect(hi).toBeGreaterThan(lo);
    }
  });
  it("dry air at 20 °C absorbs more at 4 kHz than air at 50 % RH (oxygen relaxation moves up with humidity; ISO 9613-1 Table 1 trend)", () => {
    const dry = airAttenuationDbPerM(4000, { temperatureC: 20, relativeHumidityPct: 10 });
    const wet = airAttenuationDbPerM(4000, { temperatureC: 20, relativeHumidityPct: 50 });
    expect(dry).toBeGreaterThan(wet);
  });
  it("rejects temperature 60 °C, humidity 120 % and NaN frequency with RangeErrors naming the field", () => {
    expect(() => airAttenuationDbPerM(1000, { temperatureC: 60, relativeHumidityPct: 50 })).toThrow(/temperatureC/);
    expect(() => airAttenuationDbPerM(1000, { temperatureC: 20, relativeHumidityPct: 120 })).toThrow(/relativeHumidityPct/);
    expect(() => airAttenuationDbPerM(Number.NaN, { temperatureC: 20, relativeHumidityPct: 50 })).toThrow(/frequencyHz/);
  });
});

describe("intensityAttenuationPerM", () => {
  it("m = a/(10 lg e): 4.343 dB/m ↔ 1 /m (CONTRACTS.md)", () => {
    expect(intensityAttenuationPerM(10 * Math.LOG10E)).toBeCloseTo(1, 12);
  });
});

describe("speedOfSound and airDensity (REFERENCES.md: c = 331.3√(1 + ϑ/273.15), ρ₀ = p/(287.05 T))", () => {
  it("c(20 °C) = 343.2 m/s (±0.05) and c(0 °C) = 331.3 m/s", () => {
    expect(Math.abs(speedOfSound(20) - 343.2)).toBeLessThan(0.05);
    expect(speedOfSound(0)).toBeCloseTo(331.3, 12);
  });
  it("ρ₀(20 °C, 101.325 kPa) = 1.204 kg/m³ (±0.0005)", () => {
    expect(Math.abs(airDensity(20) - 1.204)).toBeLessThan(0.0005);
  });
  it("rejects −30 °C with a RangeError", () => {
    expect(() => speedOfSound(-30)).toThrow(RangeError);
  });
});

describe("exactMidBandHz — IEC 61260-1:2014 (REFERENCES.md octave centres)", () => {
  it("octave centres 63.096, 125.893, 251.189, 501.187, 1000, 1995.262, 3981.072, 7943.282 Hz (±0.001)", () => {
    const expected = [63.096, 125.893, 251.189, 501.187, 1000, 1995.262, 3981.072, 7943.282];
    [63, 125, 250, 500, 1000, 2000, 4000, 8000].forEach((f, i) => expect(Math.abs(exactMidBandHz(f, 1) - expected[i]!)).toBeLessThan(0.001));
  });
  it("one-third-octave 200 Hz → 199.526, 5000 Hz → 5011.872 (±0.001)", () => {
    expect(Math.abs(exactMidBandHz(200, 3) - 199.526)).toBeLessThan(0.001);
    expect(Math.abs(exactMidBandHz(5000, 3) - 5011.872)).toBeLessThan(0.001);
  });
});
