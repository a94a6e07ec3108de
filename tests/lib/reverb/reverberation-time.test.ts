import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { requiredAbsorption, reverberationTime, type Surface } from "@/lib/reverb";

const K = 24 * Math.LN10; // 55.26

describe("reverberationTime — Sabine (T = 24 ln10 V/(cA), 0.161 V/A; REFERENCES.md [pub])", () => {
  it("worked example: V = 100 m³, S = 100 m² at α 0.2 (A = 20 m²), c = 343.2 → T = 0.805 s (±0.001, by hand 0.161·100/20)", () => {
    const [t] = reverberationTime({ volumeM3: 100, surfaces: [{ areaM2: 100, alpha: [0.2] }], bandsHz: [500], formula: "sabine", speedOfSound: 343.2 });
    expect(Math.abs(t! - 0.805)).toBeLessThan(0.001);
  });
  it("textbook room 10 × 8 × 3 m (V = 240 m³, S = 268 m²), ᾱ = 0.1 → Sabine 0.161·240/26.8 = 1.442 s (±0.002)", () => {
    const [t] = reverberationTime({ volumeM3: 240, surfaces: [{ areaM2: 268, alpha: [0.1] }], bandsHz: [1000], formula: "sabine", speedOfSound: 343.2 });
    expect(Math.abs(t! - (0.161 * 240) / 26.8)).toBeLessThan(0.002);
  });
  it("sums Σ Sᵢαᵢ plus the extra area per band, and adds 4mV for the air (CONTRACTS.md)", () => {
    const surfaces: Surface[] = [
      { areaM2: 40, alpha: [0.1, 0.2] },
      { areaM2: 20, alpha: [0.5, 0.3] },
    ];
    const t = reverberationTime({
      volumeM3: 50, surfaces, bandsHz: [500, 4000], formula: "sabine", airAttenuation: [0, 0.01], extraAbsorptionM2: [2, 3],
    });
    expect(t[0]).toBeCloseTo((K * 50) / (343 * (4 + 10 + 2)), 12);
    expect(t[1]).toBeCloseTo((K * 50) / (343 * (8 + 6 + 3 + 4 * 0.01 * 50)), 12);
  });
  it("rejects a band with no absorption (T unbounded), a wrong alpha length and α > 1 with RangeErrors naming the field", () => {
    expect(() => reverberationTime({ volumeM3: 50, surfaces: [{ areaM2: 10, alpha: [0] }], bandsHz: [500], formula: "sabine" })).toThrow(RangeError);
    expect(() => reverberationTime({ volumeM3: 50, surfaces: [{ areaM2: 10, alpha: [0.1, 0.2] }], bandsHz: [500], formula: "sabine" })).toThrow(/surfaces\[0\]\.alpha/);
    expect(() => reverberationTime({ volumeM3: 50, surfaces: [{ areaM2: 10, alpha: [1.2] }], bandsHz: [500], formula: "sabine" })).toThrow(/surfaces\[0\]\.alpha\[0\]/);
    expect(() => reverberationTime({ volumeM3: -1, surfaces: [{ areaM2: 10, alpha: [0.2] }], bandsHz: [500], formula: "sabine" })).toThrow(/volumeM3/);
    expect(() => reverberationTime({ volumeM3: 50, surfaces: [{ areaM2: 10, alpha: [0.2] }], bandsHz: [500], formula: "norris" as "sabine" })).toThrow(TypeError);
  });
});

