import { describe, expect, it } from "vitest";
import { schroederFrequency, modalBandwidthHz } from "../../../lib/modes/index";

describe("schroederFrequency(rt60Seconds, volumeM3)", () => {
  it("gives 2000 sqrt(0.5 / 100) = 141.42 Hz for T = 0.5 s, V = 100 m3 (Schroeder & Kuttruff 1962; Kuttruff, Room Acoustics; worked by hand)", () => {
    expect(schroederFrequency(0.5, 100)).toBeCloseTo(141.421, 3);
  });
  it("gives 2000 sqrt(0.4 / 72) = 149.07 Hz for a 5 x 4 x 3.6 m room with T = 0.4 s (worked by hand)", () => {
    expect(schroederFrequency(0.4, 5 * 4 * 3.6)).toBeCloseTo(149.071, 3);
  });
  it("throws a RangeError naming the field for a non-positive or non-finite argument", () => {
    expect(() => schroederFrequency(0, 100)).toThrow(RangeError);
    expect(() => schroederFrequency(0.5, -1)).toThrow(/volumeM3/);
    expect(() => schroederFrequency(Number.NaN, 100)).toThrow(/rt60Seconds/);
    expect(() => schroederFrequency(0.5, Number.POSITIVE_INFINITY)).toThrow(/volumeM3/);
  });
});

describe("modalBandwidthHz(rt60Seconds)", () => {
  it("is the half-power bandwidth ln(10^6)/(2 pi T) ~= 2.2/T (Schroeder 1996, JASA, as in REFERENCES.md)", () => {
    expect(modalBandwidthHz(1)).toBeCloseTo(Math.log(1e6) / (2 * Math.PI), 12);
    expect(modalBandwidthHz(0.5)).toBeCloseTo(4.398, 3); // 2.2/0.5 = 4.4 within 0.01
  });
});
