import { describe, expect, it } from "vitest";
import {
  asymptoticModeCount, bonelloCheck, dimensionRatioCheck, modalDensity, modeCountCheck, roomModes, thirdOctaveBands,
} from "../../../lib/modes/index";
import { bruteForceModes } from "./reference";

describe("dimensionRatioCheck(room) — EBU Tech 3276: 1.1 w/h <= l/h <= 4.5 w/h - 4, l/h < 3, w/h < 3", () => {
  it("passes 7.2 x 5.1 x 2.7 m (by hand: l/h = 2.667, w/h = 1.889, 2.078 <= 2.667 <= 4.500)", () => {
    const r = dimensionRatioCheck({ lengthM: 7.2, widthM: 5.1, heightM: 2.7 });
    expect(r.lengthToHeight).toBeCloseTo(2.6667, 4);
    expect(r.widthToHeight).toBeCloseTo(1.8889, 4);
    expect(r.lowerBound).toBeCloseTo(2.0778, 4);
    expect(r.upperBound).toBeCloseTo(4.5, 4);
    expect(r.passes).toBe(true);
    expect(r.verdict).toMatch(/meets/i);
  });
  it("passes 5 x 4 x 3 m (by hand: l/h = 1.667, w/h = 1.333, 1.467 <= 1.667 <= 2.000)", () => {
    expect(dimensionRatioCheck({ lengthM: 5, widthM: 4, heightM: 3 }).passes).toBe(true);
  });
  it("fails a cube (by hand: l/h = 1 < 1.1 w/h = 1.1) and names the lower bound", () => {
    const r = dimensionRatioCheck({ lengthM: 3, widthM: 3, heightM: 3 });
    expect(r.passes).toBe(false);
    expect(r.conditions.lowerBound).toBe(false);
    expect(r.conditions.upperBound).toBe(false); // 1 <= 4.5 - 4 = 0.5 is false as well
    expect(r.verdict).toMatch(/does not meet/i);
  });
  it("fails 3.75 x 3.0 x 2.5 m on the upper bound only (by hand: w/h = 1.2, 1.32 <= 1.5 but 1.5 > 4.5*1.2 - 4 = 1.4)", () => {
    const r = dimensionRatioCheck({ lengthM: 3.75, widthM: 3.0, heightM: 2.5 });
    expect(r.conditions).toEqual({ lowerBound: true, upperBound: false, lengthToHeightBelow3: true, widthToHeightBelow3: true });
    expect(r.passes).toBe(false);
  });
  it("fails a 12 x 3 x 2.5 m corridor on l/h < 3 (by hand: l/h = 4.8)", () => {
    const r = dimensionRatioCheck({ lengthM: 12, widthM: 3, heightM: 2.5 });
    expect(r.conditions.lengthToHeightBelow3).toBe(false);
    expect(r.passes).toBe(false);
  });
});

describe("thirdOctaveBands(lowHz, highHz) — IEC 61260-1 base-ten bands, fm = 1000 * 10^(3x/30), edges fm * 10^(+-1/20)", () => {
  it("gives exact centres 19.953 ... 199.53 Hz with nominal labels 20 ... 200", () => {
    const b = thirdOctaveBands(20, 200);
    expect(b.map((x) => x.nominalHz)).toEqual([20, 25, 31.5, 40, 50, 63, 80, 100, 125, 160, 200]);
    expect(b[0]!.centerHz).toBeCloseTo(19.953, 3);
    expect(b[5]!.lowerHz).toBeCloseTo(56.234, 3);
    expect(b[5]!.upperHz).toBeCloseTo(70.795, 3);
    for (let i = 1; i < b.length; i++) expect(b[i]!.lowerHz).toBeCloseTo(b[i - 1]!.upperHz, 12);
  });
});

describe("bonelloCheck(room, options) — Bonello 1981, JAES 29:597 (from memory, REFERENCES.md): counts per 1/3 octave must not decrease; coincident modes only in bands with >= 5 modes", () => {
  const countsByBand = (L: [number, number, number], highHz: number) =>
    thirdOctaveBands(20, highHz).map((b) => bruteForceModes(L, b.upperHz).filter((m) => m.f >= b.lowerHz && m.f < b.upperHz).length);

  it("passes 7.2 x 5.1 x 2.7 m up to the 200 Hz band (by hand from an independent enumeration: 0,1,1,1,1,4,8,11,24,39,80 never decreases; the only equal frequencies are in the 200 Hz band, which holds 80)", () => {
    const r = bonelloCheck({ lengthM: 7.2, widthM: 5.1, heightM: 2.7 }, { highestBandHz: 200 });
    expect(r.bands.map((b) => b.modeCount)).toEqual(countsByBand([7.2, 5.1, 2.7], 200));
    expect(r.bands.map((b) => b.modeCount)).toEqual([0, 1, 1, 1, 1, 4, 8, 11, 24, 39, 80]);
    expect(r.passes).toBe(true);
    expect(r.decreasingBandsHz).toEqual([]);
    expect(r.coincidenceFailuresHz).toEqual([]);
    expect(r.verdict).toMatch(/meets/i);
  });

  it("fails a 3 m cube (by hand: the 63 Hz band holds the triple 57.17 Hz mode with only 3 modes; 100 Hz holds 1 < 3 in 80 Hz; 160 Hz holds 9 < 12 in 125 Hz)", () => {
    const r = bonelloCheck({ lengthM: 3, widthM: 3, heightM: 3 }, { highestBandHz: 200 });
    expect(r.bands.map((b) => b.modeCount)).toEqual(countsByBand([3, 3, 3], 200));
    expect(r.passes).toBe(false);
    expect(r.decreasingBandsHz).toEqual([100, 160]);
    expect(r.coincidenceFailuresHz).toEqual([63, 80]);
    expect(r.verdict).toMatch(/does not meet/i);
  });

  it("treats modes closer than the modal bandwidth 2.2/T as coincident when rt60Seconds is given (5 x 4 x 3 m, T = 0.5 s: 54.91 and 57.17 Hz are 2.26 Hz < 4.4 Hz apart, but in different bands; 66.67 and 68.60 Hz share the 63 Hz band of 3 modes -> fails)", () => {
    const exact = bonelloCheck({ lengthM: 5, widthM: 4, heightM: 3 }, { highestBandHz: 200 });
    expect(exact.passes).toBe(true); // counts 0,0,1,1,1,3,4,8,14,26,48 and equal frequencies only in bands of 26 and 48
    const banded = bonelloCheck({ lengthM: 5, widthM: 4, heightM: 3 }, { highestBandHz: 200, rt60Seconds: 0.5 });
    expect(banded.coincidenceFailuresHz).toContain(63);
    expect(banded.passes).toBe(false);
  });
});

