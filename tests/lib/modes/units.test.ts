import { describe, expect, it } from "vitest";
import { feetInchesToMetres, formatFeetInches, formatLength, metresToFeetInches, speedOfSoundFromTemperature } from "../../../lib/modes/index";

describe("speedOfSoundFromTemperature(temperatureC) — c = 331.3 sqrt(1 + T/273.15) m/s (REFERENCES.md)", () => {
  it("gives 343.2 m/s at 20 C and 331.3 m/s at 0 C", () => {
    expect(speedOfSoundFromTemperature(20)).toBeCloseTo(343.2, 1);
    expect(speedOfSoundFromTemperature(0)).toBe(331.3);
    expect(speedOfSoundFromTemperature(-20)).toBeCloseTo(331.3 * Math.sqrt(1 - 20 / 273.15), 12);
  });
  it("throws a RangeError naming temperatureC outside -50 ... 60 C or when not finite", () => {
    expect(() => speedOfSoundFromTemperature(-300)).toThrow(/temperatureC/);
    expect(() => speedOfSoundFromTemperature(Number.NaN)).toThrow(RangeError);
  });
});

describe("feetInchesToMetres(feet, inches) / metresToFeetInches(m) — 1 ft = 0.3048 m, 1 in = 0.0254 m exactly (international yard and pound, 1959)", () => {
  it("converts 12 ft 6 in (12.5 ft) to 3.81 m and back", () => {
    expect(feetInchesToMetres(12, 6)).toBeCloseTo(3.81, 12);
    expect(feetInchesToMetres(12.5)).toBeCloseTo(3.81, 12);
    const fi = metresToFeetInches(3.81);
    expect(fi.feet).toBe(12);
    expect(fi.inches).toBeCloseTo(6, 10);
  });
  it("throws a RangeError for negative or non-finite lengths", () => {
    expect(() => feetInchesToMetres(-1)).toThrow(/feet/);
    expect(() => feetInchesToMetres(1, Number.NaN)).toThrow(/inches/);
    expect(() => metresToFeetInches(Number.POSITIVE_INFINITY)).toThrow(RangeError);
  });
});

describe("formatFeetInches(m, { inchDecimals }) / formatLength(m, system)", () => {
  it("writes 3.81 m as 12 ft 6 in and 2.4 m as 7 ft 10.5 in (2.4/0.0254 = 94.49 in, by hand)", () => {
    expect(formatFeetInches(3.81)).toBe("12 ft 6.0 in");
    expect(formatFeetInches(2.4)).toBe("7 ft 10.5 in");
    expect(formatFeetInches(2.4, { inchDecimals: 0 })).toBe("7 ft 10 in");
  });
  it("carries a rounded 12 in into the next foot (0.3047 m = 11.996 in -> 1 ft 0.0 in)", () => {
    expect(formatFeetInches(0.3047)).toBe("1 ft 0.0 in");
  });
  it("formats metric lengths in metres with two decimals", () => {
    expect(formatLength(3.81, "metric")).toBe("3.81 m");
    expect(formatLength(3.81, "imperial")).toBe("12 ft 6.0 in");
  });
});
