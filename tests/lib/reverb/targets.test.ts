import { describe, expect, it } from "vitest";
import { compareToTarget, listeningRoomTargetS, listeningRoomToleranceS, targetBands } from "@/lib/reverb";

describe("listeningRoomTargetS — ITU-R BS.1116 / EBU Tech 3276: Tm = 0.25 (V/100)^(1/3) [from memory, high]", () => {
  it("V = 100 m³ → 0.25 s exactly", () => {
    expect(listeningRoomTargetS(100)).toBe(0.25);
  });
  it("V = 800 m³ → 0.50 s; V = 12.5 m³ → 0.125 s (by hand, cube-root scaling)", () => {
    expect(listeningRoomTargetS(800)).toBeCloseTo(0.5, 12);
    expect(listeningRoomTargetS(12.5)).toBeCloseTo(0.125, 12);
  });
  it("rejects a non-positive volume with a RangeError naming volumeM3", () => {
    expect(() => listeningRoomTargetS(0)).toThrow(/volumeM3/);
  });
});

describe("listeningRoomToleranceS — mask as in REFERENCES.md [from memory, moderate: confirm]", () => {
  it("±0.05 s from 200 Hz to 4 kHz", () => {
    for (const f of [200, 500, 1000, 4000]) expect(listeningRoomToleranceS(f)).toEqual({ lowerS: -0.05, upperS: 0.05 });
  });
  it("upper limit +0.3 s at 63 Hz, lower −0.1 s at 8 kHz, linear in log f between", () => {
    expect(listeningRoomToleranceS(63).upperS).toBeCloseTo(0.3, 12);
    expect(listeningRoomToleranceS(8000).lowerS).toBeCloseTo(-0.1, 12);
    expect(listeningRoomToleranceS(Math.sqrt(4000 * 8000)).lowerS).toBeCloseTo(-0.075, 12);
    const mid = Math.sqrt(63 * 200);
    expect(listeningRoomToleranceS(mid).upperS).toBeCloseTo(0.175, 12);
  });
});

describe("targetBands and compareToTarget", () => {
  it("small-room band defaults to 0.2–0.4 s flat with target 0.3 s (common practice)", () => {
    const b = targetBands({ kind: "small-room" }, [125, 1000], 32);
    expect(b.map((x) => x.frequencyHz)).toEqual([125, 1000]);
    for (const x of b) {
      expect(x.lowerS).toBe(0.2);
      expect(x.upperS).toBe(0.4);
      expect(x.targetS).toBeCloseTo(0.3, 12);
    }
  });
  it("listening-room band for V = 100 m³ at 1 kHz is 0.20…0.30 s", () => {
    const [b] = targetBands({ kind: "listening-room" }, [1000], 100);
    expect(b!.lowerS).toBeCloseTo(0.2, 12);
    expect(b!.upperS).toBeCloseTo(0.3, 12);
  });
  it("verdicts: within the band, near (≤ 0.05 s outside), outside; deviation = predicted − target", () => {
    const bands = targetBands({ kind: "small-room" }, [125, 250, 500, 1000], 32);
    const c = compareToTarget([0.35, 0.44, 0.5, 0.15], bands);
    expect(c.map((x) => x.verdict)).toEqual(["within", "near", "outside", "near"]);
    expect(c[0]!.deviationS).toBeCloseTo(0.05, 12);
    expect(c[2]!.excessS).toBeCloseTo(0.1, 12);
    expect(c[3]!.excessS).toBeCloseTo(-0.05, 12);
  });
  it("rejects a small-room band with upper ≤ lower and an unknown target kind", () => {
    expect(() => targetBands({ kind: "small-room", lowerS: 0.4, upperS: 0.3 }, [500], 32)).toThrow(RangeError);
    expect(() => targetBands({ kind: "concert" } as never, [500], 32)).toThrow(TypeError);
  });
});