describe("asymptoticModeCount(room, frequencyHz, speedOfSound) — Kuttruff, Room Acoustics: N(f) = 4 pi V f^3/(3 c^3) + pi S f^2/(4 c^2) + L f/(8 c)", () => {
  it("gives 14.3 / 37.8 / 78.4 / 229.9 for 5 x 4 x 3 m at 100/150/200/300 Hz (REFERENCES.md [calc])", () => {
    const room = { lengthM: 5, widthM: 4, heightM: 3 };
    // REFERENCES.md gives one decimal, so the tolerance is half a unit of that decimal.
    [14.3, 37.8, 78.4, 229.9].forEach((v, i) => {
      expect(Math.abs(asymptoticModeCount(room, [100, 150, 200, 300][i]!) - v)).toBeLessThanOrEqual(0.05);
    });
  });

  for (const L of [[5, 4, 3], [7.2, 5.1, 2.7], [3, 3, 3], [10, 7.3, 3.9], [4.1, 2.3, 2.2]] as [number, number, number][]) {
    it(`agrees with the exact count within 3 % at high frequency for ${L.join(" x ")} m (Kuttruff; exact count by brute force)`, () => {
      const room = { lengthM: L[0], widthM: L[1], heightM: L[2] };
      const V = L[0] * L[1] * L[2];
      const f = 343 * Math.cbrt((3 * 2000) / (4 * Math.PI * V)); // the volume term alone gives 2000 modes (under 1000 Hz here)
      const exact = bruteForceModes(L, f).length;
      expect(Math.abs(asymptoticModeCount(room, f) / exact - 1)).toBeLessThan(0.03);
      expect(roomModes(room, { maxFrequencyHz: f }).length).toBe(exact);
    });
  }
});

describe("modalDensity(room, frequencyHz, speedOfSound) — dN/df = 4 pi V f^2/c^3 + pi S f/(2 c^2) + L/(8 c)", () => {
  it("is the derivative of asymptoticModeCount (central difference, relative 1e-6)", () => {
    const room = { lengthM: 6, widthM: 4.2, heightM: 2.8 };
    for (const f of [30, 100, 250]) {
      const h = 1e-3;
      const num = (asymptoticModeCount(room, f + h) - asymptoticModeCount(room, f - h)) / (2 * h);
      expect(modalDensity(room, f) / num).toBeCloseTo(1, 6);
    }
  });
});

describe("modeCountCheck(room, { frequenciesHz, speedOfSound })", () => {
  it("lists the exact and asymptotic counts side by side with a plain-words verdict (5 x 4 x 3 m: 13/39/76/230 vs 14.3/37.8/78.4/229.9, REFERENCES.md)", () => {
    const r = modeCountCheck({ lengthM: 5, widthM: 4, heightM: 3 }, { frequenciesHz: [100, 150, 200, 300] });
    expect(r.rows.map((x) => x.countedModes)).toEqual([13, 39, 76, 230]);
    expect(r.rows[3]!.asymptoticModes).toBeCloseTo(229.9, 1);
    expect(r.rows[3]!.ratio).toBeCloseTo(230 / r.rows[3]!.asymptoticModes, 12);
    expect(r.rows[0]!.modalDensityPerHz).toBe(modalDensity({ lengthM: 5, widthM: 4, heightM: 3 }, 100));
    // dN/df at 300 Hz by hand: 4 pi 60 300^2/343^3 + pi 94 300/(2 343^2) + 48/(8 343) = 1.682 + 0.377 + 0.017
    // = 2.076 modes per Hz, so one new mode about every 1/2.076 = 0.48 Hz.
    expect(r.verdict).toContain("every 0.5 Hz");
    expect(typeof r.verdict).toBe("string");
    expect(r.verdict.length).toBeGreaterThan(10);
  });
});