describe("reverberationTime — Eyring (T = 24 ln10 V/(−cS ln(1 − ᾱ)); IEC 60050 IEV 801-31-09 [pub])", () => {
  it("S = 100 m², ᾱ = 0.2, V = 100 m³, c = 343 → 55.262·100/(343·22.314) = 0.7220 s (±0.0005, by hand)", () => {
    const [t] = reverberationTime({ volumeM3: 100, surfaces: [{ areaM2: 100, alpha: [0.2] }], bandsHz: [500], formula: "eyring" });
    expect(Math.abs(t! - (K * 100) / (343 * 100 * -Math.log(0.8)))).toBeLessThan(1e-12);
    expect(Math.abs(t! - 0.722)).toBeLessThan(0.0005);
  });
  it("Eyring ≤ Sabine for every room (−ln(1 − a) ≥ a) — property (fast-check)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 10_000, noNaN: true }),
        fc.array(fc.record({ areaM2: fc.double({ min: 0.01, max: 1000, noNaN: true }), alpha: fc.tuple(fc.double({ min: 0.001, max: 0.99, noNaN: true })) }), { minLength: 1, maxLength: 6 }),
        fc.double({ min: 0, max: 0.05, noNaN: true }),
        (volumeM3, surfaces, m) => {
          const args = { volumeM3, surfaces: surfaces.map((s) => ({ areaM2: s.areaM2, alpha: [...s.alpha] })), bandsHz: [1000], airAttenuation: [m] };
          const e = reverberationTime({ ...args, formula: "eyring" })[0]!;
          const s = reverberationTime({ ...args, formula: "sabine" })[0]!;
          return Number.isFinite(e) && Number.isFinite(s) && e <= s * (1 + 1e-12);
        },
      ),
      { numRuns: 300 },
    );
  });
  it("Eyring → Sabine in the limit of small absorption: ratio ᾱ/(−ln(1 − ᾱ)) ≈ 1 − ᾱ/2 (series of ln), → 1 as ᾱ → 0", () => {
    for (const a of [0.001, 1e-5]) {
      const args = { volumeM3: 100, surfaces: [{ areaM2: 130, alpha: [a] }], bandsHz: [500] };
      const e = reverberationTime({ ...args, formula: "eyring" })[0]!;
      const s = reverberationTime({ ...args, formula: "sabine" })[0]!;
      expect(Math.abs(e / s - (1 - a / 2))).toBeLessThan(a * a); // next term of the series is −ᾱ²/12
      expect(Math.abs(e / s - 1)).toBeLessThanOrEqual(a / 2 + a * a);
    }
  });
  it("A ≥ S (extra area swamping the room) is a RangeError for Eyring, but fine for Sabine", () => {
    const args = { volumeM3: 100, surfaces: [{ areaM2: 50, alpha: [0.5] }], bandsHz: [500], extraAbsorptionM2: [30] };
    expect(() => reverberationTime({ ...args, formula: "eyring" })).toThrow(RangeError);
    expect(reverberationTime({ ...args, formula: "sabine" })[0]).toBeGreaterThan(0);
  });
});

describe("requiredAbsorption — inverse of reverberationTime", () => {
  it("adding addM2 as extra area gives the target time exactly (round trip, Sabine and Eyring, 1e-9)", () => {
    for (const formula of ["sabine", "eyring"] as const) {
      const room = { volumeM3: 32, surfaces: [{ areaM2: 62, alpha: [0.1, 0.05] }], bandsHz: [125, 1000], formula, airAttenuation: [0, 0.001] };
      const need = requiredAbsorption(room, [0.3, 0.25]);
      const t = reverberationTime({ ...room, extraAbsorptionM2: need.map((n) => n.addM2) });
      expect(t[0]).toBeCloseTo(0.3, 9);
      expect(t[1]).toBeCloseTo(0.25, 9);
    }
  });
  it("reports a surplus and adds nothing when the room is already shorter than the target", () => {
    const [r] = requiredAbsorption({ volumeM3: 30, surfaces: [{ areaM2: 60, alpha: [0.6] }], bandsHz: [500], formula: "sabine" }, [2]);
    expect(r!.addM2).toBe(0);
    expect(r!.surplusM2).toBeGreaterThan(0);
  });
  it("Sabine worked example: V 100, A 10 m², target 0.5 s, c 343.2 → need 0.161·100/0.5 = 32.2 m², add 22.2 (±0.05)", () => {
    const [r] = requiredAbsorption({ volumeM3: 100, surfaces: [{ areaM2: 100, alpha: [0.1] }], bandsHz: [500], formula: "sabine", speedOfSound: 343.2 }, [0.5]);
    expect(Math.abs(r!.addM2 - 22.2)).toBeLessThan(0.05);
  });
});
