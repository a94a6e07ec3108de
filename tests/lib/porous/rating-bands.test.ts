import { describe, expect, it } from "vitest";
import {
  RATING_EXACT_HZ,
  RATING_NOMINAL_HZ,
  absorptionSpectrum,
  rateLayers,
  rateThirdOctaves,
  ratingThirdOctaves,
  type Layer,
} from "@/lib/porous";

const PANEL: Layer[] = [{ kind: "porous", thicknessM: 0.05, flowResistivity: 15_000, model: "delany-bazley" }];

describe("RATING_EXACT_HZ — IEC 61260-1:2014 one-third-octave mid-band frequencies 200…5000 Hz", () => {
  it("199.526, 251.189, 1000, 1995.262, 5011.872 Hz at the nominal 200, 250, 1000, 2000, 5000 (±0.001)", () => {
    const want: Record<number, number> = { 200: 199.526, 250: 251.189, 1000: 1000, 2000: 1995.262, 5000: 5011.872 };
    RATING_NOMINAL_HZ.forEach((n, i) => {
      if (want[n] !== undefined) expect(Math.abs(RATING_EXACT_HZ[i]! - want[n]!)).toBeLessThan(0.001);
    });
    expect(RATING_EXACT_HZ).toHaveLength(15);
  });
});

describe("ratingThirdOctaves / rateLayers", () => {
  it("takes the random-incidence α at the exact mid-band frequencies (equal to absorptionSpectrum, 1e-15)", () => {
    const bands = ratingThirdOctaves(PANEL);
    const direct = absorptionSpectrum(PANEL, { frequenciesHz: RATING_EXACT_HZ, incidence: "random" });
    bands.forEach((b, i) => expect(b.alpha).toBe(direct[i]!.alpha));
  });
  it("rates the stack exactly as rateThirdOctaves rates its 15 values (ISO 11654 + ASTM C423)", () => {
    const r = rateLayers(PANEL);
    const again = rateThirdOctaves(r.thirdOctaves.map((b) => b.alpha));
    expect(r.iso11654).toEqual(again.iso11654);
    expect(r.nrc).toBe(again.nrc);
    expect(r.saa).toBe(again.saa);
  });
  it("a 50 mm panel rates lower than the same panel spaced 100 mm off the wall (air gap moves absorption down)", () => {
    const spaced = rateLayers([...PANEL, { kind: "air", thicknessM: 0.1 }]);
    expect(spaced.iso11654.alphaW).toBeGreaterThan(rateLayers(PANEL).iso11654.alphaW);
  });
});
