import { describe, expect, it } from "vitest";
import { practicalAbsorption, weightedAbsorption } from "@/lib/porous";

/** 15 one-third-octave values 200…5000 Hz built from five octave values (three equal thirds each). */
const thirds = (octaves: number[]) => octaves.flatMap((a) => [a, a, a]);

describe("weightedAbsorption — ISO 11654 worked cases (REFERENCES.md [calc]; procedure ISO 11654:1997 §4–§6 [pub])", () => {
  it("αp [0.35, 0.70, 0.95, 1.00, 1.00] → αw 0.65, indicators 'MH', class C (REFERENCES.md example)", () => {
    const r = weightedAbsorption(thirds([0.35, 0.7, 0.95, 1, 1]));
    expect(r.practical).toEqual([0.35, 0.7, 0.95, 1, 1]);
    expect(r.alphaW).toBe(0.65);
    expect(r.indicators).toBe("MH");
    expect(r.absorptionClass).toBe("C");
  });
  it("αp [0.05, 0.10, 0.30, 0.60, 0.80] → αw 0.20 (H), class E; the 0.10 sum is inclusive (REFERENCES.md example)", () => {
    const r = weightedAbsorption(thirds([0.05, 0.1, 0.3, 0.6, 0.8]));
    expect(r.alphaW).toBe(0.2);
    expect(r.indicators).toBe("H");
    expect(r.absorptionClass).toBe("E");
  });
  it("all αp 0.95 → αw 0.95, no indicator, class A (worked by hand per ISO 11654: shift 0 leaves 0.15 unfavourable)", () => {
    const r = weightedAbsorption(thirds([0.95, 0.95, 0.95, 0.95, 0.95]));
    expect(r).toEqual({ practical: [0.95, 0.95, 0.95, 0.95, 0.95], alphaW: 0.95, indicators: "", absorptionClass: "A" });
  });
  it("all αp 0.85 → αw 0.85, class B (by hand: shift −0.10 leaves 0.15, shift −0.15 leaves 0)", () => {
    const r = weightedAbsorption(thirds([0.85, 0.85, 0.85, 0.85, 0.85]));
    expect(r.alphaW).toBe(0.85);
    expect(r.absorptionClass).toBe("B");
    expect(r.indicators).toBe("");
  });
  it("αp [0.20, 0.40, 0.50, 0.55, 0.55] → αw 0.45, class D (by hand: shift −0.55 leaves exactly 0.10)", () => {
    const r = weightedAbsorption(thirds([0.2, 0.4, 0.5, 0.55, 0.55]));
    expect(r.alphaW).toBe(0.45);
    expect(r.absorptionClass).toBe("D");
    expect(r.indicators).toBe("");
  });
  it("αp [0.70, 0.45, 0.50, 0.50, 0.50] → αw 0.50 with indicator 'L' (by hand: 0.70 − 0.30 ≥ 0.25)", () => {
    const r = weightedAbsorption(thirds([0.7, 0.45, 0.5, 0.5, 0.5]));
    expect(r.alphaW).toBe(0.5);
    expect(r.indicators).toBe("L");
    expect(r.absorptionClass).toBe("D");
  });
  it("a curve shifted below 0 at 250 Hz is allowed: αp [0, 0.05, 0.10, 0.10, 0.05] → αw 0.10, not classified (CONTRACTS.md)", () => {
    const r = weightedAbsorption(thirds([0, 0.05, 0.1, 0.1, 0.05]));
    expect(r.alphaW).toBe(0.1);
    expect(r.absorptionClass).toBe("not classified");
  });
  it("all zero → αw 0.00, not classified", () => {
    const r = weightedAbsorption(new Array(15).fill(0));
    expect(r.alphaW).toBe(0);
    expect(r.absorptionClass).toBe("not classified");
    expect(r.indicators).toBe("");
  });
  it("class boundaries: 0.90 A, 0.80 B, 0.75 C, 0.60 C, 0.55 D, 0.30 D, 0.25 E, 0.15 E (ISO 11654 Table B.1)", () => {
    const cases: [number, string][] = [
      [0.9, "A"], [0.8, "B"], [0.75, "C"], [0.6, "C"], [0.55, "D"], [0.3, "D"], [0.25, "E"], [0.15, "E"],
    ];
    for (const [a, cls] of cases) {
      // a flat αp equal to the curve shifted so its 500 Hz value is a passes with 0.05 + 0.05 + 0.05 > 0.10
      // one step higher, so αw = a exactly for a flat αp = a (0.05·3 = 0.15 at the next step up)
      const r = weightedAbsorption(thirds([a, a, a, a, a]));
      expect(r.alphaW).toBe(a);
      expect(r.absorptionClass).toBe(cls);
    }
  });
  it("practical values never exceed 1.00 and measured values above 1 are capped (ISO 11654 §4.1)", () => {
    const r = weightedAbsorption([1.05, 1.1, 1.0, ...new Array(12).fill(1.2)]);
    expect(r.practical).toEqual([1, 1, 1, 1, 1]);
    expect(r.alphaW).toBe(1);
    expect(r.absorptionClass).toBe("A");
  });
  it("rejects anything but 15 finite numbers with a RangeError/TypeError naming thirdOctaveAlpha", () => {
    expect(() => weightedAbsorption(new Array(14).fill(0.5))).toThrow(/thirdOctaveAlpha/);
    expect(() => weightedAbsorption([...new Array(14).fill(0.5), Number.NaN])).toThrow(RangeError);
    expect(() => weightedAbsorption([...new Array(14).fill(0.5), "x" as unknown as number])).toThrow(TypeError);
  });
});

describe("practicalAbsorption — ISO 11654 §4.1 rounding in integer hundredths", () => {
  it("mean 0.3233 → 0.30, mean 0.34 → 0.35, mean 0.38 → 0.40, mean 0.0167 → 0.00 (nearest 0.05 after two decimals)", () => {
    expect(practicalAbsorption([0.3, 0.32, 0.35])).toBe(0.3);
    expect(practicalAbsorption([0.33, 0.34, 0.35])).toBe(0.35);
    expect(practicalAbsorption([0.37, 0.38, 0.39])).toBe(0.4);
    expect(practicalAbsorption([0.01, 0.02, 0.02])).toBe(0);
  });
  it("floating-point means such as (0.1 + 0.2 + 0.35)/3 = 0.21666… round as decimals do (→ 0.22 → 0.20)", () => {
    expect(practicalAbsorption([0.1, 0.2, 0.35])).toBe(0.2);
  });
  it("a mean of exactly 0.225 (two decimals 0.23) rounds up to 0.25; 0.2249 to 0.20", () => {
    expect(practicalAbsorption([0.225, 0.225, 0.225])).toBe(0.25);
    expect(practicalAbsorption([0.2249, 0.2249, 0.2249])).toBe(0.2);
  });
  it("negative model values (Delany–Bazley outside range) floor at 0.00", () => {
    expect(practicalAbsorption([-0.01, -0.02, 0])).toBe(0);
  });
});
