import { describe, expect, it } from "vitest";
import { fieldIncidenceAverage, gaussLegendre, parisRandomIncidence } from "@/lib/porous";

describe("gaussLegendre(n)", () => {
  it("integrates polynomials up to degree 2n−1 exactly on [−1, 1] (Abramowitz & Stegun 25.4.29) — n = 96, x^190 within 1e-12", () => {
    const { nodes, weights } = gaussLegendre(96);
    expect(nodes.length).toBe(96);
    let s0 = 0;
    let s190 = 0;
    for (let i = 0; i < 96; i++) {
      s0 += weights[i]!;
      s190 += weights[i]! * nodes[i]! ** 190;
    }
    expect(s0).toBeCloseTo(2, 13);
    expect(Math.abs(s190 - 2 / 191)).toBeLessThan(1e-12);
  });
  it("n = 2 gives ±1/√3 with weights 1 (Abramowitz & Stegun Table 25.4)", () => {
    const { nodes, weights } = gaussLegendre(2);
    expect([...nodes].sort((a, b) => a - b)[0]).toBeCloseTo(-1 / Math.sqrt(3), 14);
    expect(weights[0]).toBeCloseTo(1, 14);
  });
  it("returns the same cached arrays on a second call (precomputed once)", () => {
    expect(gaussLegendre(96)).toBe(gaussLegendre(96));
  });
  it("rejects n < 1 or non-integer n with a RangeError", () => {
    expect(() => gaussLegendre(0)).toThrow(RangeError);
    expect(() => gaussLegendre(2.5)).toThrow(RangeError);
  });
});

describe("parisRandomIncidence(alphaAt)", () => {
  it("of a constant alpha returns that alpha (Paris formula, ∫ sin 2θ dθ over 0…90° = 1) — within 1e-13", () => {
    for (const a of [0, 0.37, 1]) expect(Math.abs(parisRandomIncidence(() => a) - a)).toBeLessThan(1e-13);
  });
  it("of alpha = cos θ returns 2/3 (∫ cos θ sin 2θ dθ = 2/3, by hand)", () => {
    expect(parisRandomIncidence((t) => Math.cos(t))).toBeCloseTo(2 / 3, 12);
  });
  it("never samples 0° or 90° exactly (open quadrature, CONTRACTS.md)", () => {
    const seen: number[] = [];
    parisRandomIncidence((t) => (seen.push(t), 0));
    expect(seen.length).toBeGreaterThanOrEqual(96);
    expect(Math.min(...seen)).toBeGreaterThan(0);
    expect(Math.max(...seen)).toBeLessThan(Math.PI / 2);
  });
});

describe("fieldIncidenceAverage(alphaAt)", () => {
  it("of a constant alpha returns that alpha (0–78° weighted mean, Allard & Atalla 2009 [from memory, high]) — within 1e-13", () => {
    expect(Math.abs(fieldIncidenceAverage(() => 0.42) - 0.42)).toBeLessThan(1e-13);
  });
  it("samples only below 78°", () => {
    const seen: number[] = [];
    fieldIncidenceAverage((t) => (seen.push(t), 0));
    expect(Math.max(...seen)).toBeLessThan((78 * Math.PI) / 180);
  });
  it("of alpha = sin²θ returns ∫sin²θ sin2θ / ∫sin2θ over 0…78° = sin²(78°)/2 (by hand)", () => {
    const s = Math.sin((78 * Math.PI) / 180) ** 2;
    expect(fieldIncidenceAverage((t) => Math.sin(t) ** 2)).toBeCloseTo(s / 2, 12);
  });
});
