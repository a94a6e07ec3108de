import { describe, expect, it } from "vitest";
import { feetInchesToMetres, formatLength, metresToFeetInches } from "@/lib/units/length";

// Source: NIST SP 811 (2008), appendix B: 1 ft = 0.3048 m and 1 in = 0.0254 m exactly.
describe("feetInchesToMetres", () => {
  it("converts 12 ft 6 in to 3.81 m exactly", () => {
    expect(feetInchesToMetres(12, 6)).toBeCloseTo(3.81, 12);
  });
  it("refuses non-finite input (lib/modes validation)", () => {
    expect(() => feetInchesToMetres(Number.NaN, 0)).toThrow(RangeError);
  });
});

describe("metresToFeetInches", () => {
  it("round-trips 19 ft 0.25 in", () => {
    expect(metresToFeetInches(feetInchesToMetres(19, 0.25))).toEqual({ feet: 19, inches: 0.25 });
  });
  it("carries 11.9 in up to the next foot", () => {
    expect(metresToFeetInches(feetInchesToMetres(3, 11.99))).toEqual({ feet: 4, inches: 0 });
  });
});

describe("formatLength", () => {
  it("writes metres with two decimals and feet with primes", () => {
    expect(formatLength(5.8, "metric")).toBe("5.80 m");
    expect(formatLength(3.81, "imperial")).toBe("12′ 6″");
  });
});
