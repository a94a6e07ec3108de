import { describe, expect, it } from "vitest";
import { absorptionSpectrum, cornerTrapAbsorption, panelAbsorption, type Layer } from "@/lib/porous";

const PANEL: Layer[] = [{ kind: "porous", thicknessM: 0.05, flowResistivity: 15_000, model: "delany-bazley" }];

describe("panelAbsorption — Sabine absorption area A = Σ S·α (Sabine; Kuttruff, Room Acoustics [from memory, high])", () => {
  it("equals count × face area × random-incidence α of the build, per band (1e-12)", () => {
    const f = [125, 500, 2000];
    const r = panelAbsorption({ widthM: 0.6, heightM: 1.2, layers: PANEL, frequenciesHz: f, count: 4 });
    const alpha = absorptionSpectrum(PANEL, { frequenciesHz: f, incidence: "random" });
    expect(r.faceAreaM2).toBeCloseTo(0.72, 12);
    r.bands.forEach((b, i) => expect(b.absorptionAreaM2).toBeCloseTo(4 * 0.72 * alpha[i]!.alpha, 12));
  });
  it("states that the diffraction edge effect is not included", () => {
    const r = panelAbsorption({ widthM: 0.6, heightM: 1.2, layers: PANEL, frequenciesHz: [500] });
    expect(r.edgeEffect).toMatch(/not included/);
    expect(r.sideAreaM2).toBe(0);
  });
  it("exposed sides add perimeter × porous thickness at the face's α (common practice): 3.6 m × 0.05 m = 0.18 m²", () => {
    const a = panelAbsorption({ widthM: 0.6, heightM: 1.2, layers: PANEL, frequenciesHz: [500], exposedSides: true });
    const b = panelAbsorption({ widthM: 0.6, heightM: 1.2, layers: PANEL, frequenciesHz: [500] });
    expect(a.sideAreaM2).toBeCloseTo(0.18, 12);
    expect(a.bands[0]!.absorptionAreaM2 / b.bands[0]!.absorptionAreaM2).toBeCloseTo(0.9 / 0.72, 12);
  });
  it("rejects a fractional count and a zero width with RangeErrors naming the field", () => {
    expect(() => panelAbsorption({ widthM: 0.6, heightM: 1.2, layers: PANEL, frequenciesHz: [500], count: 1.5 })).toThrow(/count/);
    expect(() => panelAbsorption({ widthM: 0, heightM: 1.2, layers: PANEL, frequenciesHz: [500] })).toThrow(/widthM/);
  });
});

describe("cornerTrapAbsorption — strip-averaged porous fill at random incidence over its face", () => {
  const trap = { depthM: 0.6, lengthM: 2.4, orientation: "floor-to-ceiling" as const, flowResistivity: 10_000, model: "miki" as const };
  it("geometry of the right-isosceles section: face 2D wide, legs D√2, volume D²·L (by hand)", () => {
    const r = cornerTrapAbsorption({ ...trap, frequenciesHz: [125] });
    expect(r.faceWidthM).toBeCloseTo(1.2, 12);
    expect(r.legM).toBeCloseTo(0.6 * Math.SQRT2, 12);
    expect(r.faceAreaM2).toBeCloseTo(2.88, 12);
    expect(r.volumeM3).toBeCloseTo(0.864, 12);
  });
  it("face α is the mean of α over fill thickness 0…D: matches a 400-strip midpoint average of absorptionSpectrum (±0.002)", () => {
    const f = [63, 125, 500];
    const r = cornerTrapAbsorption({ ...trap, frequenciesHz: f });
    const n = 400;
    const mean = f.map(() => 0);
    for (let i = 0; i < n; i++) {
      const t = ((i + 0.5) / n) * 0.6;
      if (t < 0.001) continue;
      const s = absorptionSpectrum([{ kind: "porous", thicknessM: t, flowResistivity: 10_000, model: "miki" }], { frequenciesHz: f, incidence: "random" });
      s.forEach((p, k) => (mean[k]! += p.alpha / n));
    }
    r.bands.forEach((b, k) => expect(Math.abs(b.alpha - mean[k]!)).toBeLessThan(0.002));
  });
  it("is below the α of a uniform full-depth layer at 125 Hz (it averages thinner strips)", () => {
    const r = cornerTrapAbsorption({ ...trap, frequenciesHz: [125] });
    const full = absorptionSpectrum([{ kind: "porous", thicknessM: 0.6, flowResistivity: 10_000, model: "miki" }], { frequenciesHz: [125], incidence: "random" })[0]!;
    expect(r.bands[0]!.alpha).toBeLessThan(full.alpha);
  });
  it("states the quarter-wave limit c/(4D) (common practice: 343/2.4 = 142.9 Hz) and the other rule-of-thumb limits", () => {
    const r = cornerTrapAbsorption({ ...trap, frequenciesHz: [125] });
    expect(r.usefulDownToHz).toBeCloseTo(142.9, 1);
    expect(r.limits.some((l) => l.startsWith("common practice"))).toBe(true);
    expect(r.limits.some((l) => l.startsWith("safety"))).toBe(true);
    expect(r.edgeEffect).toMatch(/not included/);
  });
  it("a wall–ceiling trap of the same section gives the same α (orientation only names the run)", () => {
    const a = cornerTrapAbsorption({ ...trap, frequenciesHz: [250] });
    const b = cornerTrapAbsorption({ ...trap, orientation: "wall-ceiling", frequenciesHz: [250] });
    expect(b.bands).toEqual(a.bands);
  });
  it("rejects an unknown orientation (TypeError) and a depth above 1 m (RangeError)", () => {
    expect(() => cornerTrapAbsorption({ ...trap, orientation: "diagonal" as "wall-ceiling", frequenciesHz: [250] })).toThrow(TypeError);
    expect(() => cornerTrapAbsorption({ ...trap, depthM: 1.5, frequenciesHz: [250] })).toThrow(/depthM/);
  });
});
